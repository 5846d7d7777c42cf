import type { PhotoSubject } from "@shared/constants";
import type { PhotoUploadQuery, TransferDto } from "@shared/schemas/transfer";
import { apiFile } from "./api-client";
import { toQueryString } from "./query-string";

/** A photo chosen on the phone, waiting to be sent once its moment is recorded. */
export type ChosenPhoto = { key: string; file: File; subject: PhotoSubject; containerId?: string; animalId?: string };

/** Sends one photo of a recorded moment; the answer is the transfer with the photo on it. */
export const uploadPhoto = (transferId: string, query: PhotoUploadQuery, file: Blob) =>
  apiFile<{ transfer: TransferDto }>(
    `/api/transfers/${encodeURIComponent(transferId)}/photos?${toQueryString(query as Record<string, unknown>)}`,
    file,
  ).then((r) => r.transfer);

/**
 * Sends the chosen photos one after the other (a phone on a weak signal does better with one at a
 * time) and says which failed, so the person can try those again; the moment is already recorded.
 */
export async function uploadPhotos(
  transferId: string,
  moment: Omit<PhotoUploadQuery, "subject" | "containerId" | "animalId">,
  photos: readonly ChosenPhoto[],
): Promise<{ transfer: TransferDto | null; failed: { photo: ChosenPhoto; message: string }[] }> {
  let transfer: TransferDto | null = null;
  const failed: { photo: ChosenPhoto; message: string }[] = [];
  for (const photo of photos) {
    try {
      transfer = await uploadPhoto(
        transferId,
        { ...moment, subject: photo.subject, containerId: photo.containerId, animalId: photo.animalId },
        photo.file,
      );
    } catch (err) {
      failed.push({ photo, message: (err as Error).message });
    }
  }
  return { transfer, failed };
}
