import type { EntityManager } from "@mikro-orm/postgresql";
import { LockMode } from "@mikro-orm/core";
import { todayUtc } from "@shared/compliance/expiry";
import { addDays } from "@shared/temperature/zoned-time";
import {
  countInCare,
  firstShortfall,
  KINDS_WITH_COUNTERPARTY,
  statusOf,
  type LedgerEvent,
} from "@shared/register/ledger";
import type { RegisterEntryParsed, RegisterEventParsed } from "@shared/schemas/register";
import type { AcquisitionWay, RegisterEventKind } from "@shared/constants";
import { formatDate } from "@shared/dates";
import { isKeeper, type Actor } from "../../auth/actor";
import { RegisterEntrySchema, RegisterEventSchema, type RegisterEntry } from "../../db/entities/check-in.entity";
import { quarantineDaysFor } from "@shared/register/quarantine";
import { OrganizationSchema } from "../../db/entities/organization.entity";
import { PermitDocumentSchema } from "../../db/entities/compliance.entity";
import { TaxonSchema } from "../../db/entities/taxon.entity";
import { conflict, forbidden, invalidField, notFound } from "../../http/errors";

/** Close catalogue names for a name the catalogue does not hold. */
export type SuggestSpecies = (name: string) => Promise<{ scientificName: string; commonName: string | null }[]>;

/** The keeper organisation whose register this is; other users have none. */
export function registerOwner(actor: Actor): string {
  if (!isKeeper(actor) || !actor.organization)
    throw forbidden("The collection register belongs to a keeper organisation.");
  return actor.organization.id;
}

/**
 * One of the caller's entries; another organisation's entry is "not found" (404), so its
 * existence is not revealed. `lock` takes the row for the rest of the transaction.
 */
export async function loadEntryForActor(
  em: EntityManager,
  actor: Actor,
  id: string,
  lock = false,
): Promise<RegisterEntry> {
  const organizationId = registerOwner(actor);
  const entry = await em.findOne(
    RegisterEntrySchema,
    { id, organization: organizationId },
    lock ? { lockMode: LockMode.PESSIMISTIC_WRITE } : {},
  );
  if (!entry) throw notFound("That register entry");
  return entry;
}

/**
 * The catalogue's species for a scientific name (or an older synonym). Register entries are
 * kept per species: a genus or family is refused, an unknown name is refused with close names.
 */
export async function speciesByName(
  em: EntityManager,
  name: string,
  suggest: SuggestSpecies,
  path: (string | number)[] = ["scientificName"],
): Promise<{ id: string; scientificName: string }> {
  const rows = await em.getConnection().execute<{ id: string; scientific_name: string; rank: string }[]>(
    `SELECT t.id, t.scientific_name, t.rank FROM taxon_name tn JOIN taxon t ON t.id = tn.taxon_id
      WHERE lower(tn.name) = lower(?) AND tn.kind IN ('scientific', 'synonym')
      ORDER BY (tn.kind = 'scientific') DESC LIMIT 1`,
    [name.trim()],
  );
  const found = rows[0];
  if (!found) {
    const shown = name.trim().slice(0, 100);
    const suggestions = shown.length >= 2 ? await suggest(shown) : [];
    const hint = suggestions.length ? ` Did you mean ${suggestions.map((s) => s.scientificName).join(", ")}?` : "";
    throw invalidField(path, `“${shown}” is not in the species list.${hint}`, { suggestions }, "unknown_species");
  }
  if (found.rank !== "species" && found.rank !== "subspecies")
    throw invalidField(path, `choose a species: “${found.scientific_name}” is a ${found.rank}`);
  return { id: found.id, scientificName: found.scientific_name };
}

/** The events of some entries in the ledger's terms. */
export async function ledgerEventsOf(
  em: EntityManager,
  entryIds: string[],
): Promise<(LedgerEvent & { createdAt: Date })[]> {
  if (entryIds.length === 0) return [];
  const rows = await em.find(
    RegisterEventSchema,
    { entry: { $in: entryIds } },
    { orderBy: { on: "asc", createdAt: "asc" } },
  );
  return rows.map((row) => ({
    id: row.id,
    entryId: row.entry.id,
    kind: row.kind,
    on: String(row.on),
    count: row.count,
    correctsEventId: row.correctsEventId ?? null,
    createdAt: row.createdAt,
  }));
}

type EventFields = {
  kind: RegisterEventKind;
  on: string;
  count: number;
  note?: string | null;
  cause?: string | null;
  acquiredHow?: AcquisitionWay | null;
  counterparty?: { name?: string | null; address?: string | null; permitNumber?: string | null } | null;
  correctsEventId?: string | null;
  transferId?: string | null;
  otherEntryId?: string | null;
  weightG?: number | null;
  lengthMm?: number | null;
};

/**
 * Appends an event to an entry (locked by the caller) and brings the entry's count in care and
 * status up to date in the same unit of work. Refuses a day in the future or before the entry
 * began, and any event that would leave fewer than none in care on some day.
 */
export async function appendEvent(
  em: EntityManager,
  entry: RegisterEntry,
  actor: { id: string | null; displayName: string },
  fields: EventFields,
  options: { today?: string; known?: LedgerEvent[] } = {},
) {
  const today = options.today ?? todayUtc();
  if (fields.on > today) throw invalidField(["on"], "give a day that has passed (or today)");
  const events = options.known ?? (await ledgerEventsOf(em, [entry.id]));
  const begins = events.find((event) => event.kind !== "voided")?.on;
  if (begins && fields.on < begins && fields.kind !== "voided")
    throw invalidField(["on"], `make it on or after ${formatDate(begins)}, when the entry begins`);
  const candidate: LedgerEvent = {
    id: "new",
    entryId: entry.id,
    kind: fields.kind,
    on: fields.on,
    count: fields.count,
    correctsEventId: fields.correctsEventId ?? null,
  };
  const shortfall = firstShortfall(events, candidate);
  if (shortfall)
    throw invalidField(
      ["count"],
      `that leaves fewer than none in care on ${formatDate(shortfall)}: give at most the animals held then`,
    );
  const event = em.create(RegisterEventSchema, {
    entry,
    organizationId: entry.organization.id,
    kind: fields.kind,
    on: fields.on,
    count: fields.count,
    note: fields.note ?? null,
    cause: fields.cause ?? null,
    acquiredHow: fields.acquiredHow ?? null,
    counterpartyName: fields.counterparty?.name ?? null,
    counterpartyAddress: fields.counterparty?.address ?? null,
    counterpartyPermitNumber: fields.counterparty?.permitNumber ?? null,
    correctsEventId: fields.correctsEventId ?? null,
    transferId: fields.transferId ?? null,
    otherEntryId: fields.otherEntryId ?? null,
    weightG: fields.weightG ?? null,
    lengthMm: fields.lengthMm ?? null,
    recordedById: actor.id,
    recordedByName: actor.displayName,
  });
  const after = [...events, { ...candidate, id: event.id }];
  // The count follows the standing events (corrections applied).
  entry.countInCare = Math.max(0, countInCare(after));
  entry.status = statusOf(after);
  if (fields.weightG != null) entry.weightG = fields.weightG;
  if (fields.lengthMm != null) entry.lengthMm = fields.lengthMm;
  if (options.known) options.known.push({ ...candidate, id: event.id });
  return event;
}

/**
 * The quarantine length for an entry's species in its organisation: the organisation's length, or
 * the one it set for the genus or the species (D36, "boas longer" [practice]).
 */
export async function quarantineLengthFor(em: EntityManager, organizationId: string, taxonId: string) {
  const organization = await em.findOneOrFail(
    OrganizationSchema,
    { id: organizationId },
    { fields: ["quarantineDays", "quarantineOverrides"] },
  );
  const taxon = await em.findOneOrFail(TaxonSchema, { id: taxonId }, { fields: ["scientificName"] });
  return quarantineDaysFor(taxon.scientificName, organization.quarantineDays, organization.quarantineOverrides ?? []);
}

/** Starts (or restarts) an entry's quarantine on `on` for the length its species takes there. */
export async function startQuarantine(em: EntityManager, entry: RegisterEntry, on: string, days?: number) {
  const length = days ?? (await quarantineLengthFor(em, entry.organization.id, entry.taxon.id));
  entry.quarantineStartedOn = on;
  entry.quarantineUntil = addDays(on, length);
}

/** The permits of the organisation among `ids`; another organisation's id is refused. */
async function ownPermits(em: EntityManager, organizationId: string, ids: string[] | undefined) {
  if (!ids?.length) return [];
  const unique = [...new Set(ids)];
  const found = await em.find(
    PermitDocumentSchema,
    { id: { $in: unique }, organization: organizationId },
    { fields: ["id"] },
  );
  const known = new Set(found.map((permit) => permit.id));
  const index = unique.findIndex((id) => !known.has(id));
  if (index >= 0) throw invalidField(["permitIds", index], "choose one of your organisation's permits");
  return unique;
}

/** `POST /api/register/entries`: an animal or group already in the keeper's care. */
export async function createEntry({
  em,
  actor,
  input,
  suggest,
  path = [],
}: {
  em: EntityManager;
  actor: Actor;
  input: RegisterEntryParsed;
  suggest: SuggestSpecies;
  /** Where the fields sit in what was sent (an import row names its own). */
  path?: (string | number)[];
}): Promise<RegisterEntry> {
  const organizationId = registerOwner(actor);
  if (input.acquiredOn > todayUtc())
    throw invalidField([...path, "acquiredOn"], "give a day that has passed (or today)");
  const species = await speciesByName(em, input.scientificName, suggest, [...path, "scientificName"]);
  const permitIds = await ownPermits(em, organizationId, input.permitIds);
  const acquiredHow = input.acquiredHow ?? "other";
  const entry = em.create(RegisterEntrySchema, {
    organization: em.getReference(OrganizationSchema, organizationId),
    kind: input.identifier || input.count === 1 ? "individual" : "group",
    taxon: em.getReference(TaxonSchema, species.id),
    sex: input.sex,
    count: input.count,
    identifier: input.identifier ?? null,
    identifierKind: input.identifierKind ?? null,
    origin: input.origin ?? null,
    hatchDate: input.hatchDate ?? null,
    dateAcquired: input.acquiredOn,
    acquiredHow,
    sourceOrganizationName: input.source?.name ?? null,
    sourcePermitNumber: input.source?.permitNumber ?? null,
    notes: input.notes ?? null,
    weightG: input.weightG ?? null,
    lengthMm: input.lengthMm ?? null,
    permitIds,
    createdById: actor.id,
    countInCare: 0,
    status: "in_care",
  });
  // Bred here when the hatch day is the day it entered the register and no one supplied it.
  const hatchedHere = input.hatchDate === input.acquiredOn && !input.source?.name;
  await appendEvent(
    em,
    entry,
    actor,
    {
      kind: hatchedHere ? "hatched" : "acquired",
      on: input.acquiredOn,
      count: input.count,
      acquiredHow: hatchedHere ? null : acquiredHow,
      counterparty: input.source ? { name: input.source.name, permitNumber: input.source.permitNumber } : null,
      weightG: input.weightG ?? null,
      lengthMm: input.lengthMm ?? null,
    },
    { known: [] },
  );
  if (input.startQuarantine) await startQuarantine(em, entry, input.acquiredOn);
  return entry;
}

/** `POST /api/register/entries/:id/events`. */
export async function recordEvent({
  em,
  actor,
  entryId,
  input,
}: {
  em: EntityManager;
  actor: Actor;
  entryId: string;
  input: RegisterEventParsed;
}) {
  return em.transactional(async (tx) => {
    const entry = await loadEntryForActor(tx, actor, entryId, true);
    const events = await ledgerEventsOf(tx, [entry.id]);
    if (input.corrects) {
      const target = events.find((event) => event.id === input.corrects);
      if (!target) throw invalidField(["corrects"], "choose an event of this entry");
      if (events.some((event) => event.correctsEventId === target.id))
        throw conflict("That event was already corrected: correct the correction instead.");
      if (target.kind === "voided")
        throw invalidField(["corrects"], "a withdrawal cannot be corrected; record the event again");
    }
    const counts = input.kind !== "measured" && input.kind !== "note" && input.kind !== "voided";
    const count = counts ? (input.count ?? (entry.kind === "individual" ? 1 : undefined)) : 0;
    if (count === undefined) throw invalidField(["count"], "say how many animals of the group this concerns");
    if (counts && count < 1) throw invalidField(["count"], "give at least 1");
    if (entry.kind === "individual" && (input.kind === "acquired" || input.kind === "hatched") && !input.corrects)
      throw invalidField(["kind"], "this entry is one animal: add the new animals as an entry of their own");
    if (KINDS_WITH_COUNTERPARTY.includes(input.kind) && !input.counterparty?.name)
      throw invalidField(["counterparty", "name"], "say to whom the animals went");
    const event = await appendEvent(
      tx,
      entry,
      actor,
      {
        kind: input.kind,
        on: input.on,
        count,
        note: input.note ?? null,
        cause: input.cause ?? null,
        acquiredHow: input.kind === "acquired" ? (input.acquiredHow ?? "other") : null,
        counterparty: input.counterparty ?? null,
        correctsEventId: input.corrects ?? null,
        weightG: input.weightG ?? null,
        lengthMm: input.lengthMm ?? null,
      },
      { known: events },
    );
    // Adding animals to a group in quarantine restarts the group's clock [practice: SOURCES.md].
    if ((input.kind === "acquired" || input.kind === "loan_returned") && entry.quarantineUntil && !input.corrects)
      await startQuarantine(tx, entry, input.on);
    await tx.flush();
    return { entry, event };
  });
}

/** `POST /api/register/entries/:id/split`: some animals of a group become an entry of their own. */
export async function splitEntry({
  em,
  actor,
  entryId,
  input,
}: {
  em: EntityManager;
  actor: Actor;
  entryId: string;
  input: {
    count: number;
    on: string;
    identifier?: string | null;
    sex?: "male" | "female" | "unknown";
    note?: string | null;
  };
}) {
  return em.transactional(async (tx) => {
    const parent = await loadEntryForActor(tx, actor, entryId, true);
    if (parent.kind === "individual")
      throw invalidField(["count"], "this entry is one animal: only a group can be split");
    if (input.identifier && input.count !== 1)
      throw invalidField(["count"], "an identifier names one animal: make the count 1");
    const child = tx.create(RegisterEntrySchema, {
      organization: parent.organization,
      kind: input.identifier || input.count === 1 ? "individual" : "group",
      taxon: parent.taxon,
      sex: input.sex ?? parent.sex,
      count: input.count,
      identifier: input.identifier ?? null,
      identifierKind: null,
      origin: parent.origin,
      hatchDate: parent.hatchDate,
      dateAcquired: parent.dateAcquired,
      acquiredHow: parent.acquiredHow,
      sourceOrganization: parent.sourceOrganization,
      sourceOrganizationName: parent.sourceOrganizationName,
      sourcePermitNumber: parent.sourcePermitNumber,
      transfer: parent.transfer,
      transferNumber: parent.transferNumber,
      notes: input.note ?? null,
      permitIds: [...parent.permitIds],
      quarantineStartedOn: parent.quarantineStartedOn,
      quarantineUntil: parent.quarantineUntil,
      parentEntryId: parent.id,
      previousEntryId: parent.previousEntryId,
      createdById: actor.id,
      countInCare: 0,
      status: "in_care",
    });
    await appendEvent(tx, parent, actor, {
      kind: "split_off",
      on: input.on,
      count: input.count,
      note: input.note ?? null,
      otherEntryId: child.id,
    });
    await appendEvent(
      tx,
      child,
      actor,
      { kind: "split_from", on: input.on, count: input.count, note: input.note ?? null, otherEntryId: parent.id },
      { known: [] },
    );
    await tx.flush();
    return child;
  });
}
