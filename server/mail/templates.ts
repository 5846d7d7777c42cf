import type { MailDraft } from "../services/outbox";

/** Plain-text mail: it reads the same in every client and cannot carry active content. */
export function invitationMail(p: { to: string; name: string; invitedBy: string; link: string; hours: number }): MailDraft {
  return {
    to: p.to,
    topic: "invitation",
    subject: "You are invited to Hatchway",
    text: [
      `Hello ${p.name},`,
      "",
      `${p.invitedBy} has made you an account on Hatchway, the shared record for moving live animals between keepers.`,
      "",
      `Choose your password here (the link works once and expires in ${p.hours} hours):`,
      p.link,
      "",
      "If you did not expect this, you can ignore this message.",
    ].join("\n"),
  };
}
