import { defineEntity, p, type InferEntity } from "@mikro-orm/core";
import type { RunPlace, RunRest } from "@shared/schemas/run";
import { createdAtProperty, idProperty } from "./base";
import { OrganizationSchema } from "./organization.entity";
import { LegSchema, TransferSchema } from "./transfer.entity";
import { UserSchema } from "./user.entity";

const double = () => p.float().columnType("double precision");

/** A courier service's run (issue 16): one van carrying many transfers on one trip. */
export const RunSchema = defineEntity({
  name: "Run",
  tableName: "run",
  properties: {
    id: idProperty(),
    courierOrganization: () => p.manyToOne(OrganizationSchema).ref(),
    departAt: p.datetime(),
    climateControlled: p.boolean(),
    vehicleMinF: double().nullable(),
    vehicleMaxF: double().nullable(),
    /** The service's couriers who drive it. */
    driverIds: p.array().default([]).columnType("uuid[]"),
    /** The plan as last computed: hours at the wheel, road km, the end of the last stop, the rests. */
    drivingH: double().default(0),
    roadKm: double().default(0),
    finishAt: p.datetime(),
    rests: p.json<RunRest[]>().default([]),
    /** Bumped on every change; a PATCH may name the version it saw. */
    version: p.integer().default(1),
    createdBy: () => p.manyToOne(UserSchema).ref(),
    createdAt: createdAtProperty(),
    updatedAt: p
      .datetime()
      .onCreate(() => new Date())
      .onUpdate(() => new Date()),
  },
});
export type Run = InferEntity<typeof RunSchema>;

/** One stop of a run, in order: a transfer's pickup at its origin or drop-off at its destination. */
export const RunStopSchema = defineEntity({
  name: "RunStop",
  tableName: "run_stop",
  properties: {
    id: idProperty(),
    run: () => p.manyToOne(RunSchema).ref().index(),
    position: p.integer(),
    kind: p.enum(["pickup", "dropoff"] as const),
    transfer: () => p.manyToOne(TransferSchema).ref(),
    /** The transfer's leg the run's driver carries, where one is assigned. */
    leg: () => p.manyToOne(LegSchema).ref().nullable(),
    arriveAt: p.datetime(),
    leaveAt: p.datetime(),
    legKm: double().default(0),
    place: p.json<RunPlace>(),
  },
});
export type RunStop = InferEntity<typeof RunStopSchema>;
