import type { TransferStatus } from "@shared/constants";
import type { TransferAbilitiesDto, TransferDto } from "@shared/schemas/transfer";

export type Step = {
  ability: keyof Pick<TransferAbilitiesDto, "submit" | "withdraw" | "confirm" | "sendBack" | "cancel" | "close">;
  to: TransferStatus;
  label: string;
  variant: "primary" | "secondary" | "danger";
  /** Steps that tell the other party "no" say why. */
  reason?: { label: string };
  /** Important or irreversible steps ask first and say what will happen. */
  ask?: (t: TransferDto) => { title: string; happens: string; confirm: string; cancel: string };
  /** The notice once it worked. */
  done: (t: TransferDto) => { title: string; detail?: string };
};

// The server decides which of these the caller may take (abilities); this only names them.
export const STEPS: Step[] = [
  {
    ability: "submit",
    to: "awaiting_receiver",
    label: "Send to the receiver",
    variant: "primary",
    ask: (t) => ({
      title: `Send ${t.number} to ${t.receiver.organization.name}?`,
      happens:
        `${t.receiver.organization.name} gets an e-mail asking them to check the transfer and confirm it. ` +
        "Until they confirm, you can still edit it or take it back to draft; a change to the animals, boxes, " +
        "route or dates after they confirm asks them again.",
      confirm: "Send to the receiver",
      cancel: "Not yet",
    }),
    done: (t) => ({ title: `Sent to ${t.receiver.organization.name}`, detail: "They are asked to confirm it." }),
  },
  {
    ability: "confirm",
    to: "ready",
    label: "Confirm and clear to travel",
    variant: "primary",
    done: (t) => ({ title: `${t.number} is cleared to travel`, detail: "The sender is told by e-mail." }),
  },
  {
    ability: "sendBack",
    to: "draft",
    label: "Send back to the sender",
    variant: "secondary",
    reason: { label: "What needs to change?" },
    ask: (t) => ({
      title: `Send ${t.number} back to ${t.sender.organization.name}?`,
      happens:
        "The sender gets your note by e-mail and can change the transfer and send it again. " +
        "Nothing travels until you confirm it.",
      confirm: "Send back",
      cancel: "Keep it as it is",
    }),
    done: (t) => ({ title: `Sent back to ${t.sender.organization.name}`, detail: "Your note went with it." }),
  },
  {
    ability: "withdraw",
    to: "draft",
    label: "Take back to draft",
    variant: "secondary",
    done: () => ({ title: "Back to draft", detail: "Send it again when it is ready." }),
  },
  {
    ability: "close",
    to: "closed",
    label: "Close the record",
    variant: "secondary",
    done: () => ({ title: "Record closed" }),
  },
  {
    ability: "cancel",
    to: "cancelled",
    label: "Cancel the transfer",
    variant: "danger",
    reason: { label: "Why is it cancelled?" },
    ask: (t) => ({
      title: `Cancel ${t.number}?`,
      happens:
        "This cannot be undone: the transfer stops, and its record stays, read only, with your reason in " +
        (t.status === "draft"
          ? "the custody log. The receiver was not asked yet, so nobody is e-mailed."
          : `the custody log. ${t.receiver.organization.name} is told by e-mail.`),
      confirm: "Cancel the transfer",
      cancel: "Keep the transfer",
    }),
    done: (t) => ({ title: `${t.number} is cancelled`, detail: "The reason is in the custody log." }),
  },
];
