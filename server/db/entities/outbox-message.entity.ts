import { defineEntity, p, type InferEntity } from "@mikro-orm/core";
import { OUTBOX_STATUSES } from "@shared/constants";
import { createdAtProperty, idProperty } from "./base";

export { OUTBOX_STATUSES };

/**
 * An e-mail waiting to be sent. It is written in the same transaction as the change that
 * caused it; the outbox worker delivers it with retries, so an SMTP outage loses nothing.
 */
export const OutboxMessageSchema = defineEntity({
  name: "OutboxMessage",
  tableName: "outbox_message",
  properties: {
    id: idProperty(),
    toAddress: p.string().length(254),
    subject: p.string().length(300),
    textBody: p.text(),
    /** What the message is about, for the admin's view and for de-duplication. */
    topic: p.string().length(100),
    status: p
      .enum([...OUTBOX_STATUSES])
      .default("pending")
      .index(),
    attempts: p.integer().default(0),
    nextAttemptAt: p
      .datetime()
      .onCreate(() => new Date())
      .index(),
    lastError: p.text().nullable(),
    sentAt: p.datetime().nullable(),
    createdAt: createdAtProperty(),
  },
});

export type OutboxMessage = InferEntity<typeof OutboxMessageSchema>;
