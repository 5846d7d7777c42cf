import type {
  AnimalDto, CheckInDto, ContainerDto, HandoffDto, LegDto, OrgBriefDto, PersonDto, PlaceDto, TransferAbilitiesDto, TransferDto, ViewerRole,
} from "@shared/schemas/transfer";
import type { UsState } from "@shared/constants";
import { handoffKind, handoffsPlanned } from "@shared/transfer/lifecycle";
import { packingFindings } from "@shared/transfer/packing";
import { allAccountedFor, computeDiscrepancies } from "@shared/checkin/discrepancy";
import type { Organization } from "../db/entities/organization.entity";
import type { User } from "../db/entities/user.entity";
import type { Leg, Transfer } from "../db/entities/transfer.entity";
import type { TransferDetail } from "../services/transfers/load";
import { presentTaxon } from "./taxon.presenter";

export function presentOrgBrief(org: Organization): OrgBriefDto {
  return { id: org.id, name: org.name, kind: org.kind, phone: org.phone, email: org.email, address: { street: org.street, city: org.city, state: org.state as UsState, zip: org.zip } };
}

function person(user: User | null | undefined): PersonDto | null {
  return user ? { id: user.id, displayName: user.displayName, email: user.email } : null;
}

function place(t: Transfer, side: "origin" | "destination"): PlaceDto {
  return {
    street: t[`${side}Street`],
    city: t[`${side}City`],
    state: t[`${side}State`] as UsState,
    zip: t[`${side}Zip`],
    lat: t[`${side}Lat`] ?? null,
    lon: t[`${side}Lon`] ?? null,
    timeZone: t[`${side}TimeZone`] ?? null,
  };
}

export function presentLeg(leg: Leg): LegDto {
  const courier = leg.courier.getEntity();
  const org = courier.organization?.getEntity?.() ?? null;
  return {
    id: leg.id,
    sequence: leg.sequence,
    courier: { id: courier.id, displayName: courier.displayName, organizationName: org?.name ?? null, phone: org?.phone ?? null },
    fromLabel: leg.fromLabel ?? null,
    toLabel: leg.toLabel ?? null,
  };
}

/**
 * The transfer as the caller may see it. The courier's view leaves out the price and every
 * private note; each party sees only its own private notes; admins see neither party's.
 */
export function presentTransfer(t: Transfer, detail: TransferDetail, legs: Leg[], role: ViewerRole, abilities: TransferAbilitiesDto): TransferDto {
  const containerKeyById = new Map(detail.containers.map((c) => [c.id, c.key]));
  const containers: ContainerDto[] = detail.containers.map((c) => ({
    id: c.id,
    key: c.key,
    position: c.position,
    label: c.label,
    lengthMm: c.lengthMm,
    widthMm: c.widthMm,
    heightMm: c.heightMm,
    wallMaterial: c.wallMaterial,
    wallThicknessMm: c.wallThicknessMm,
    pack: c.pack,
    sealNumber: c.sealNumber ?? null,
  }));
  const animals: AnimalDto[] = detail.animals.map((a) => ({
    id: a.id,
    position: a.position,
    taxon: presentTaxon(a.taxon.getEntity()),
    count: a.count,
    sex: a.sex,
    identifier: a.identifier ?? null,
    identifierKind: a.identifierKind ?? null,
    origin: a.origin,
    lengthMm: a.lengthMm ?? null,
    lengthKind: a.lengthKind ?? null,
    weightG: a.weightG ?? null,
    hatchDate: a.hatchDate ?? null,
    notes: a.notes ?? null,
    containerId: a.container?.id ?? null,
    containerKey: a.container ? (containerKeyById.get(a.container.id) ?? null) : null,
  }));
  const expectedSeals = new Map(containers.map((c) => [c.id, c.sealNumber]));
  const handoffs: HandoffDto[] = detail.handoffs.map((h) => {
    const p = h.payload as Record<string, unknown> & { seals?: { containerId: string; sealNumber: string | null; intact: boolean }[] };
    return {
      handoffIndex: Number(p.handoffIndex),
      kind: handoffKind(Number(p.handoffIndex), legs.length),
      at: h.at.toISOString(),
      recordedBy: { id: h.actorId ?? "", displayName: h.actorName },
      releasedByName: String(p.releasedByName ?? ""),
      receivedByName: String(p.receivedByName ?? ""),
      boxesExpected: Number(p.boxesExpected ?? 0),
      boxesCounted: Number(p.boxesCounted ?? 0),
      seals: (p.seals ?? []).map((s) => ({ ...s, expected: expectedSeals.get(s.containerId) ?? null })),
      boxTempF: (p.boxTempF as number | null) ?? null,
      place: (p.place as HandoffDto["place"]) ?? { text: null, lat: null, lon: null, accuracyM: null },
      notes: (p.notes as string | null) ?? null,
    };
  });

  let checkIn: CheckInDto | null = null;
  if (detail.checkIn) {
    const ci = detail.checkIn;
    const items = detail.checkInItems.map((i) => ({
      animalId: i.animal.id,
      arrivedWell: i.arrivedWell,
      arrivedProblem: i.arrivedProblem,
      deadOnArrival: i.deadOnArrival,
      missing: i.missing,
      problem: i.problem ?? null,
      weightG: i.weightG ?? null,
      notes: i.notes ?? null,
    }));
    const extras = detail.checkInExtras.map((e) => ({ taxon: presentTaxon(e.taxon.getEntity()), count: e.count, sex: e.sex, notes: e.notes ?? null }));
    const discrepancies = computeDiscrepancies(
      animals.map((a) => ({ id: a.id, taxonId: a.taxon.id, scientificName: a.taxon.scientificName, sex: a.sex, count: a.count })),
      items,
      extras.map((e) => ({ taxonId: e.taxon.id, scientificName: e.taxon.scientificName, sex: e.sex, count: e.count })),
    );
    const signer = ci.signedBy.getEntity();
    checkIn = {
      signedAt: ci.signedAt.toISOString(),
      signedBy: { id: signer.id, displayName: signer.displayName },
      signedName: ci.signedName,
      notes: ci.notes ?? null,
      items,
      extras,
      discrepancies,
      allAccountedFor: allAccountedFor(discrepancies),
    };
  }

  const ownNotes = role === "sender" ? t.senderPrivateNotes : role === "receiver" ? t.receiverPrivateNotes : null;
  return {
    id: t.id,
    number: t.number,
    status: t.status,
    version: t.version,
    viewerRole: role,
    sender: { organization: presentOrgBrief(t.senderOrganization.getEntity()), contact: person(t.senderContact?.getEntity()) },
    receiver: { organization: presentOrgBrief(t.receiverOrganization.getEntity()), contact: person(t.receiverContact?.getEntity()) },
    origin: place(t, "origin"),
    destination: place(t, "destination"),
    mode: t.mode,
    plannedDepartureAt: t.plannedDepartureAt.toISOString(),
    expectedArrivalAt: t.expectedArrivalAt.toISOString(),
    purpose: t.purpose,
    sale: t.sale,
    salePriceUsd: role === "courier" ? null : (t.salePriceUsd ?? null),
    handlingNotes: t.handlingNotes ?? null,
    privateNotes: ownNotes ?? null,
    containers,
    animals,
    legs: legs.map(presentLeg),
    handoffs,
    handoffsPlanned: handoffsPlanned(legs.length),
    packingFindings: packingFindings(
      containers.map((c) => ({ id: c.id, label: c.label })),
      animals.map((a) => ({ id: a.id, containerId: a.containerId, taxonId: a.taxon.id, scientificName: a.taxon.scientificName })),
    ),
    checkIn,
    confirmedAt: t.confirmedAt?.toISOString() ?? null,
    cancelledReason: t.cancelledReason ?? null,
    reconfirmationReason: t.reconfirmationReason ?? null,
    abilities,
    createdAt: t.createdAt.toISOString(),
    updatedAt: t.updatedAt.toISOString(),
  };
}
