/**
 * Photos at the handoffs and the check-in (issue 12): the box from outside, a seal, an animal.
 * Stored like permit scans (D10): the type is read from the bytes, the key is ours, the SHA-256 is
 * kept, the object is written first and the row second. Each photo is also a custody entry, so the
 * chain covers its checksum; the row and the entry cannot be changed or removed.
 */
import { createHash, randomUUID } from "node:crypto";
import type { EntityManager } from "@mikro-orm/postgresql";
import { LockMode } from "@mikro-orm/core";
import { LIMITS, type PhotoMoment, type PhotoSubject } from "@shared/constants";
import { sniffScanType } from "@shared/compliance/scan-type";
import { isPhotoContentType } from "@shared/custody/photo-type";
import { handoffKind } from "@shared/transfer/lifecycle";
import type { z } from "zod";
import type { photoUploadQuerySchema } from "@shared/schemas/transfer";
import type { Actor } from "../../auth/actor";
import type { Storage } from "../../adapters/storage";
import { newId } from "../../db/entities/base";
import { TransferPhotoSchema } from "../../db/entities/custody-evidence.entity";
import { AnimalSchema, ContainerSchema, TransferSchema } from "../../db/entities/transfer.entity";
import { CheckInSchema } from "../../db/entities/check-in.entity";
import { conflict, forbidden, HttpError, invalidField, notFound } from "../../http/errors";
import { transferAbilities } from "../../policies/transfer.policy";
import { appendCustody } from "./custody";
import { loadTransferForActor } from "./load";

type PhotoQuery = z.output<typeof photoUploadQuerySchema>;

/** The photo's type from its bytes (the scans' check, server/services/compliance/documents.ts), images only. */
function photoTypeOf(body: Buffer) {
  if (body.length === 0) throw new HttpError(400, "empty_file", "The photo is empty.", { field: "body" });
  const type = sniffScanType(body);
  if (!isPhotoContentType(type))
    throw new HttpError(
      415,
      "unsupported_file",
      "That file is not a JPEG or PNG photo. Take the photo again with the camera.",
    );
  return type;
}

/** The moment must have happened: a recorded handoff, or the signed check-in. */
async function checkMoment(em: EntityManager, transferId: string, query: PhotoQuery) {
  if (query.moment === "handoff") {
    const [row] = await em
      .getConnection()
      .execute<{ n: string }[]>(
        `SELECT count(*) AS n FROM custody_entry WHERE transfer_id = ? AND kind = 'handoff' AND (payload->>'handoffIndex')::int = ?`,
        [transferId, query.handoffIndex],
      );
    if (!Number(row?.n))
      throw conflict(`Handoff ${query.handoffIndex! + 1} is not recorded yet: record it first, then add its photos.`);
  } else if (!(await em.count(CheckInSchema, { transfer: transferId }))) {
    throw conflict("The check-in is not signed yet: sign it first, then add its photos.");
  }
}

/** A box or animal line the photo names must be this transfer's; its label goes on the record. */
async function subjectLabel(em: EntityManager, transferId: string, query: PhotoQuery): Promise<string | null> {
  if (query.containerId) {
    const box = await em.findOne(ContainerSchema, { id: query.containerId, transfer: transferId });
    if (!box) throw invalidField(["containerId"], "this box is not one of this transfer's");
    return box.label;
  }
  if (query.animalId) {
    const animal = await em.findOne(
      AnimalSchema,
      { id: query.animalId, transfer: transferId },
      { populate: ["taxon"] },
    );
    if (!animal) throw invalidField(["animalId"], "this is not an animal line of this transfer");
    return animal.taxon.getEntity().scientificName;
  }
  return null;
}

export async function addPhoto({
  em,
  storage,
  actor,
  transferId,
  query,
  body,
}: {
  em: EntityManager;
  storage: Storage;
  actor: Actor;
  transferId: string;
  query: PhotoQuery;
  body: Buffer;
}) {
  const { role, facts } = await loadTransferForActor(em, transferId, actor);
  const handoffKindOf = (index: number) => handoffKind(index, facts.legCourierIds.length);
  if (!transferAbilities(actor, role, facts).addPhotos)
    throw role === "admin"
      ? forbidden("Photos are added by the sender, the receiver and the assigned couriers.")
      : conflict("Photos are added from the pickup until the transfer is closed.");
  const contentType = photoTypeOf(body);
  await checkMoment(em, transferId, query);
  const label = await subjectLabel(em, transferId, query);
  if ((await em.count(TransferPhotoSchema, { transfer: transferId })) >= LIMITS.photosPerTransferMax)
    throw conflict(`A transfer keeps at most ${LIMITS.photosPerTransferMax} photos.`);

  const id = newId();
  const storageKey = `photos/${transferId}/${randomUUID()}`;
  const sha256 = createHash("sha256").update(body).digest("hex");
  await storage.putObject(storageKey, body, contentType);
  try {
    return await em.fork().transactional(async (tx) => {
      await tx.findOneOrFail(TransferSchema, { id: transferId }, { lockMode: LockMode.PESSIMISTIC_WRITE });
      const entry = await appendCustody(tx, transferId, actor, "photo_added", {
        photoId: id,
        moment: query.moment,
        handoffIndex: query.moment === "handoff" ? query.handoffIndex : null,
        handoffKind: query.moment === "handoff" ? handoffKindOf(query.handoffIndex!) : null,
        subject: query.subject,
        shows: label,
        caption: query.caption ?? null,
        sha256,
        contentType,
        sizeBytes: body.length,
      });
      const photo = tx.create(TransferPhotoSchema, {
        id,
        transfer: tx.getReference(TransferSchema, transferId),
        moment: query.moment as PhotoMoment,
        handoffIndex: query.moment === "handoff" ? (query.handoffIndex ?? null) : null,
        subject: query.subject as PhotoSubject,
        containerId: query.containerId ?? null,
        animalId: query.animalId ?? null,
        caption: query.caption ?? null,
        storageKey,
        sha256,
        contentType,
        sizeBytes: body.length,
        uploadedById: actor.id,
        uploadedByName: actor.displayName,
        custodySeq: entry.seq,
      });
      await tx.flush();
      return photo;
    });
  } catch (err) {
    await storage
      .deleteObject(storageKey)
      .catch((cleanup) =>
        console.error(`[storage] orphan ${storageKey} left after a failed insert`, (cleanup as Error).message),
      );
    throw err;
  }
}

/** A photo the caller may see, with its stored object's key; 404 for anyone else. */
export async function loadPhotoForActor(em: EntityManager, actor: Actor, transferId: string, photoId: string) {
  const { role, facts } = await loadTransferForActor(em, transferId, actor);
  if (!transferAbilities(actor, role, facts).readPhotos)
    throw forbidden("Photos are for the sender, the receiver and the assigned couriers.");
  const photo = await em.findOne(TransferPhotoSchema, { id: photoId, transfer: transferId });
  if (!photo) throw notFound("That photo");
  return photo;
}
