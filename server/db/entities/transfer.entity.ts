import { defineEntity, p, type InferEntity } from "@mikro-orm/core";
import {
  ANIMAL_ORIGINS,
  IDENTIFIER_KINDS,
  LENGTH_KINDS,
  PACK_KINDS,
  PURPOSES,
  SEXES,
  TRANSFER_STATUSES,
  TRANSPORT_MODES,
  VEHICLE_CONDITIONINGS,
  WALL_MATERIALS,
  type ParkedKind,
} from "@shared/constants";
import { createdAtProperty, idProperty } from "./base";
import { OrganizationSchema } from "./organization.entity";
import { UserSchema } from "./user.entity";
import { TaxonSchema } from "./taxon.entity";

const double = () => p.float().columnType("double precision");

/** A planned stop as stored on the transfer (the what-if's shape). */
export type StoredStop = { at: string; durationMin: number; parked: ParkedKind };

/** The shared record of one move of animals from a sender to a receiver. */
export const TransferSchema = defineEntity({
  name: "Transfer",
  tableName: "transfer",
  properties: {
    id: idProperty(),
    number: p.string().length(20).unique(),
    status: p.enum([...TRANSFER_STATUSES]).default("draft"),
    /** Bumped on every change; an edit must name the version it saw. */
    version: p.integer().default(1),
    senderOrganization: () => p.manyToOne(OrganizationSchema).ref(),
    senderContact: () => p.manyToOne(UserSchema).ref().nullable(),
    receiverOrganization: () => p.manyToOne(OrganizationSchema).ref(),
    receiverContact: () => p.manyToOne(UserSchema).ref().nullable(),
    originStreet: p.string().length(200),
    originCity: p.string().length(100),
    originState: p.string().length(2),
    originZip: p.string().length(10),
    originLat: double().nullable(),
    originLon: double().nullable(),
    originTimeZone: p.string().length(64).nullable(),
    destinationStreet: p.string().length(200),
    destinationCity: p.string().length(100),
    destinationState: p.string().length(2),
    destinationZip: p.string().length(10),
    destinationLat: double().nullable(),
    destinationLon: double().nullable(),
    destinationTimeZone: p.string().length(64).nullable(),
    mode: p.enum([...TRANSPORT_MODES]),
    plannedDepartureAt: p.datetime(),
    expectedArrivalAt: p.datetime(),
    purpose: p.enum([...PURPOSES]),
    sale: p.boolean(),
    salePriceUsd: double().nullable(),
    handlingNotes: p.text().nullable(),
    senderPrivateNotes: p.text().nullable(),
    receiverPrivateNotes: p.text().nullable(),
    /** When the sender first sent it to the receiver; until then the draft is the sender's alone. */
    firstSentAt: p.datetime().nullable(),
    /** The courier service the sender asked to carry it; its manager assigns its couriers to the legs. */
    courierService: () => p.manyToOne(OrganizationSchema).ref().nullable(),
    confirmedAt: p.datetime().nullable(),
    confirmedBy: () => p.manyToOne(UserSchema).ref().nullable(),
    cancelledReason: p.text().nullable(),
    reconfirmationReason: p.text().nullable(),
    /** How the vehicle is held on a ground trip; null: nobody said (modelled unconditioned). Issue 13. */
    vehicle: p.enum([...VEHICLE_CONDITIONINGS]).nullable(),
    vehicleMinF: double().nullable(),
    vehicleMaxF: double().nullable(),
    /** The driver's planned stops: when, how long, where the vehicle waits. */
    plannedStops: p.json<StoredStop[]>().default([]),
    createdBy: () => p.manyToOne(UserSchema).ref(),
    createdAt: createdAtProperty(),
    updatedAt: p
      .datetime()
      .onCreate(() => new Date())
      .onUpdate(() => new Date()),
  },
});
export type Transfer = InferEntity<typeof TransferSchema>;

export const ContainerSchema = defineEntity({
  name: "Container",
  tableName: "container",
  properties: {
    id: idProperty(),
    transfer: () => p.manyToOne(TransferSchema).ref().index(),
    key: p.string().length(64),
    position: p.integer(),
    label: p.string().length(80),
    lengthMm: double(),
    widthMm: double(),
    heightMm: double(),
    wallMaterial: p.enum([...WALL_MATERIALS]),
    wallThicknessMm: double(),
    pack: p.enum([...PACK_KINDS]),
    sealNumber: p.string().length(60).nullable(),
  },
});
export type Container = InferEntity<typeof ContainerSchema>;

export const AnimalSchema = defineEntity({
  name: "Animal",
  tableName: "animal",
  properties: {
    id: idProperty(),
    transfer: () => p.manyToOne(TransferSchema).ref().index(),
    container: () => p.manyToOne(ContainerSchema).ref().nullable().deleteRule("set null"),
    position: p.integer(),
    taxon: () => p.manyToOne(TaxonSchema).ref(),
    count: p.integer(),
    sex: p.enum([...SEXES]),
    identifier: p.string().length(120).nullable(),
    identifierKind: p.enum([...IDENTIFIER_KINDS]).nullable(),
    origin: p.enum([...ANIMAL_ORIGINS]),
    lengthMm: double().nullable(),
    lengthKind: p.enum([...LENGTH_KINDS]).nullable(),
    weightG: double().nullable(),
    hatchDate: p.date().nullable(),
    notes: p.text().nullable(),
    /** The sender's register entry this line was started from (issue 15 §2). */
    registerEntryId: p.uuid().nullable(),
  },
});
export type Animal = InferEntity<typeof AnimalSchema>;

/** One courier's part of the journey, in order. */
export const LegSchema = defineEntity({
  name: "Leg",
  tableName: "leg",
  properties: {
    id: idProperty(),
    transfer: () => p.manyToOne(TransferSchema).ref().index(),
    sequence: p.integer(),
    courier: () => p.manyToOne(UserSchema).ref().index(),
    fromLabel: p.string().length(120).nullable(),
    toLabel: p.string().length(120).nullable(),
    /** The vehicle the courier declared for this leg; null: not said. Issue 13. */
    vehicle: p.enum([...VEHICLE_CONDITIONINGS]).nullable(),
    vehicleMinF: double().nullable(),
    vehicleMaxF: double().nullable(),
  },
});
export type Leg = InferEntity<typeof LegSchema>;

export const MessageSchema = defineEntity({
  name: "Message",
  tableName: "transfer_message",
  properties: {
    id: idProperty(),
    transfer: () => p.manyToOne(TransferSchema).ref().index(),
    author: () => p.manyToOne(UserSchema).ref(),
    body: p.text(),
    createdAt: createdAtProperty(),
  },
});

/** Every edit: who, when, which field, old value → new value. Append-only. */
export const TransferChangeSchema = defineEntity({
  name: "TransferChange",
  tableName: "transfer_change",
  properties: {
    id: idProperty(),
    transfer: () => p.manyToOne(TransferSchema).ref().index().deleteRule("no action"),
    actor: () => p.manyToOne(UserSchema).ref(),
    field: p.string().length(200),
    oldValue: p.json<unknown>().nullable(),
    newValue: p.json<unknown>().nullable(),
    createdAt: createdAtProperty(),
  },
});
