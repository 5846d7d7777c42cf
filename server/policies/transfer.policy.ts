import type { TransferAbilitiesDto, ViewerRole } from "@shared/schemas/transfer";
import type { TransferStatus } from "@shared/constants";
import { CANCELLABLE, EDITABLE } from "@shared/transfer/lifecycle";
import { isCourier, isKeeper, type Actor } from "../auth/actor";

export type TransferFacts = {
  status: TransferStatus;
  senderOrganizationId: string;
  receiverOrganizationId: string;
  /** Courier user ids by leg, in leg order. */
  legCourierIds: readonly string[];
  handoffsDone: number;
  /** Whether the sender ever sent it to the receiver (a transfer sent back stays shared). */
  everSent: boolean;
  /** The courier service asked to carry it, if any: its manager assigns the couriers. */
  courierServiceId?: string | null;
};

/** The manager of the courier service the sender chose for this transfer. */
export function managesCourierService(actor: Actor, t: Pick<TransferFacts, "courierServiceId">): boolean {
  return (
    actor.role === "manager" &&
    actor.organization?.kind === "courier_service" &&
    !!t.courierServiceId &&
    actor.organization.id === t.courierServiceId
  );
}

/**
 * A draft is the sender's until it is sent (issue 14, §4): the receiver and the couriers do not
 * see it at all before the first sending. Once sent it stays shared, also when it is sent back
 * for changes. A transfer made in a later state by the loaders (demo, fixtures) counts as sent;
 * one cancelled before it was ever sent stays the sender's.
 */
export function sharedWithOtherParties(t: Pick<TransferFacts, "status" | "everSent">): boolean {
  return t.everSent || (t.status !== "draft" && t.status !== "cancelled");
}

/**
 * Who the caller is to this transfer: a member of the sending or receiving organisation,
 * an assigned courier, an admin (read only), or nobody (the record does not exist for them).
 */
export function viewerRoleFor(
  actor: Actor,
  t: Pick<
    TransferFacts,
    "senderOrganizationId" | "receiverOrganizationId" | "legCourierIds" | "status" | "everSent" | "courierServiceId"
  >,
): ViewerRole | null {
  if (actor.disabled) return null;
  const orgId = actor.organization?.id;
  if (isKeeper(actor) && orgId === t.senderOrganizationId) return "sender";
  if (!sharedWithOtherParties(t)) return actor.role === "admin" ? "admin" : null;
  if (isKeeper(actor) && orgId === t.receiverOrganizationId) return "receiver";
  if (isCourier(actor) && t.legCourierIds.includes(actor.id)) return "courier";
  if (managesCourierService(actor, t)) return "courier";
  if (actor.role === "admin") return "admin";
  return null;
}

/**
 * Whether this role may ever ask for a step to `to`, in any state: only the sender and the
 * receiver move a transfer, the sender alone sends it or cancels it, the receiver alone
 * confirms it. Checked before the state, so a role that may not act learns nothing about the
 * state from a 409 (SECURITY.md, Access).
 */
export function mayRequestTransition(role: ViewerRole, to: TransferStatus): boolean {
  if (role !== "sender" && role !== "receiver") return false;
  if (to === "awaiting_receiver" || to === "cancelled") return role === "sender";
  if (to === "ready") return role === "receiver";
  return true;
}

/**
 * Whether the caller takes part in handoff `index` at all, whatever has been recorded: the
 * sender releases the first, the receiver takes the last, each leg's courier takes one and
 * releases the next. Checked before the state, like mayRequestTransition.
 */
export function takesPartInHandoff(actor: Actor, role: ViewerRole, t: TransferFacts, index: number): boolean {
  const legs = t.legCourierIds.length;
  if (role === "sender") return index === 0;
  if (role === "receiver") return legs > 0 && index === legs;
  if (role === "courier")
    return t.legCourierIds.some((id, leg) => id === actor.id && (index === leg || index === leg + 1));
  return false;
}

/** Only the receiver ever checks animals in. */
export function mayCheckIn(role: ViewerRole): boolean {
  return role === "receiver";
}

/**
 * The handoff the caller may record now: the next one in order, by the party taking custody
 * or the one releasing it (one leg's receiver is the next leg's releaser). Null otherwise.
 */
export function handoffAllowed(actor: Actor, role: ViewerRole, t: TransferFacts): number | null {
  const legs = t.legCourierIds.length;
  if (legs === 0) return null;
  const next = t.handoffsDone;
  if (next > legs) return null;
  if (next === 0 ? t.status !== "ready" : t.status !== "in_transit") return null;
  const releasing = next === 0 ? role === "sender" : t.legCourierIds[next - 1] === actor.id;
  const receiving = next === legs ? role === "receiver" : t.legCourierIds[next] === actor.id;
  return releasing || receiving ? next : null;
}

/**
 * The delivery is recorded but the receiver has not acknowledged it: every handoff is in and the
 * transfer is still on the road (a delivery the receiver acknowledges makes it "delivered", D20).
 */
export function deliveryAwaitingReceiver(t: TransferFacts): boolean {
  const legs = t.legCourierIds.length;
  return t.status === "in_transit" && legs > 0 && t.handoffsDone > legs;
}

/** Photos belong to recorded handoffs and the check-in: from the pickup until the transfer is closed. */
const PHOTO_STATUSES: readonly TransferStatus[] = ["in_transit", "delivered", "checked_in"];

export function transferAbilities(actor: Actor, role: ViewerRole, t: TransferFacts): TransferAbilitiesDto {
  const sender = role === "sender";
  const receiver = role === "receiver";
  const courier = role === "courier";
  const awaiting = deliveryAwaitingReceiver(t);
  return {
    edit: sender && EDITABLE.includes(t.status),
    submit: sender && t.status === "draft",
    withdraw: sender && t.status === "awaiting_receiver",
    confirm: receiver && t.status === "awaiting_receiver",
    sendBack: receiver && t.status === "awaiting_receiver",
    cancel: sender && CANCELLABLE.includes(t.status),
    close: (sender || receiver) && t.status === "checked_in",
    assignCouriers: (sender || (role === "courier" && managesCourierService(actor, t))) && EDITABLE.includes(t.status),
    handOff: handoffAllowed(actor, role, t),
    checkIn: receiver && t.status === "delivered",
    discuss: sender || receiver,
    readCustody: true,
    readPrivateNotes: sender || receiver,
    acknowledgeAlerts: sender || receiver || courier,
    acknowledgeDelivery: receiver && awaiting,
    showDeliveryCode: receiver && t.status === "in_transit",
    enterDeliveryCode: courier && awaiting && t.legCourierIds.at(-1) === actor.id,
    addPhotos: (sender || receiver || courier) && PHOTO_STATUSES.includes(t.status),
    readPhotos: sender || receiver || courier,
  };
}
