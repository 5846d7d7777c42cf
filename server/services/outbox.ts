import type { EntityManager } from "@mikro-orm/postgresql";
import { OutboxMessageSchema } from "../db/entities/outbox-message.entity";
import type { Mailer } from "../adapters/mailer";
import type { Orm } from "../db/orm";

export type MailDraft = { to: string; subject: string; text: string; topic: string };

/**
 * Queues an e-mail in the caller's unit of work: it is committed with the change that
 * caused it, or not at all.
 */
export function enqueueMail(em: EntityManager, draft: MailDraft): void {
  em.create(OutboxMessageSchema, {
    toAddress: draft.to,
    subject: draft.subject.slice(0, 300),
    textBody: draft.text,
    topic: draft.topic,
  });
}

const MAX_ATTEMPTS = 12;

/** Seconds to wait before attempt n+1: 2, 4, 8 … capped at 10 minutes. */
export function retryDelaySeconds(attempts: number): number {
  return Math.min(600, 2 ** Math.max(1, attempts));
}

type Row = { id: string; to_address: string; subject: string; text_body: string; attempts: number };

/**
 * Sends what is due. Rows are claimed with FOR UPDATE SKIP LOCKED, so several servers can
 * run the worker side by side without sending a message twice.
 */
export async function deliverDueMail(orm: Orm, mailer: Mailer, batch = 20): Promise<{ sent: number; failed: number }> {
  const em = orm.em.fork();
  let sent = 0;
  let failed = 0;
  await em.transactional(async (tx) => {
    const rows: Row[] = await tx.getConnection().execute(
      `SELECT id, to_address, subject, text_body, attempts FROM outbox_message
        WHERE status = 'pending' AND next_attempt_at <= now()
        ORDER BY next_attempt_at LIMIT ? FOR UPDATE SKIP LOCKED`,
      [batch],
      "all",
      tx.getTransactionContext(),
    );
    for (const row of rows) {
      try {
        await mailer.send({ to: row.to_address, subject: row.subject, text: row.text_body });
        await tx
          .getConnection()
          .execute(
            `UPDATE outbox_message SET status = 'sent', sent_at = now(), attempts = attempts + 1, last_error = NULL WHERE id = ?`,
            [row.id],
            "run",
            tx.getTransactionContext(),
          );
        sent++;
      } catch (err) {
        const attempts = row.attempts + 1;
        const status = attempts >= MAX_ATTEMPTS ? "dead" : "pending";
        await tx.getConnection().execute(
          `UPDATE outbox_message SET attempts = ?, status = ?, last_error = ?,
             next_attempt_at = now() + (? * interval '1 second') WHERE id = ?`,
          [
            attempts,
            status,
            String((err as Error)?.message ?? err).slice(0, 1000),
            retryDelaySeconds(attempts),
            row.id,
          ],
          "run",
          tx.getTransactionContext(),
        );
        failed++;
      }
    }
  });
  return { sent, failed };
}

/** The outbox worker of one app: built by the composition root, started only where WORKERS is on. */
export type OutboxWorker = {
  /** Begins delivering every few seconds. */
  start(): void;
  /** Delivers now (after a request queued mail); does nothing until the worker is started. */
  kick(): void;
  /** Stops the timer and waits for a round in flight. */
  stop(): Promise<void>;
};

/** Runs `deliverDueMail` every few seconds and when kicked; never throws out of the loop. */
export function createOutboxWorker(orm: Orm, mailer: Mailer, intervalMs = 2_000): OutboxWorker {
  let timer: NodeJS.Timeout | null = null;
  let running = false;
  let stopped = false;
  let again = false;

  const tick = async () => {
    if (stopped || !timer) return;
    if (running) {
      again = true;
      return;
    }
    running = true;
    try {
      do {
        again = false;
        await deliverDueMail(orm, mailer);
      } while (again && !stopped);
    } catch (err) {
      console.error("[outbox] delivery round failed; will retry", (err as Error).message);
    } finally {
      running = false;
    }
  };
  return {
    start() {
      if (timer || stopped) return;
      timer = setInterval(tick, intervalMs);
      timer.unref();
    },
    kick: () => void tick(),
    async stop() {
      stopped = true;
      if (timer) clearInterval(timer);
      while (running) await new Promise((r) => setTimeout(r, 20));
    },
  };
}
