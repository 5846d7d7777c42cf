import { defineEntity, p } from "@mikro-orm/core";
import { createdAtProperty, idProperty } from "./base";

/**
 * A remembered submission (IETF httpapi Idempotency-Key draft): a retry with the same key
 * and body gets the stored answer; the same key with another body is refused.
 */
export const IdempotencyKeySchema = defineEntity({
  name: "IdempotencyKey",
  tableName: "idempotency_key",
  uniques: [{ properties: ["actorId", "key"] }],
  properties: {
    id: idProperty(),
    actorId: p.uuid(),
    key: p.string().length(255),
    scope: p.string().length(200),
    requestHash: p.string().length(64),
    status: p.enum(["in_progress", "done"]),
    responseStatus: p.integer().nullable(),
    responseBody: p.json<unknown>().nullable(),
    createdAt: createdAtProperty(),
  },
});
