import type { HandoffKind, TransferStatus } from "../constants";

/**
 * The steps a transfer may take. Handoffs and the check-in move it through in_transit,
 * delivered and checked_in; every other step is asked for with POST …/transition.
 */
export const TRANSITIONS: Readonly<Record<TransferStatus, readonly TransferStatus[]>> = {
  draft: ["awaiting_receiver", "cancelled"],
  awaiting_receiver: ["ready", "draft", "cancelled"],
  ready: ["in_transit", "awaiting_receiver", "cancelled"],
  in_transit: ["delivered"],
  delivered: ["checked_in"],
  checked_in: ["closed"],
  closed: [],
  cancelled: [],
};

/** Steps that only a recorded event makes, never a bare request. */
export const EVENT_DRIVEN: Readonly<Partial<Record<TransferStatus, string>>> = {
  in_transit: "the first handoff (the courier's pickup)",
  delivered: "the last handoff, to the receiver",
  checked_in: "the receiver's signed check-in",
};

export function canTransition(from: TransferStatus, to: TransferStatus): boolean {
  return TRANSITIONS[from].includes(to);
}

/** States in which the sender may still change animals, boxes, route or dates. */
export const EDITABLE: readonly TransferStatus[] = ["draft", "awaiting_receiver", "ready"];

/** Cancelling is possible until the animals leave. */
export const CANCELLABLE: readonly TransferStatus[] = ["draft", "awaiting_receiver", "ready"];

/**
 * After an edit: a change of animals, boxes, route or dates once the receiver confirmed
 * sends the record back for confirmation; anything else keeps the state.
 */
export function statusAfterEdit(current: TransferStatus, changedFields: readonly string[]): TransferStatus {
  if (current !== "ready") return current;
  const material = changedFields.some((f) =>
    MATERIAL_FIELDS.some((m) => f === m || f.startsWith(`${m}.`) || f.startsWith(`${m}[`)),
  );
  return material ? "awaiting_receiver" : current;
}

/** Fields whose change the receiver must see and confirm again. */
export const MATERIAL_FIELDS = [
  "animals",
  "containers",
  "origin",
  "destination",
  "mode",
  "plannedDepartureAt",
  "expectedArrivalAt",
  "receiverOrganizationId",
  "purpose",
  "sale",
] as const;

/** The number of handoffs for a number of courier legs: pickup, between legs, delivery. */
export function handoffsPlanned(legCount: number): number {
  return legCount === 0 ? 0 : legCount + 1;
}

export function handoffKind(index: number, legCount: number): HandoffKind {
  if (index === 0) return "pickup";
  return index === legCount ? "delivery" : "handoff";
}
