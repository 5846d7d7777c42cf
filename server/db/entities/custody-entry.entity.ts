import { defineEntity, p, type InferEntity } from "@mikro-orm/core";
import { idProperty } from "./base";
import { TransferSchema } from "./transfer.entity";

/**
 * The chain of custody: append-only, one sequence per transfer, each entry sealed with the
 * hash of the one before. The database refuses UPDATE, DELETE and TRUNCATE on this table
 * (see the migration), and a transfer with entries cannot be deleted.
 */
export const CustodyEntrySchema = defineEntity({
  name: "CustodyEntry",
  tableName: "custody_entry",
  uniques: [{ properties: ["transfer", "seq"] }],
  properties: {
    id: idProperty(),
    transfer: () => p.manyToOne(TransferSchema).ref().deleteRule("restrict").updateRule("restrict"),
    seq: p.integer(),
    kind: p.string().length(40),
    actorId: p.uuid().nullable(),
    actorName: p.string().length(200),
    at: p.datetime(),
    payload: p.json<Record<string, unknown>>(),
    prevHash: p.string().length(64),
    hash: p.string().length(64),
  },
});
export type CustodyEntry = InferEntity<typeof CustodyEntrySchema>;
