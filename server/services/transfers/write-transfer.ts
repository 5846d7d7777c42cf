import { KEEPER_ROLES } from "@shared/constants";
import { RegisterEntrySchema } from "../../db/entities/check-in.entity";
import { randomBytes } from "node:crypto";
import type { EntityManager } from "@mikro-orm/postgresql";
import { LockMode, ref, UniqueConstraintViolationException } from "@mikro-orm/core";
import type { TransferInputParsed, TransferPatch } from "@shared/schemas/transfer";
import { type transferPatchSchema } from "@shared/schemas/transfer";
import type { z } from "zod";
import { formatTransferNumber } from "@shared/transfer/number";
import { EDITABLE, statusAfterEdit } from "@shared/transfer/lifecycle";
import { diffTransferDocuments, topLevelField, type EditableDocument } from "@shared/transfer/diff";
import { placeFromZip } from "@shared/temperature/places";
import { jurisdictionName } from "@shared/compliance/jurisdiction";
import type { TaxonRank, TransferStatus } from "@shared/constants";
import { TAXON_RANK_WORDS, TRANSFER_STATUS_WORDS, changedFieldsText } from "@shared/words";
import { isKeeper, type Actor } from "../../auth/actor";
import { OrganizationSchema } from "../../db/entities/organization.entity";
import { UserSchema } from "../../db/entities/user.entity";
import { TaxonSchema } from "../../db/entities/taxon.entity";
import {
  AnimalSchema,
  ContainerSchema,
  TransferChangeSchema,
  TransferSchema,
  type Container,
  type Transfer,
} from "../../db/entities/transfer.entity";
import { conflict, forbidden, invalidField } from "../../http/errors";
import { appendCustody } from "./custody";
import { notifyParty } from "./notify";
import type { AppLinks } from "../../mail/links";

type Address = TransferInputParsed["origin"];
type PatchParsed = z.output<typeof transferPatchSchema>;

/** Coordinates and time zone from the ZIP code (offline table); the ZIP must be in the state given. */
function locate(address: Address, field: "origin" | "destination") {
  const place = placeFromZip(address.zip.slice(0, 5));
  if (place?.state && place.state !== address.state) {
    throw invalidField(
      [field, "zip"],
      `ZIP code ${address.zip} is in ${jurisdictionName(place.state)}, not ${jurisdictionName(address.state)}`,
    );
  }
  return { lat: place?.lat ?? null, lon: place?.lon ?? null, timeZone: place?.timeZone ?? null };
}

function addressColumns(side: "origin" | "destination", address: Address) {
  const geo = locate(address, side);
  return {
    [`${side}Street`]: address.street,
    [`${side}City`]: address.city,
    [`${side}State`]: address.state,
    [`${side}Zip`]: address.zip,
    [`${side}Lat`]: geo.lat,
    [`${side}Lon`]: geo.lon,
    [`${side}TimeZone`]: geo.timeZone,
  };
}

async function resolveReceiver(em: EntityManager, actor: Actor, organizationId: string, contactId: string | null) {
  if (organizationId === actor.organization?.id)
    throw invalidField(["receiverOrganizationId"], "the receiver must be another organisation");
  const org = await em.findOne(OrganizationSchema, { id: organizationId });
  if (!org || org.kind === "courier_service")
    throw invalidField(["receiverOrganizationId"], "choose a keeper organisation");
  // A pending organisation (invited, nobody signed up yet) is a receiver only for whoever invited it.
  if (org.pending && org.invitedBy?.id !== actor.organization?.id)
    throw invalidField(["receiverOrganizationId"], "choose an organisation from the directory, or invite one");
  let contact = null;
  if (contactId) {
    contact = await em.findOne(UserSchema, {
      id: contactId,
      organization: org,
      role: { $in: KEEPER_ROLES },
      disabled: false,
    });
    if (!contact) throw invalidField(["receiverContactId"], "choose a member of the receiving organisation");
  }
  return { org, contact };
}

async function resolveTaxa(em: EntityManager, animals: TransferInputParsed["animals"]) {
  const ids = [...new Set(animals.map((a) => a.taxonId))];
  const taxa = ids.length ? await em.find(TaxonSchema, { id: { $in: ids } }) : [];
  const byId = new Map(taxa.map((t) => [t.id, t]));
  animals.forEach((a, i) => {
    const taxon = byId.get(a.taxonId);
    if (!taxon) throw invalidField(["animals", i, "taxonId"], "this species is not in the catalogue");
    if (!["species", "subspecies", "genus"].includes(taxon.rank))
      throw invalidField(
        ["animals", i, "taxonId"],
        `choose a species, not a ${TAXON_RANK_WORDS[taxon.rank as TaxonRank] ?? "group of species"}`,
      );
  });
  return byId;
}

/**
 * Lines started from the sender's register (issue 15 §2) must name the sender's own entries, of
 * the line's species, holding at least the line's count; one entry may start one line.
 */
async function checkRegisterEntries(em: EntityManager, transfer: Transfer, animals: TransferInputParsed["animals"]) {
  const named = animals.flatMap((a, index) => (a.registerEntryId ? [{ a, index }] : []));
  if (named.length === 0) return;
  const entries = await em.find(RegisterEntrySchema, {
    id: { $in: named.map(({ a }) => a.registerEntryId!) },
    organization: transfer.senderOrganization.id,
  });
  const byId = new Map(entries.map((entry) => [entry.id, entry]));
  const seen = new Set<string>();
  for (const { a, index } of named) {
    const entry = byId.get(a.registerEntryId!);
    const path = ["animals", index, "registerEntryId"];
    if (!entry) throw invalidField(path, "choose an animal of your own register");
    if (seen.has(entry.id)) throw invalidField(path, "this register entry already has a line of its own");
    seen.add(entry.id);
    if (entry.taxon.id !== a.taxonId) throw invalidField(path, "the register entry is of another species");
    if (entry.countInCare < a.count)
      throw invalidField(["animals", index, "count"], `the register holds ${entry.countInCare} of these in your care`);
  }
}

/** Replaces the transfer's boxes and animal lines with the given lists, keeping ids that match. */
async function replaceLines(
  em: EntityManager,
  transfer: Transfer,
  input: Pick<TransferInputParsed, "containers" | "animals">,
) {
  const taxa = await resolveTaxa(em, input.animals);
  const [oldContainers, oldAnimals] = await Promise.all([
    em.find(ContainerSchema, { transfer }),
    em.find(AnimalSchema, { transfer }),
  ]);
  const oldC = new Map(oldContainers.map((c) => [c.id, c]));
  const oldA = new Map(oldAnimals.map((a) => [a.id, a]));
  const byKey = new Map<string, Container>();

  input.containers.forEach((c, position) => {
    if (c.id && !oldC.has(c.id))
      throw invalidField(["containers", position, "id"], "this box is not one of this transfer's");
    const values = {
      key: c.key,
      position,
      label: c.label,
      lengthMm: c.lengthMm,
      widthMm: c.widthMm,
      heightMm: c.heightMm,
      wallMaterial: c.wallMaterial,
      wallThicknessMm: c.wallThicknessMm,
      pack: c.pack,
      sealNumber: c.sealNumber ?? null,
    };
    const entity: Container = c.id
      ? em.assign(oldC.get(c.id)!, values)
      : em.create(ContainerSchema, { ...values, transfer });
    if (c.id) oldC.delete(c.id);
    byKey.set(c.key, entity);
  });
  await checkRegisterEntries(em, transfer, input.animals);
  input.animals.forEach((a, position) => {
    if (a.id && !oldA.has(a.id))
      throw invalidField(["animals", position, "id"], "this animal line is not one of this transfer's");
    const values = {
      position,
      taxon: ref(taxa.get(a.taxonId)!),
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
      container: a.containerKey ? ref(byKey.get(a.containerKey)!) : null,
      registerEntryId:
        a.registerEntryId === undefined ? (a.id ? (oldA.get(a.id)!.registerEntryId ?? null) : null) : a.registerEntryId,
    };
    if (a.id) {
      em.assign(oldA.get(a.id)!, values as never);
      oldA.delete(a.id);
    } else em.create(AnimalSchema, { ...values, transfer } as never);
  });
  for (const gone of oldA.values()) em.remove(gone);
  for (const gone of oldC.values()) em.remove(gone);
}

async function newNumber(em: EntityManager): Promise<string> {
  for (let i = 0; i < 8; i++) {
    const n = formatTransferNumber(new Date().getUTCFullYear(), randomBytes(5));
    if (!(await em.count(TransferSchema, { number: n }))) return n;
  }
  throw conflict("Could not find a free transfer number; try again.");
}

/** The sender drafts a transfer: parties, route, dates, boxes and animals. */
export async function createTransfer({
  em,
  actor,
  input,
}: {
  em: EntityManager;
  actor: Actor;
  input: TransferInputParsed;
}) {
  if (!isKeeper(actor) || !actor.organization)
    throw forbidden("Only a member of a keeper organisation can draft a transfer.");
  return em
    .transactional(async (tx) => {
      const receiver = await resolveReceiver(tx, actor, input.receiverOrganizationId, input.receiverContactId);
      const transfer = tx.create(TransferSchema, {
        number: await newNumber(tx),
        status: "draft",
        version: 1,
        senderOrganization: tx.getReference(OrganizationSchema, actor.organization!.id),
        senderContact: tx.getReference(UserSchema, actor.id),
        receiverOrganization: receiver.org,
        receiverContact: receiver.contact,
        ...(addressColumns("origin", input.origin) as object),
        ...(addressColumns("destination", input.destination) as object),
        mode: input.mode,
        plannedDepartureAt: new Date(input.plannedDepartureAt),
        expectedArrivalAt: new Date(input.expectedArrivalAt),
        purpose: input.purpose,
        sale: input.sale,
        salePriceUsd: input.salePriceUsd ?? null,
        handlingNotes: input.handlingNotes ?? null,
        senderPrivateNotes: input.privateNotes ?? null,
        createdBy: tx.getReference(UserSchema, actor.id),
      } as never) as Transfer;
      await tx.flush();
      await replaceLines(tx, transfer, input);
      await appendCustody(tx, transfer.id, actor, "created", { number: transfer.number, status: "draft" });
      await tx.flush();
      return transfer;
    })
    .catch((err) => {
      if (err instanceof UniqueConstraintViolationException)
        throw conflict("That transfer number was just taken; try again.");
      throw err;
    });
}

/** The editable content of a transfer as one document, for the edit history. */
async function editableDocument(em: EntityManager, t: Transfer): Promise<EditableDocument> {
  const [containers, animals] = await Promise.all([
    em.find(ContainerSchema, { transfer: t }, { orderBy: { position: "asc" } }),
    em.find(AnimalSchema, { transfer: t }, { orderBy: { position: "asc" }, populate: ["taxon"] }),
  ]);
  return {
    receiverOrganizationId: t.receiverOrganization.id,
    receiverContactId: t.receiverContact?.id ?? null,
    origin: { street: t.originStreet, city: t.originCity, state: t.originState, zip: t.originZip },
    destination: {
      street: t.destinationStreet,
      city: t.destinationCity,
      state: t.destinationState,
      zip: t.destinationZip,
    },
    mode: t.mode,
    plannedDepartureAt: t.plannedDepartureAt.toISOString(),
    expectedArrivalAt: t.expectedArrivalAt.toISOString(),
    purpose: t.purpose,
    sale: t.sale,
    salePriceUsd: t.salePriceUsd ?? null,
    handlingNotes: t.handlingNotes ?? null,
    privateNotes: t.senderPrivateNotes ?? null,
    containers: containers.map((c) => ({
      id: c.id,
      label: c.label,
      lengthMm: c.lengthMm,
      widthMm: c.widthMm,
      heightMm: c.heightMm,
      wallMaterial: c.wallMaterial,
      wallThicknessMm: c.wallThicknessMm,
      pack: c.pack,
      sealNumber: c.sealNumber ?? null,
    })),
    animals: animals.map((a) => ({
      id: a.id,
      taxon: a.taxon.getEntity().scientificName,
      count: a.count,
      sex: a.sex,
      identifier: a.identifier ?? null,
      origin: a.origin,
      lengthMm: a.lengthMm ?? null,
      weightG: a.weightG ?? null,
      hatchDate: a.hatchDate ?? null,
      notes: a.notes ?? null,
      box: a.container ? (containers.find((c) => c.id === a.container!.id)?.label ?? null) : null,
    })),
  };
}

/**
 * Edits a transfer the sender may still change. The caller names the version it saw; every
 * changed field is kept with its old and new value; a material change after the receiver
 * confirmed sends the transfer back for confirmation.
 */
export async function updateTransfer({
  em,
  actor,
  transferId,
  input,
  links,
}: {
  em: EntityManager;
  actor: Actor;
  transferId: string;
  /** Where the e-mails this step queues link to (the app's public URL). */
  links: AppLinks;
  input: PatchParsed;
}) {
  return em.transactional(async (tx) => {
    const t = await tx.findOneOrFail(TransferSchema, { id: transferId }, { lockMode: LockMode.PESSIMISTIC_WRITE });
    if (t.version !== input.version)
      throw conflict(
        "Someone changed this transfer after you opened it. Reload to see their changes, then edit again.",
        { currentVersion: t.version },
      );
    if (!EDITABLE.includes(t.status))
      throw conflict(
        `A transfer that is “${TRANSFER_STATUS_WORDS[t.status as TransferStatus]}” can no longer be edited.`,
      );
    const before = await editableDocument(tx, t);

    if (input.receiverOrganizationId !== undefined || input.receiverContactId !== undefined) {
      const r = await resolveReceiver(
        tx,
        actor,
        input.receiverOrganizationId ?? t.receiverOrganization.id,
        input.receiverContactId === undefined ? (t.receiverContact?.id ?? null) : input.receiverContactId,
      );
      t.receiverOrganization = ref(r.org);
      t.receiverContact = r.contact ? ref(r.contact) : null;
    }
    if (input.origin) tx.assign(t, addressColumns("origin", input.origin));
    if (input.destination) tx.assign(t, addressColumns("destination", input.destination));
    if (input.mode !== undefined) t.mode = input.mode;
    if (input.plannedDepartureAt !== undefined) t.plannedDepartureAt = new Date(input.plannedDepartureAt);
    if (input.expectedArrivalAt !== undefined) t.expectedArrivalAt = new Date(input.expectedArrivalAt);
    if (t.expectedArrivalAt <= t.plannedDepartureAt)
      throw invalidField(["expectedArrivalAt"], "make it later than the planned departure");
    if (input.purpose !== undefined) t.purpose = input.purpose;
    if (input.sale !== undefined) t.sale = input.sale;
    if (input.salePriceUsd !== undefined) t.salePriceUsd = input.salePriceUsd ?? null;
    if (input.handlingNotes !== undefined) t.handlingNotes = input.handlingNotes ?? null;
    if (input.privateNotes !== undefined) t.senderPrivateNotes = input.privateNotes ?? null;
    if (input.containers !== undefined || input.animals !== undefined) {
      if (input.containers === undefined || input.animals === undefined) {
        throw invalidField(
          [input.containers === undefined ? "containers" : "animals"],
          "send the boxes and the animal lines together, so every animal names its box",
        );
      }
      await replaceLines(tx, t, { containers: input.containers, animals: input.animals });
    }
    await tx.flush();

    const after = await editableDocument(tx, t);
    const changes = diffTransferDocuments(before, after, {
      container: (c) => String(c.label),
      animal: (a) => `${a.taxon}${a.identifier ? ` ${a.identifier}` : ""}`,
    });
    if (changes.length === 0) return t;
    for (const c of changes) {
      // The sender's private notes stay out of a history the receiver can read.
      const hidden = c.field === "privateNotes" || c.field === "salePriceUsd";
      tx.create(TransferChangeSchema, {
        transfer: t,
        actor: tx.getReference(UserSchema, actor.id),
        field: c.field,
        oldValue: hidden ? "(hidden)" : c.oldValue,
        newValue: hidden ? "(hidden)" : c.newValue,
      });
    }
    const next = statusAfterEdit(
      t.status,
      changes.map((c) => topLevelField(c.field)),
    );
    t.version += 1;
    if (next !== t.status) {
      t.reconfirmationReason = `Changed after confirmation: ${changedFieldsText(changes.map((c) => topLevelField(c.field)))}.`;
      await appendCustody(tx, t.id, actor, "status_change", {
        from: t.status,
        to: next,
        reason: t.reconfirmationReason,
      });
      t.status = next;
      t.confirmedAt = null;
      t.confirmedBy = null;
      await notifyParty(tx, links, t, "receiver", "reconfirm", actor);
    }
    await tx.flush();
    return t;
  });
}

export type { TransferPatch };
