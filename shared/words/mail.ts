import type { OutboxStatus } from "../constants";

/** Where an e-mail in the outbox stands, for the admin's caught-mail page. */
export const OUTBOX_STATUS_WORDS: Readonly<Record<OutboxStatus, string>> = {
  pending: "Waiting to be sent",
  sent: "Sent",
  dead: "Gave up after retries",
};
