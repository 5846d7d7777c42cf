import type {
  HandoffKind,
  PackingFindingCode,
  Purpose,
  TransferListRole,
  TransferSortKey,
  TransferStatus,
  TransportMode,
  ViewerRole,
} from "../constants";

/** Where a transfer is in its life: ours, plain, and the same on every screen, paper and e-mail. */
export const TRANSFER_STATUS_WORDS: Readonly<Record<TransferStatus, string>> = {
  draft: "Being drafted",
  awaiting_receiver: "Waiting for the receiver",
  ready: "Cleared to travel",
  in_transit: "On the road",
  delivered: "Arrived — check-in due",
  checked_in: "Checked in",
  closed: "Closed",
  cancelled: "Cancelled",
};

export const TRANSPORT_MODE_WORDS: Readonly<Record<TransportMode, string>> = {
  overnight_air: "Overnight air carrier",
  ground_courier: "Ground courier",
  hand_delivery: "Hand delivery",
};

export const PURPOSE_WORDS: Readonly<Record<Purpose, string>> = {
  education_exhibition: "Education or exhibition",
  breeding: "Breeding",
  private_keeping: "Private keeping",
  rescue_rehoming: "Rescue or rehoming",
  scientific: "Scientific work",
  commercial_sale: "Commercial sale",
};

/** The caller's part in a transfer, as the list and the page say it. */
export const VIEWER_ROLE_WORDS: Readonly<Record<ViewerRole, string>> = {
  sender: "You send this",
  receiver: "You receive this",
  courier: "You carry this",
  admin: "Administrator view",
};

/** The list's "mine" filter. */
export const TRANSFER_LIST_ROLE_WORDS: Readonly<Record<TransferListRole, string>> = {
  sending: "I send",
  receiving: "I receive",
  carrying: "I carry",
};

/** What the list is sorted by, as it reads after "sorted by". */
export const TRANSFER_SORT_WORDS: Readonly<Record<TransferSortKey, string>> = {
  departure: "departure",
  number: "number",
  status: "state",
  updated: "last change",
};

export const HANDOFF_KIND_WORDS: Readonly<Record<HandoffKind, string>> = {
  pickup: "Pickup from the sender",
  handoff: "Courier to courier",
  delivery: "Delivery to the receiver",
};

/** A packing problem's name; the finding's message says which box or animal. */
export const PACKING_FINDING_WORDS: Readonly<Record<PackingFindingCode, string>> = {
  mixed_species: "Different species share a box",
  unpacked_animal: "An animal is not in a box",
  empty_box: "A box holds no animals",
  no_animals: "No animals listed",
  no_boxes: "No boxes listed",
};
