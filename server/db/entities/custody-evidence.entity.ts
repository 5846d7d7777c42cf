import { defineEntity, p, type InferEntity } from "@mikro-orm/core";
import { PHOTO_MOMENTS, PHOTO_SUBJECTS } from "@shared/constants";
import { PHOTO_CONTENT_TYPES } from "@shared/custody/photo-type";
import { createdAtProperty, idProperty } from "./base";
import { TransferSchema } from "./transfer.entity";

/**
 * A photo taken at a handoff or at the check-in: the box from outside, a seal, an animal. Evidence,
 * like the custody entry that records its adding: the database refuses every change and delete.
 * The object lives in S3 under a key of ours; the row is written only once the object is stored.
 */
export const TransferPhotoSchema = defineEntity({
  name: "TransferPhoto",
  tableName: "transfer_photo",
  indexes: [{ properties: ["transfer", "createdAt"] }],
  properties: {
    id: idProperty(),
    transfer: () => p.manyToOne(TransferSchema).ref().deleteRule("restrict").updateRule("restrict"),
    moment: p.enum([...PHOTO_MOMENTS]),
    /** The handoff it belongs to (0 is the pickup); null for the check-in. */
    handoffIndex: p.integer().nullable(),
    subject: p.enum([...PHOTO_SUBJECTS]),
    /** The box or animal line it shows, when one was named. */
    containerId: p.uuid().nullable(),
    animalId: p.uuid().nullable(),
    caption: p.string().length(200).nullable(),
    storageKey: p.string().length(300).unique(),
    sha256: p.string().length(64),
    contentType: p.enum([...PHOTO_CONTENT_TYPES]),
    sizeBytes: p.integer(),
    uploadedById: p.uuid(),
    uploadedByName: p.string().length(200),
    /** The custody entry that records the adding. */
    custodySeq: p.integer(),
    createdAt: createdAtProperty(),
  },
});
export type TransferPhoto = InferEntity<typeof TransferPhotoSchema>;

/**
 * A one-time code the receiver shows in their own account so the courier can record the receiver's
 * acknowledgement of a delivery on the courier's phone. Only its SHA-256 is kept; it expires within
 * minutes, is used once, and dies after a few wrong tries.
 */
export const DeliveryCodeSchema = defineEntity({
  name: "DeliveryCode",
  tableName: "delivery_code",
  indexes: [{ properties: ["transfer", "createdAt"] }],
  properties: {
    id: idProperty(),
    transfer: () => p.manyToOne(TransferSchema).ref().deleteRule("restrict").updateRule("restrict"),
    codeHash: p.string().length(64),
    issuedById: p.uuid(),
    issuedByName: p.string().length(200),
    expiresAt: p.datetime(),
    usedAt: p.datetime().nullable(),
    usedById: p.uuid().nullable(),
    /** Set when a newer code replaced it or too many wrong codes were tried. */
    revokedAt: p.datetime().nullable(),
    failedAttempts: p.integer().default(0),
    createdAt: createdAtProperty(),
  },
});
export type DeliveryCode = InferEntity<typeof DeliveryCodeSchema>;
