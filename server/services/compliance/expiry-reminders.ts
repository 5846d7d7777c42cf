import { KEEPER_ROLES } from "@shared/constants";
import { DOCUMENT_KIND_WORDS } from "@shared/words";
import { LockMode } from "@mikro-orm/core";
import { addDays } from "@shared/temperature/zoned-time";
import { EXPIRY_WARNING_DAYS, expiryOf, todayUtc } from "@shared/compliance/expiry";
import type { AppContext } from "../../context";
import { PermitDocumentSchema } from "../../db/entities/compliance.entity";
import { OrganizationSchema } from "../../db/entities/organization.entity";
import { UserSchema } from "../../db/entities/user.entity";
import { documentExpiryMail } from "../../mail/templates";
import { enqueueMail } from "../outbox";
import type { ScheduledTask } from "../scheduler";

/** Documents handled per run; the next run takes the rest. */
const BATCH = 200;

/**
 * Tells the members of the holding organisation, once per document, that it reaches its last
 * valid day within EXPIRY_WARNING_DAYS days. Rows are claimed with SKIP LOCKED and marked in the
 * same transaction as the queued mail, so a document is never reminded about twice.
 */
export async function sendExpiryReminders(ctx: AppContext, today = todayUtc()): Promise<number> {
  const em = ctx.orm.em.fork();
  const reminded = await em.transactional(async (tx) => {
    const docs = await tx.find(
      PermitDocumentSchema,
      { reminderSentAt: null, validTo: { $gte: today, $lte: addDays(today, EXPIRY_WARNING_DAYS) } },
      // SKIP LOCKED: two servers never claim the same document.
      { orderBy: { validTo: "asc", id: "asc" }, limit: BATCH, lockMode: LockMode.PESSIMISTIC_PARTIAL_WRITE },
    );
    const orgs = new Map(
      (await tx.find(OrganizationSchema, { id: { $in: [...new Set(docs.map((d) => d.organization.id))] } })).map(
        (o) => [o.id, o],
      ),
    );
    for (const doc of docs) {
      const org = orgs.get(doc.organization.id)!;
      const members = await tx.find(UserSchema, { organization: org.id, role: { $in: KEEPER_ROLES }, disabled: false });
      const { daysLeft } = expiryOf(doc.validTo ?? null, today);
      for (const member of members) {
        if (member.mailOptOuts.includes("document_expiry")) continue;
        enqueueMail(
          tx,
          documentExpiryMail({
            to: member.email,
            name: member.displayName,
            organization: org.name,
            kind: DOCUMENT_KIND_WORDS[doc.kind],
            number: doc.number,
            validTo: doc.validTo as string,
            daysLeft: daysLeft ?? 0,
            link: ctx.links.to("/permits"),
          }),
        );
      }
      doc.reminderSentAt = new Date();
    }
    await tx.flush();
    return docs.length;
  });
  if (reminded > 0) ctx.kickOutbox();
  return reminded;
}

export const EXPIRY_REMINDER_TASK = "compliance.document-expiry-reminders";

export const expiryReminderTask: ScheduledTask = Object.freeze({
  name: EXPIRY_REMINDER_TASK,
  everyMs: 60 * 60 * 1000,
  run: (ctx: AppContext) => sendExpiryReminders(ctx).then(() => undefined),
});
