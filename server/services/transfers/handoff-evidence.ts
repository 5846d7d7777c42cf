/**
 * What the record knows before a handoff, for the review in shared/custody/handoff-review.ts: the
 * boxes and their seals, the handoffs already recorded, who may take custody. Kept apart from
 * recordHandoff so each check (seals, plausibility, later the box temperature) is one piece.
 */
import type { EntityManager } from "@mikro-orm/postgresql";
import type { z } from "zod";
import type { handoffInputSchema } from "@shared/schemas/transfer";
import type { HandoffReasonKey, ViewerRole } from "@shared/constants";
import { reviewHandoff, type HandoffContext, type HandoffReview } from "@shared/custody/handoff-review";
import { REASON_REQUESTS, type Recorder } from "@shared/words";
import type { Actor } from "../../auth/actor";
import { CustodyEntrySchema } from "../../db/entities/custody-entry.entity";
import { OrganizationSchema } from "../../db/entities/organization.entity";
import { ContainerSchema, type Container, type Leg, type Transfer } from "../../db/entities/transfer.entity";
import { UserSchema } from "../../db/entities/user.entity";
import { invalidField } from "../../http/errors";

type HandoffParsed = z.output<typeof handoffInputSchema>;

/** Whether the time, place and person checks run: always for a person, never for loaded demo or bench data (said on the record). */
export type HandoffChecks = "live" | { loadedAs: "demo" | "bench" };

/** Refuses seal entries that name another transfer's box, name a box twice, or leave an expected number unread. */
function checkSealEntries(input: HandoffParsed, containers: readonly Container[]) {
  const known = new Map(containers.map((c) => [c.id, c]));
  const seen = new Set<string>();
  input.seals.forEach((s, i) => {
    const box = known.get(s.containerId);
    if (!box) throw invalidField(["seals", i, "containerId"], "this box is not one of this transfer's");
    if (seen.has(s.containerId)) throw invalidField(["seals", i, "containerId"], "this box is listed twice");
    seen.add(s.containerId);
    if (box.sealNumber && s.intact && !s.sealNumber?.trim())
      throw invalidField(
        ["seals", i, "sealNumber"],
        `type the seal number you read on ${box.label}, or mark its seal as broken or missing`,
      );
  });
}

/** Names the receiver may sign with: the contact, the organisation, and the person recording when they are the receiver. */
async function receiverNames(em: EntityManager, transfer: Transfer, actor: Actor, role: ViewerRole) {
  const names: string[] = [];
  if (transfer.receiverContact) {
    const contact = await em.findOne(UserSchema, { id: transfer.receiverContact.id }, { fields: ["displayName"] });
    if (contact) names.push(contact.displayName);
  }
  const org = await em.findOne(OrganizationSchema, { id: transfer.receiverOrganization.id }, { fields: ["name"] });
  if (org) names.push(org.name);
  if (role === "receiver") names.push(actor.displayName);
  return names;
}

/**
 * Reviews a handoff against the record (see reviewHandoff) and refuses it, naming the field, when a
 * failed plausibility check has no reason: the message says what failed, so the person can answer.
 */
export async function reviewHandoffAgainstRecord(
  em: EntityManager,
  {
    transfer,
    legs,
    actor,
    role,
    input,
    at,
    checks,
  }: {
    transfer: Transfer;
    legs: readonly Leg[];
    actor: Actor;
    role: ViewerRole;
    input: HandoffParsed;
    at: Date;
    checks: HandoffChecks;
  },
): Promise<{ review: HandoffReview; containers: Container[]; context: HandoffContext }> {
  const containers = await em.find(ContainerSchema, { transfer }, { orderBy: { position: "asc" } });
  checkSealEntries(input, containers);
  const couriers = await em.find(
    UserSchema,
    { id: { $in: legs.map((l) => l.courier.id) } },
    { fields: ["displayName"] },
  );
  const courierName = new Map(couriers.map((c) => [c.id, c.displayName]));
  const previous = await em.find(
    CustodyEntrySchema,
    { transfer, kind: "handoff" },
    { fields: ["at", "payload"], orderBy: { seq: "asc" } },
  );
  const place = (payload: Record<string, unknown>) => (payload.place ?? {}) as Record<string, number | null>;
  const context: HandoffContext = {
    mode: transfer.mode,
    plannedDepartureAt: transfer.plannedDepartureAt.toISOString(),
    originTimeZone: transfer.originTimeZone ?? null,
    origin:
      transfer.originLat != null && transfer.originLon != null
        ? { lat: transfer.originLat, lon: transfer.originLon }
        : null,
    destination:
      transfer.destinationLat != null && transfer.destinationLon != null
        ? { lat: transfer.destinationLat, lon: transfer.destinationLon }
        : null,
    legCourierNames: legs.map((l) => courierName.get(l.courier.id) ?? ""),
    receiverNames: await receiverNames(em, transfer, actor, role),
    containers: containers.map((c) => ({ id: c.id, label: c.label, sealNumber: c.sealNumber ?? null })),
    previous: previous.map((e) => ({
      handoffIndex: Number(e.payload.handoffIndex),
      at: e.at.toISOString(),
      place: {
        lat: place(e.payload).lat ?? null,
        lon: place(e.payload).lon ?? null,
        accuracyM: place(e.payload).accuracyM ?? null,
      },
    })),
  };
  const review = reviewHandoff(
    context,
    {
      handoffIndex: input.handoffIndex,
      boxesCounted: input.boxesCounted,
      seals: input.seals,
      place: input.place,
      receivedByName: input.receivedByName,
      at: at.getTime(),
      recorder: role as Recorder,
      reasons: input.reasons,
    },
    { plausibility: checks === "live" },
  );
  const missing = review.missingReasons[0];
  if (missing) throw reasonNeeded(missing, review);
  return { review, containers, context };
}

/** "Reason for the early pickup: say why … (Pickup recorded 12 days before …)." with every finding for the form. */
function reasonNeeded(key: HandoffReasonKey, review: HandoffReview) {
  const finding = review.findings.find((f) => f.reasonKey === key)!;
  return invalidField(
    ["reasons", key],
    `${REASON_REQUESTS[key]}. ${finding.message.replace(/\.$/, "")}`,
    {
      reasonsNeeded: review.missingReasons,
      findings: review.findings.map((f) => ({ kind: f.kind, message: f.message, reasonKey: f.reasonKey })),
    },
    "reason_needed",
  );
}
