import type {
  AlertDto,
  AnimalDto,
  CheckInDto,
  ContainerDto,
  DeliveryDto,
  HandoffDto,
  LegDto,
  LoadedWithoutChecksDto,
  OrgBriefDto,
  PersonDto,
  PhotoDto,
  PlaceDto,
  TaxonBriefDto,
  TransferAbilitiesDto,
  TransferDto,
  ViewerRole,
} from "@shared/schemas/transfer";
import {
  HANDOFF_REASON_KEYS,
  type DeliveryAcknowledgementWay,
  type HandoffReasonKey,
  type UsState,
} from "@shared/constants";
import { sealNumbersMatch } from "@shared/custody/plausibility";
import { handoffKind, handoffsPlanned } from "@shared/transfer/lifecycle";
import { packingFindings } from "@shared/transfer/packing";
import { allAccountedFor, computeDiscrepancies } from "@shared/checkin/discrepancy";
import type { Organization } from "../db/entities/organization.entity";
import type { TaxonRowView, TransferView } from "../services/transfers/read-view";
import type { TransferFacts } from "../policies/transfer.policy";

export function presentOrgBrief(
  org: Pick<Organization, "id" | "name" | "kind" | "phone" | "email" | "street" | "city" | "state" | "zip">,
): OrgBriefDto {
  return {
    id: org.id,
    name: org.name,
    kind: org.kind,
    phone: org.phone,
    email: org.email,
    address: { street: org.street, city: org.city, state: org.state as UsState, zip: org.zip },
  };
}

const iso = (s: string) => new Date(s).toISOString();

function presentAlert(a: TransferView["alerts"][number]): AlertDto {
  return {
    id: a.id,
    kind: a.kind,
    at: iso(a.at),
    message: a.message,
    acknowledgedAt: a.acknowledged_at ? iso(a.acknowledged_at) : null,
    acknowledgedBy: a.acknowledged_at
      ? { id: a.acknowledged_by_id, displayName: a.acknowledged_by_name ?? "Unknown" }
      : null,
    acknowledgementNote: a.acknowledgement_note,
  };
}

function taxon(x: TaxonRowView): TaxonBriefDto {
  return {
    id: x.id,
    scientificName: x.scientific_name,
    commonName: x.common_names[0] ?? null,
    venomous: x.venomous,
    profileGroup: x.profile_group,
    rank: x.rank,
  };
}

function place(v: TransferView["t"], side: "origin" | "destination"): PlaceDto {
  return {
    street: v[`${side}_street`],
    city: v[`${side}_city`],
    state: v[`${side}_state`] as UsState,
    zip: v[`${side}_zip`],
    lat: v[`${side}_lat`],
    lon: v[`${side}_lon`],
    timeZone: v[`${side}_time_zone`],
  };
}

const person = (p: TransferView["senderContact"]): PersonDto | null =>
  p ? { id: p.id, displayName: p.display_name, email: p.email } : null;

/** What the policy needs to know about a transfer, from its view. */
export function factsOfView(v: TransferView): TransferFacts {
  return {
    status: v.t.status,
    senderOrganizationId: v.t.sender_organization_id,
    receiverOrganizationId: v.t.receiver_organization_id,
    legCourierIds: v.legs.map((l) => l.courier_id),
    handoffsDone: v.handoffs.length,
    everSent: v.t.first_sent_at != null,
    courierServiceId: v.t.courier_service_id,
  };
}

/**
 * The transfer as the caller may see it. The courier's view leaves out the price and every
 * private note; each party sees only its own private notes; admins see neither party's.
 */
export function presentTransfer(v: TransferView, role: ViewerRole, abilities: TransferAbilitiesDto): TransferDto {
  const keyById = new Map(v.containers.map((c) => [c.id, c.key]));
  const containers: ContainerDto[] = v.containers.map((c) => ({
    id: c.id,
    key: c.key,
    position: c.position,
    label: c.label,
    lengthMm: c.length_mm,
    widthMm: c.width_mm,
    heightMm: c.height_mm,
    wallMaterial: c.wall_material,
    wallThicknessMm: c.wall_thickness_mm,
    pack: c.pack,
    sealNumber: c.seal_number,
  }));
  const animals: AnimalDto[] = v.animals.map((a) => ({
    id: a.id,
    position: a.position,
    taxon: taxon(a.taxon),
    count: a.count,
    sex: a.sex,
    identifier: a.identifier,
    identifierKind: a.identifier_kind,
    origin: a.origin,
    lengthMm: a.length_mm,
    lengthKind: a.length_kind,
    weightG: a.weight_g,
    hatchDate: a.hatch_date,
    notes: a.notes,
    containerId: a.container_id,
    containerKey: a.container_id ? (keyById.get(a.container_id) ?? null) : null,
  }));
  const legs: LegDto[] = v.legs.map((l) => ({
    id: l.id,
    sequence: l.sequence,
    fromLabel: l.from_label,
    toLabel: l.to_label,
    courier: { id: l.courier_id, displayName: l.courier_name, organizationName: l.org_name, phone: l.org_phone },
  }));
  const handoffs: HandoffDto[] = v.handoffs.map((h) => presentHandoff(h, legs.length));
  const delivery = presentDelivery(v, legs.length);

  let checkIn: CheckInDto | null = null;
  if (v.checkIn) {
    const ci = v.checkIn;
    const items = ci.items.map((i) => ({
      animalId: i.animal_id,
      arrivedWell: i.arrived_well,
      arrivedProblem: i.arrived_problem,
      deadOnArrival: i.dead_on_arrival,
      missing: i.missing,
      problem: i.problem,
      weightG: i.weight_g,
      notes: i.notes,
    }));
    const extras = ci.extras.map((e) => ({ taxon: taxon(e.taxon), count: e.count, sex: e.sex, notes: e.notes }));
    const discrepancies = computeDiscrepancies(
      animals.map((a) => ({
        id: a.id,
        taxonId: a.taxon.id,
        scientificName: a.taxon.scientificName,
        sex: a.sex,
        count: a.count,
      })),
      items,
      extras.map((e) => ({ taxonId: e.taxon.id, scientificName: e.taxon.scientificName, sex: e.sex, count: e.count })),
    );
    checkIn = {
      signedAt: iso(ci.signed_at),
      signedBy: { id: ci.signed_by_id, displayName: ci.signed_by_name },
      signedName: ci.signed_name,
      notes: ci.notes,
      items,
      extras,
      discrepancies,
      allAccountedFor: allAccountedFor(discrepancies),
    };
  }

  const t = v.t;
  const ownNotes = role === "sender" ? t.sender_private_notes : role === "receiver" ? t.receiver_private_notes : null;
  return {
    id: t.id,
    number: t.number,
    status: t.status,
    version: t.version,
    viewerRole: role,
    sender: { organization: presentOrgBrief(v.sender), contact: person(v.senderContact) },
    receiver: { organization: presentOrgBrief(v.receiver), contact: person(v.receiverContact) },
    origin: place(t, "origin"),
    destination: place(t, "destination"),
    mode: t.mode,
    plannedDepartureAt: iso(t.planned_departure_at),
    expectedArrivalAt: iso(t.expected_arrival_at),
    purpose: t.purpose,
    sale: t.sale,
    salePriceUsd: role === "courier" ? null : t.sale_price_usd,
    handlingNotes: t.handling_notes,
    privateNotes: ownNotes,
    containers,
    animals,
    legs,
    handoffs,
    handoffsPlanned: handoffsPlanned(legs.length),
    packingFindings: packingFindings(
      containers.map((c) => ({ id: c.id, label: c.label })),
      animals.map((a) => ({
        id: a.id,
        containerId: a.containerId,
        taxonId: a.taxon.id,
        scientificName: a.taxon.scientificName,
      })),
    ),
    checkIn,
    confirmedAt: t.confirmed_at ? iso(t.confirmed_at) : null,
    cancelledReason: t.cancelled_reason,
    reconfirmationReason: t.reconfirmation_reason,
    loadedWithoutChecks: presentChecksSkipped(v.checksSkipped),
    courierService: v.courierService,
    runId: v.runId ?? null,
    alerts: v.alerts.map(presentAlert),
    delivery,
    photos: abilities.readPhotos ? v.photos.map((p) => presentPhoto(t.id, p)) : [],
    abilities,
    createdAt: iso(t.created_at),
    updatedAt: iso(t.updated_at),
  };
}

/** The skipped-checks custody entry as the API shows it; anything malformed reads as "not checked" all the same. */
function presentChecksSkipped(entry: TransferView["checksSkipped"]): LoadedWithoutChecksDto | null {
  if (!entry) return null;
  const { loadedAs, checksNotRun } = entry.payload;
  return {
    loadedAs: loadedAs === "bench" ? "bench" : "demo",
    checksNotRun: Array.isArray(checksNotRun) ? checksNotRun.map(String) : [],
    at: iso(entry.at),
  };
}

type HandoffPayload = Record<string, unknown> & {
  seals?: {
    containerId: string;
    sealNumber: string | null;
    expected?: string | null;
    matches?: boolean;
    intact: boolean;
  }[];
  sealsUnchecked?: string[];
  reasons?: Record<string, unknown>;
  plausibility?: { notChecked?: unknown };
};

/** A recorded handoff as it was recorded: the seal numbers on record then, not the box's number now. */
function presentHandoff(h: TransferView["handoffs"][number], legCount: number): HandoffDto {
  const p = h.payload as HandoffPayload;
  const index = Number(p.handoffIndex);
  const reasons: Partial<Record<HandoffReasonKey, string>> = {};
  for (const key of HANDOFF_REASON_KEYS) {
    const reason = p.reasons?.[key];
    if (typeof reason === "string" && reason) reasons[key] = reason;
  }
  const notChecked = p.plausibility?.notChecked;
  return {
    handoffIndex: index,
    kind: handoffKind(index, legCount),
    at: iso(h.at),
    recordedBy: { id: h.actor_id ?? "", displayName: h.actor_name },
    releasedByName: String(p.releasedByName ?? ""),
    receivedByName: String(p.receivedByName ?? ""),
    boxesExpected: Number(p.boxesExpected ?? 0),
    boxesCounted: Number(p.boxesCounted ?? 0),
    seals: (p.seals ?? []).map((s) => {
      const expected = s.expected ?? null;
      return {
        containerId: s.containerId,
        sealNumber: s.sealNumber,
        expected,
        matches: typeof s.matches === "boolean" ? s.matches : sealNumbersMatch(expected, s.sealNumber),
        intact: s.intact,
      };
    }),
    sealsUnchecked: Array.isArray(p.sealsUnchecked) ? p.sealsUnchecked.map(String) : [],
    boxTempF: (p.boxTempF as number | null) ?? null,
    place: (p.place as HandoffDto["place"]) ?? { text: null, lat: null, lon: null, accuracyM: null },
    notes: (p.notes as string | null) ?? null,
    reasons,
    notChecked: Array.isArray(notChecked) ? notChecked.map(String) : [],
  };
}

const WAYS: readonly DeliveryAcknowledgementWay[] = ["recorded_by_receiver", "receiver_account", "one_time_code"];

/**
 * The delivery to the receiver once recorded. Recorded by the courier alone it waits for the
 * receiver's acknowledgement (a custody entry); recorded by the receiver it is acknowledged then.
 */
function presentDelivery(v: TransferView, legCount: number): DeliveryDto | null {
  if (legCount === 0) return null;
  const recorded = v.handoffs.find((h) => Number(h.payload.handoffIndex) === legCount);
  if (!recorded) return null;
  const base = {
    recordedAt: iso(recorded.at),
    recordedBy: { id: recorded.actor_id, displayName: recorded.actor_name },
  };
  const ack = v.deliveryAcknowledged;
  if (ack) {
    const way = WAYS.find((w) => w === ack.payload.way) ?? null;
    const name = typeof ack.payload.receiverName === "string" ? ack.payload.receiverName : ack.actor_name;
    return {
      ...base,
      state: "acknowledged",
      acknowledgedAt: iso(ack.at),
      acknowledgedBy: { id: way === "receiver_account" ? ack.actor_id : null, displayName: name },
      way,
    };
  }
  if (recorded.payload.receiverAcknowledgement === "pending")
    return { ...base, state: "awaiting_receiver", acknowledgedAt: null, acknowledgedBy: null, way: null };
  // Recorded by the receiver (or before acknowledgements were kept): the recording is the acknowledgement.
  return {
    ...base,
    state: "acknowledged",
    acknowledgedAt: base.recordedAt,
    acknowledgedBy: base.recordedBy,
    way: recorded.payload.receiverAcknowledgement === "recorded_by_receiver" ? "recorded_by_receiver" : null,
  };
}

function presentPhoto(transferId: string, p: TransferView["photos"][number]): PhotoDto {
  return {
    id: p.id,
    moment: p.moment,
    handoffIndex: p.handoff_index,
    subject: p.subject,
    containerId: p.container_id,
    animalId: p.animal_id,
    caption: p.caption,
    contentType: p.content_type,
    sizeBytes: p.size_bytes,
    sha256: p.sha256,
    uploadedBy: { id: p.uploaded_by_id, displayName: p.uploaded_by_name },
    at: iso(p.created_at),
    url: `/api/transfers/${transferId}/photos/${p.id}`,
  };
}
