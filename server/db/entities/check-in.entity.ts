import { defineEntity, p, type InferEntity } from "@mikro-orm/core";
import { REGISTER_CONDITIONS, SEXES } from "@shared/constants";
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

/** The receiver's collection register: accepted animals, as their permit makes them record. */
export const RegisterEntrySchema = defineEntity({
  name: "RegisterEntry",
  tableName: "register_entry",
  properties: {
    id: idProperty(),
    organization: () => p.manyToOne(OrganizationSchema).ref().index(),
    taxon: () => p.manyToOne(TaxonSchema).ref(),
    sex: p.enum([...SEXES]),
    count: p.integer(),
    identifier: p.string().length(120).nullable(),
    dateAcquired: p.date(),
    sourceOrganization: () => p.manyToOne(OrganizationSchema).ref(),
    sourceOrganizationName: p.string().length(200),
    transfer: () => p.manyToOne(TransferSchema).ref(),
    transferNumber: p.string().length(20),
    animal: () => p.manyToOne(AnimalSchema).ref(),
    /** Accepted (well, problem) or a loss recorded at arrival (dead_on_arrival, missing). */
    condition: p.enum([...REGISTER_CONDITIONS]),
    notes: p.text().nullable(),
    /** The weight taken at check-in, in grams, when one was. */
    weightG: double().nullable(),
    createdAt: createdAtProperty(),
  },
});
export type RegisterEntry = InferEntity<typeof RegisterEntrySchema>;
