import { defineEntity, p, type InferEntity } from "@mikro-orm/core";
import { ALERT_KINDS } from "@shared/constants";
import { idProperty } from "./base";
import { TransferSchema } from "./transfer.entity";

/**
 * An alert on a transfer (a seal that does not match, a count that differs, an implausible
 * handoff …). Raised by the server in the transaction that records what caused it; the
 * database refuses every change but the one acknowledgement, and every delete (see the migration).
 */
export const TransferAlertSchema = defineEntity({
  name: "TransferAlert",
  tableName: "transfer_alert",
  indexes: [{ properties: ["transfer", "at"] }],
  properties: {
    id: idProperty(),
    transfer: () => p.manyToOne(TransferSchema).ref().deleteRule("restrict").updateRule("restrict"),
    kind: p.enum([...ALERT_KINDS]),
    at: p.datetime(),
    message: p.text(),
    data: p.json<Record<string, unknown>>().default("{}"),
    /** The custody entry that records the raising. */
    custodySeq: p.integer().nullable(),
    acknowledgedAt: p.datetime().nullable(),
    acknowledgedById: p.uuid().nullable(),
    acknowledgedByName: p.string().length(200).nullable(),
    acknowledgementNote: p.text().nullable(),
  },
});
export type TransferAlert = InferEntity<typeof TransferAlertSchema>;
