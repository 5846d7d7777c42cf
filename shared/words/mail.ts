import type { MailChoice, OutboxStatus } from "../constants";

/** Where an e-mail in the outbox stands, for the admin's caught-mail page. */
export const OUTBOX_STATUS_WORDS: Readonly<Record<OutboxStatus, string>> = {
  pending: "Waiting to be sent",
  sent: "Sent",
  dead: "Gave up after retries",
};

/** The e-mails a person may turn off on their account page. */
export const MAIL_CHOICE_WORDS: Readonly<Record<MailChoice, string>> = {
  transfer_steps: "Steps of my organisation's transfers (sent, confirmed, sent back, picked up, delivered, checked in)",
  document_expiry: "Permits and certificates about to expire",
  leg_assignments: "Legs assigned to me or taken away from me",
};

/** Said beside the choices: what is always sent. */
export const ALWAYS_SENT_MAIL =
  "Alerts on a transfer (a seal that does not match, a box too hot or too cold …) and changes of the temperature advice are always sent: they may concern an animal's safety.";
