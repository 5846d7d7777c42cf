import { defineEntity, p, type InferEntity } from "@mikro-orm/core";
import {
  ACQUISITION_WAYS,
  REGISTER_CONDITIONS,
  REGISTER_ENTRY_KINDS,
  REGISTER_EVENT_KINDS,
  REGISTER_STATUSES,
  SEXES,
} from "@shared/constants";
import { createdAtProperty, idProperty } from "./base";
import { AnimalSchema, TransferSchema } from "./transfer.entity";
import { UserSchema } from "./user.entity";
import { TaxonSchema } from "./taxon.entity";
import { OrganizationSchema } from "./organization.entity";

const double = () => p.float().columnType("double precision");

/** The receiver's signed arrival check. One per transfer. */
export const CheckInSchema = defineEntity({
  name: "CheckIn",
  tableName: "check_in",
  properties: {
    id: idProperty(),
    transfer: () => p.oneToOne(TransferSchema).ref().owner().unique(),
    signedBy: () => p.manyToOne(UserSchema).ref(),
    signedName: p.string().length(120),
    signedAt: p.datetime(),
    notes: p.text().nullable(),
  },
});
export type CheckIn = InferEntity<typeof CheckInSchema>;

export const CheckInItemSchema = defineEntity({
  name: "CheckInItem",
  tableName: "check_in_item",
  properties: {
    id: idProperty(),
    checkIn: () => p.manyToOne(CheckInSchema).ref().index(),
    animal: () => p.manyToOne(AnimalSchema).ref(),
    arrivedWell: p.integer(),
    arrivedProblem: p.integer(),
    deadOnArrival: p.integer(),
    missing: p.integer(),
    problem: p.text().nullable(),
    weightG: double().nullable(),
    notes: p.text().nullable(),
  },
});

/** An animal that arrived but was not on the manifest. */
export const CheckInExtraSchema = defineEntity({
  name: "CheckInExtra",
  tableName: "check_in_extra",
  properties: {
    id: idProperty(),
    checkIn: () => p.manyToOne(CheckInSchema).ref().index(),
    taxon: () => p.manyToOne(TaxonSchema).ref(),
    count: p.integer(),
    sex: p.enum([...SEXES]),
    notes: p.text().nullable(),
  },
});

/**
 * The keeper's register (issue 15): one animal with its identifiers, or a group counted together,
 * with what is known of it. Entries from a check-in name the transfer, the animal line and how it
 * arrived (`condition`); entries added by hand or imported have none. What happens to it afterwards
 * is in `register_event` (append-only); `countInCare` and `status` follow from those events and are
 * kept here, in the same transaction, so the register's pages can filter and sort on them.
 */
export const RegisterEntrySchema = defineEntity({
  name: "RegisterEntry",
  tableName: "register_entry",
  properties: {
    id: idProperty(),
    organization: () => p.manyToOne(OrganizationSchema).ref().index(),
    kind: p.enum([...REGISTER_ENTRY_KINDS]).default("group"),
    taxon: () => p.manyToOne(TaxonSchema).ref(),
    sex: p.enum([...SEXES]),
    /** The animals the entry was made with. */
    count: p.integer(),
    identifier: p.string().length(120).nullable(),
    identifierKind: p.string().length(40).nullable(),
    origin: p.string().length(40).nullable(),
    hatchDate: p.date().nullable(),
    dateAcquired: p.date(),
    acquiredHow: p.enum([...ACQUISITION_WAYS]).nullable(),
    sourceOrganization: () => p.manyToOne(OrganizationSchema).ref().nullable(),
    sourceOrganizationName: p.string().length(200).nullable(),
    sourcePermitNumber: p.string().length(120).nullable(),
    transfer: () => p.manyToOne(TransferSchema).ref().nullable(),
    transferNumber: p.string().length(20).nullable(),
    animal: () => p.manyToOne(AnimalSchema).ref().nullable(),
    /** Accepted (well, problem) or a loss recorded at arrival (dead_on_arrival, missing); null when not from a check-in. */
    condition: p.enum([...REGISTER_CONDITIONS]).nullable(),
    notes: p.text().nullable(),
    /** The weight taken at check-in or entry, in grams, when one was. */
    weightG: double().nullable(),
    lengthMm: double().nullable(),
    countInCare: p.integer().default(0),
    status: p.enum([...REGISTER_STATUSES]).default("in_care"),
    quarantineStartedOn: p.date().nullable(),
    quarantineUntil: p.date().nullable(),
    /** The sender's entry this animal's life continues from (a transfer between keepers). */
    previousEntryId: p.uuid().nullable(),
    /** The group this entry was split from. */
    parentEntryId: p.uuid().nullable(),
    permitIds: p.array().default([]).columnType("uuid[]"),
    createdById: p.uuid().nullable(),
    createdAt: createdAtProperty(),
  },
});
export type RegisterEntry = InferEntity<typeof RegisterEntrySchema>;

/** What happened to a register entry; append-only in the database (a correction names the event it replaces). */
export const RegisterEventSchema = defineEntity({
  name: "RegisterEvent",
  tableName: "register_event",
  properties: {
    id: idProperty(),
    entry: () => p.manyToOne(RegisterEntrySchema).ref(),
    organizationId: p.uuid(),
    kind: p.enum([...REGISTER_EVENT_KINDS]),
    on: p.date(),
    count: p.integer(),
    note: p.text().nullable(),
    cause: p.text().nullable(),
    acquiredHow: p.enum([...ACQUISITION_WAYS]).nullable(),
    counterpartyName: p.string().length(200).nullable(),
    counterpartyAddress: p.string().length(300).nullable(),
    counterpartyPermitNumber: p.string().length(120).nullable(),
    correctsEventId: p.uuid().nullable(),
    transferId: p.uuid().nullable(),
    otherEntryId: p.uuid().nullable(),
    weightG: double().nullable(),
    lengthMm: double().nullable(),
    recordedById: p.uuid().nullable(),
    recordedByName: p.string().length(200),
    createdAt: createdAtProperty(),
  },
});
export type RegisterEvent = InferEntity<typeof RegisterEventSchema>;
