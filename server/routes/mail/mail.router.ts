import { Router } from "express";
import type { AppContext } from "../../context";
import { HttpError } from "../../http/errors";
import { requirePolicy } from "../../http/guards";
import { canManageUsers } from "../../policies/user.policy";
import { OutboxMessageSchema } from "../../db/entities/outbox-message.entity";

/**
 * Demo only: the mail the local SMTP fake caught, and the outbox's state, for admins.
 * Not mounted when no fake inbox is configured.
 */
export function caughtMailRouter(ctx: AppContext): Router {
  const router = Router();
  router.use(requirePolicy(canManageUsers));
  router.get("/", async (req, res) => {
    const inboxUrl = ctx.env.MAIL_FAKE_INBOX_URL;
    if (!inboxUrl) throw new HttpError(404, "not_found", "No local mail catcher is configured.");
    let messages: unknown[] = [];
    let inboxError: string | null = null;
    try {
      const response = await fetch(inboxUrl, { signal: AbortSignal.timeout(3_000), redirect: "error" });
      if (!response.ok) throw new Error(`status ${response.status}`);
      messages = ((await response.json()) as { messages: unknown[] }).messages;
    } catch (err) {
      // Why it failed is for the server's log; the page says what it means.
      console.error("mail catcher", err);
      inboxError = "The local mail catcher is not answering; the outbox below still shows what was sent.";
    }
    const outbox = await req.em.find(OutboxMessageSchema, {}, { orderBy: { createdAt: "desc" }, limit: 100 });
    res.json({
      messages,
      inboxError,
      outbox: outbox.map((m) => ({
        id: m.id,
        to: m.toAddress,
        subject: m.subject,
        status: m.status,
        attempts: m.attempts,
        lastError: m.lastError,
        createdAt: m.createdAt.toISOString(),
        sentAt: m.sentAt?.toISOString() ?? null,
      })),
    });
  });
  return router;
}
