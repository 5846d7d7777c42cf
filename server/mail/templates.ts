import { formatDate } from "@shared/dates";
import type { MailDraft } from "../services/outbox";

/** Plain-text mail: it reads the same in every client and cannot carry active content. */
export function invitationMail(p: {
  to: string;
  name: string;
  invitedBy: string;
  link: string;
  hours: number;
}): MailDraft {
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

export type TransferMailTopic =
  | "awaiting_confirmation"
  | "reconfirm"
  | "confirmed"
  | "sent_back"
  | "cancelled"
  | "picked_up"
  | "delivered"
  | "delivery_awaiting_acknowledgement"
  | "checked_in"
  | "temperature_changed"
  | "arrival_moved"
  | "alert";

type TransferMailFacts = {
  to: string;
  name: string;
  organization: string;
  number: string;
  actor: string;
  link: string;
  reason?: string;
  summary?: string;
  previousAdvice?: string;
  advice?: string;
  /** For an alert: its heading and its message in words. */
  alertTitle?: string;
  alertMessage?: string;
};

const SUBJECTS: Record<TransferMailTopic, (n: string, f: TransferMailFacts) => string> = {
  awaiting_confirmation: (n) => `Transfer ${n} is waiting for your confirmation`,
  reconfirm: (n) => `Transfer ${n} changed: please confirm it again`,
  confirmed: (n) => `Transfer ${n} was confirmed by the receiver`,
  sent_back: (n) => `Transfer ${n} was sent back for changes`,
  cancelled: (n) => `Transfer ${n} was cancelled`,
  picked_up: (n) => `Transfer ${n} is on the road`,
  delivered: (n) => `Transfer ${n} was delivered`,
  delivery_awaiting_acknowledgement: (n) =>
    `Transfer ${n}: the courier recorded the delivery — please confirm you have the boxes`,
  checked_in: (n) => `Transfer ${n} was checked in`,
  temperature_changed: (n) => `Transfer ${n}: the temperature advice changed`,
  arrival_moved: (n) => `Transfer ${n}: the courier's run moved the arrival`,
  alert: (n, f) => `Alert on transfer ${n}: ${f.alertTitle ?? "please look"}`,
};

const LEADS: Record<TransferMailTopic, (f: TransferMailFacts) => string> = {
  awaiting_confirmation: (f) =>
    `${f.actor} has drafted transfer ${f.number} to ${f.organization}. Please check the animals, the route and the dates, and confirm it or send it back.`,
  reconfirm: (f) =>
    `${f.actor} changed transfer ${f.number} after you confirmed it. ${f.reason ?? ""} Please look again and confirm.`,
  confirmed: (f) =>
    `The receiver confirmed transfer ${f.number}. It is cleared to travel once the couriers are assigned.`,
  sent_back: (f) =>
    `${f.actor} sent transfer ${f.number} back for changes.${f.reason ? ` Their reason: ${f.reason}` : ""}`,
  cancelled: (f) => `${f.actor} cancelled transfer ${f.number}.${f.reason ? ` Reason: ${f.reason}` : ""}`,
  picked_up: (f) => `The courier took custody of transfer ${f.number}. ${f.summary ?? ""}`,
  delivered: (f) => `Transfer ${f.number} was handed to the receiver. ${f.summary ?? ""}`,
  delivery_awaiting_acknowledgement: (f) =>
    [
      `${f.actor} recorded the delivery of transfer ${f.number} to ${f.organization}. ${f.summary ?? ""}`,
      "",
      "A delivery is not on the record on the courier's word alone: open the transfer and confirm “I have the boxes”, or show the courier a one-time code from the transfer page. If you do not have the boxes, say so to the sender and the courier now.",
    ].join("\n"),
  checked_in: (f) => `${f.actor} checked in transfer ${f.number}. ${f.summary ?? ""}`,
  temperature_changed: (f) =>
    [
      `The temperature check ${f.summary ?? "before departure"} changed its advice for transfer ${f.number}.`,
      "",
      `Before: ${f.previousAdvice ?? ""}`,
      `Now: ${f.advice ?? ""}`,
      "",
      "The advice is a planning aid, not a guarantee: look at the forecast at both ends yourselves, keep heat packs away from the animals' containers, and follow the carrier's and the states' rules.",
    ].join("\n"),
  arrival_moved: (f) =>
    [
      `${f.actor} changed the courier's run that carries transfer ${f.number}. ${f.summary ?? ""}`,
      "",
      "The temperature check follows the new times. If the new time does not suit you, tell the courier service and the other party now.",
    ].join("\n"),
  alert: (f) =>
    [
      `${f.alertTitle ?? "Alert"} on transfer ${f.number}.`,
      "",
      f.alertMessage ?? "",
      "",
      "Open the transfer to see the record, and acknowledge the alert there with a note saying what you did. If an animal may be at risk, call the other party now.",
    ].join("\n"),
};

/** The e-mail for a step of a transfer that needs the other party. Plain text only. */
export function transferMail(topic: TransferMailTopic, f: TransferMailFacts): MailDraft {
  return {
    to: f.to,
    topic: `transfer.${topic}`,
    subject: SUBJECTS[topic](f.number, f),
    text: [
      `Hello ${f.name},`,
      "",
      LEADS[topic](f).replace(/\s+$/, ""),
      "",
      `Open the transfer: ${f.link}`,
      "",
      "— Hatchway",
    ].join("\n"),
  };
}

/** To each member of the holding organisation, once, when a permit or certificate nears its last valid day. */
export function documentExpiryMail(p: {
  to: string;
  name: string;
  organization: string;
  kind: string;
  number: string;
  validTo: string;
  daysLeft: number;
  link: string;
}): MailDraft {
  const lastDay = formatDate(p.validTo);
  const when =
    p.daysLeft === 0
      ? "today is its last valid day"
      : `its last valid day is ${lastDay}, in ${p.daysLeft} day${p.daysLeft === 1 ? "" : "s"}`;
  return {
    to: p.to,
    topic: "document.expiring",
    subject: `${p.kind} ${p.number} expires on ${lastDay}`,
    text: [
      `Hello ${p.name},`,
      "",
      `The ${p.kind.toLowerCase()} no. ${p.number} held by ${p.organization} expires soon: ${when}.`,
      "Transfers that ship after that day cannot rely on it. Renew it with the issuing agency and add the new one to Hatchway.",
      "",
      `Your permits and certificates: ${p.link}`,
      "",
      "— Hatchway",
    ].join("\n"),
  };
}

const SIGNATURE = ["", "— Hatchway"];

/** After a sign-up: the one-time link that confirms the address and opens the account. */
export function signupConfirmationMail(p: {
  to: string;
  name: string;
  organization: string;
  link: string;
  hours: number;
}): MailDraft {
  return {
    to: p.to,
    topic: "account.confirm_signup",
    subject: "Confirm your e-mail address for Hatchway",
    text: [
      `Hello ${p.name},`,
      "",
      `You signed up ${p.organization} on Hatchway, the shared record for moving live animals between keepers.`,
      `Confirm your e-mail address to open the account (the link works once and expires in ${p.hours} hours):`,
      p.link,
      "",
      "If you did not sign up, ignore this message: without the confirmation nothing happens.",
      ...SIGNATURE,
    ].join("\n"),
  };
}

/** To an address that already has an account, when someone signs up with it: no second account is made. */
export function signupAddressTakenMail(p: {
  to: string;
  name: string;
  signInLink: string;
  resetLink: string;
}): MailDraft {
  return {
    to: p.to,
    topic: "account.signup_taken",
    subject: "Someone tried to sign up to Hatchway with your e-mail address",
    text: [
      `Hello ${p.name},`,
      "",
      "Someone just tried to sign up a new organisation on Hatchway with this e-mail address. It already has an account, so nothing was created.",
      "",
      `If it was you, sign in instead: ${p.signInLink}`,
      `If you forgot your password, choose a new one here: ${p.resetLink}`,
      "",
      "If it was not you, you can ignore this message; your account has not changed.",
      ...SIGNATURE,
    ].join("\n"),
  };
}

/** "Forgot your password?": a one-time link to choose a new one. */
export function passwordResetMail(p: { to: string; name: string; link: string; hours: number }): MailDraft {
  return {
    to: p.to,
    topic: "account.password_reset",
    subject: "Choose a new Hatchway password",
    text: [
      `Hello ${p.name},`,
      "",
      `Someone asked to reset the password of your Hatchway account. Choose a new password here (the link works once and expires in ${p.hours} hours):`,
      p.link,
      "",
      "Setting a new password signs your account out everywhere else.",
      "If you did not ask for this, ignore this message: your password stays as it is.",
      ...SIGNATURE,
    ].join("\n"),
  };
}

/** To an existing account invited to an organisation: nothing changes until they accept. */
export function joinOrganizationMail(p: {
  to: string;
  name: string;
  invitedBy: string;
  organization: string;
  role: string;
  link: string;
  hours: number;
}): MailDraft {
  return {
    to: p.to,
    topic: "account.join_organization",
    subject: `${p.invitedBy} invites you to join ${p.organization} on Hatchway`,
    text: [
      `Hello ${p.name},`,
      "",
      `${p.invitedBy} invites you to join ${p.organization} on Hatchway as ${p.role}.`,
      "Your account stays as it is unless you accept. Accepting moves your account to that organisation.",
      "",
      `Sign in and accept here (the link works once and expires in ${p.hours} hours):`,
      p.link,
      "",
      "If you do not want to join, ignore this message.",
      ...SIGNATURE,
    ].join("\n"),
  };
}

/** To the address a sender invited as the other party of a transfer: who invited them, why, and the way in. */
export function organizationInvitationMail(p: {
  to: string;
  organization: string;
  invitedBy: string;
  invitedByOrganization: string;
  asCourier: boolean;
  link: string;
  hours: number;
}): MailDraft {
  const why = p.asCourier
    ? `would like ${p.organization} to carry live animals for them`
    : `would like to send live animals to ${p.organization}`;
  return {
    to: p.to,
    topic: "account.invite_organization",
    subject: `${p.invitedBy} of ${p.invitedByOrganization} invites ${p.organization} to Hatchway`,
    text: [
      "Hello,",
      "",
      `${p.invitedBy} of ${p.invitedByOrganization} ${why}, and uses Hatchway, the shared record for moving live animals between keepers: the animals, the permits each state asks for, the temperature on the way and every handoff, in one place for the sender, the courier and the receiver.`,
      "",
      `Sign up ${p.organization} here to see ${p.asCourier ? "what they ask you to carry" : "the transfer waiting for you"} (the link works once and expires in ${p.hours} hours):`,
      p.link,
      "",
      "Signing up is free and makes nobody else's account. If you do not know the sender, ignore this message.",
      ...SIGNATURE,
    ].join("\n"),
  };
}

/** To a courier given a leg of a transfer, or whose leg was taken away. */
export function legAssignmentMail(p: {
  to: string;
  name: string;
  number: string;
  change: "assigned" | "removed";
  leg: number;
  legs: number;
  actor: string;
  link: string;
}): MailDraft {
  const which = p.legs > 1 ? `leg ${p.leg} of ${p.legs}` : "the leg";
  const assigned = p.change === "assigned";
  return {
    to: p.to,
    topic: assigned ? "courier.leg_assigned" : "courier.leg_removed",
    subject: assigned ? `You carry transfer ${p.number}` : `You no longer carry transfer ${p.number}`,
    text: [
      `Hello ${p.name},`,
      "",
      assigned
        ? `${p.actor} assigned you ${which} of transfer ${p.number}. Open it to see the pickup, the boxes and the handling notes:`
        : `${p.actor} took you off transfer ${p.number}: you no longer carry it, and it has left your list of legs.`,
      p.link,
      ...SIGNATURE,
    ].join("\n"),
  };
}

/** A permit's yearly report is due soon (issue 15 §3): 30 and 7 days before. */
export function permitReportDueMail(p: {
  to: string;
  name: string;
  organization: string;
  kind: string;
  number: string;
  from: string;
  to_: string;
  dueOn: string;
  daysLeft: number;
  link: string;
}): MailDraft {
  const due = formatDate(p.dueOn);
  return {
    to: p.to,
    topic: "register.report-due",
    subject: `Yearly report for ${p.kind.toLowerCase()} ${p.number} due ${due}`,
    text: [
      `Hello ${p.name},`,
      "",
      `The yearly report for the ${p.kind.toLowerCase()} no. ${p.number} held by ${p.organization} is due on ${due}, in ${p.daysLeft} day${p.daysLeft === 1 ? "" : "s"}.`,
      `It covers ${formatDate(p.from)} to ${formatDate(p.to_)}. Hatchway prepares it from your register; check it against your own records and file it with the issuing agency, whose rules decide what it must hold.`,
      "",
      `The report: ${p.link}`,
      "",
      "— Hatchway",
    ].join("\n"),
  };
}
