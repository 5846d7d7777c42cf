import type { TransferStatus } from "../constants";

/** The words people see for each state: ours, plain, and the same in every screen and e-mail. */
export const STATUS_WORDS: Readonly<Record<TransferStatus, string>> = {
  draft: "Being drafted",
  awaiting_receiver: "Waiting for the receiver",
  ready: "Cleared to travel",
  in_transit: "On the road",
  delivered: "Arrived — check-in due",
  checked_in: "Checked in",
  closed: "Closed",
  cancelled: "Cancelled",
};
