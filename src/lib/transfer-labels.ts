import type {
  AnimalOrigin,
  CheckInOutcome,
  IdentifierKind,
  LengthKind,
  PackKind,
  Purpose,
  Sex,
  TransferStatus,
  TransportMode,
  WallMaterial,
} from "@shared/constants";
import type { HandoffDto, ViewerRole } from "@shared/schemas/transfer";

/** The words every screen uses for a transfer's state: ours, in one place. */
export const statusLabel: Record<TransferStatus, string> = {
  draft: "Being drafted",
  awaiting_receiver: "Waiting for the receiver",
  ready: "Cleared to travel",
  in_transit: "On the road",
  delivered: "Arrived — check-in due",
  checked_in: "Checked in",
  closed: "Closed",
  cancelled: "Cancelled",
};

/** The colour a state wears: amber when someone has to act, brick only for a cancelled one. */
export const statusTone: Record<TransferStatus, "neutral" | "info" | "caution" | "ok" | "block"> = {
  draft: "neutral",
  awaiting_receiver: "caution",
  ready: "ok",
  in_transit: "info",
  delivered: "caution",
  checked_in: "ok",
  closed: "neutral",
  cancelled: "block",
};

export const modeLabel: Record<TransportMode, string> = {
  overnight_air: "Overnight air carrier",
  ground_courier: "Ground courier",
  hand_delivery: "Hand delivery",
};

export const purposeLabel: Record<Purpose, string> = {
  education_exhibition: "Education or exhibition",
  breeding: "Breeding",
  private_keeping: "Private keeping",
  rescue_rehoming: "Rescue or rehoming",
  scientific: "Scientific work",
  commercial_sale: "Commercial sale",
};

export const sexLabel: Record<Sex, string> = { male: "Male", female: "Female", unknown: "Not known" };

export const animalOriginLabel: Record<AnimalOrigin, string> = {
  captive_bred: "Captive-bred",
  captive_hatched: "Captive-hatched",
  wild_caught: "Wild-caught",
  long_term_captive: "Long-term captive",
  rescued: "Rescued",
};

export const packLabel: Record<PackKind, string> = {
  none: "No pack",
  heat_40h: "Heat pack, 40 hours",
  heat_72h: "Heat pack, 72 hours",
  cold: "Cold pack",
};

export const wallMaterialLabel: Record<WallMaterial, string> = {
  eps: "Expanded polystyrene (foam)",
  corrugated: "Corrugated board",
};

export const identifierKindLabel: Record<IdentifierKind, string> = {
  microchip: "Microchip",
  shell_notch: "Shell notch",
  photo_id: "Photo ID",
  band: "Band",
  other: "Other mark",
};

export const lengthKindLabel: Record<LengthKind, string> = {
  carapace: "Carapace length",
  snout_vent: "Snout–vent length",
  total: "Total length",
};

export const viewerRoleLabel: Record<ViewerRole, string> = {
  sender: "You send this",
  receiver: "You receive this",
  courier: "You carry this",
  admin: "Administrator view",
};

export const handoffKindLabel: Record<HandoffDto["kind"], string> = {
  pickup: "Pickup from the sender",
  handoff: "Courier to courier",
  delivery: "Delivery to the receiver",
};

export const outcomeLabel: Record<CheckInOutcome, string> = {
  arrived_well: "Arrived well",
  arrived_problem: "Arrived with a problem",
  dead_on_arrival: "Dead on arrival",
  missing: "Missing",
};

/** Options for a select from a label map, in the map's order. */
export function optionsOf<K extends string>(labels: Record<K, string>): { value: K; label: string }[] {
  return (Object.entries(labels) as [K, string][]).map(([value, label]) => ({ value, label }));
}
