import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { HandoffInput, TransferDto } from "@shared/schemas/transfer";
import { handoffKind } from "@shared/transfer/lifecycle";
import { api, ApiError } from "@/lib/api-client";
import { queuedHandoffKeys } from "@/lib/offline-data";
import { queueHandoff, type QueuedHandoff } from "@/lib/offline-handoffs";
import { uploadPhotos, type ChosenPhoto } from "@/lib/photos";
import { storeTransfer } from "@/lib/transfer-queries";

/** Records a pickup, handoff or delivery; the key makes a retried submission count once. */
export const recordHandoff = (transferId: string, input: HandoffInput, idempotencyKey: string) =>
  api<{ transfer: TransferDto }>(`/api/transfers/${encodeURIComponent(transferId)}/handoffs`, {
    method: "POST",
    body: input,
    headers: { "Idempotency-Key": idempotencyKey },
  }).then((r) => r.transfer);

/**
 * No answer at all: no signal, or a gateway that could not reach Hatchway. The handoff may be
 * kept on the phone and sent later with the same key.
 */
export function isUnreachable(error: unknown): boolean {
  if (error instanceof TypeError) return true;
  return error instanceof ApiError && (error.status === 0 || [502, 503, 504].includes(error.status));
}

export type HandoffOutcome =
  | { sent: true; transfer: TransferDto; failed: { photo: ChosenPhoto; message: string }[] }
  | { sent: false; queued: QueuedHandoff };

/**
 * Records the handoff, then sends its photos one by one. The handoff stands even when a photo does
 * not go through: the answer says which ones failed, so they can be added again. Without signal
 * the handoff and its photos are kept on the phone, to go by themselves later (D40).
 */
export function useRecordHandoff(transfer: Pick<TransferDto, "id" | "number" | "legs">, userId: string) {
  const client = useQueryClient();
  const transferId = transfer.id;
  return useMutation({
    // Tried even when the phone says it is offline: the answer decides whether it is kept.
    networkMode: "always",
    mutationFn: async ({
      input,
      idempotencyKey,
      photos,
    }: {
      input: HandoffInput;
      idempotencyKey: string;
      photos: readonly ChosenPhoto[];
    }): Promise<HandoffOutcome> => {
      const keep = () =>
        queueHandoff({
          idempotencyKey,
          userId,
          transferId,
          transferNumber: transfer.number,
          kind: handoffKind(input.handoffIndex, transfer.legs.length),
          input,
          photos: photos.map((p) => ({
            key: p.key,
            blob: p.file,
            subject: p.subject,
            containerId: p.containerId,
            animalId: p.animalId,
          })),
          createdAt: new Date().toISOString(),
        }).then(
          (queued) => ({ sent: false as const, queued }),
          // A phone that cannot keep it (storage switched off): say so; the entries stay on the page.
          () => {
            throw new ApiError(0, "network", "Hatchway cannot be reached. Check your connection and try again.");
          },
        );
      if (typeof navigator !== "undefined" && navigator.onLine === false) return keep();
      let recorded: TransferDto;
      try {
        recorded = await recordHandoff(transferId, input, idempotencyKey);
      } catch (error) {
        if (isUnreachable(error)) return keep();
        throw error;
      }
      if (photos.length === 0) return { sent: true, transfer: recorded, failed: [] };
      const sent = await uploadPhotos(transferId, { moment: "handoff", handoffIndex: input.handoffIndex }, photos);
      return { sent: true, transfer: sent.transfer ?? recorded, failed: sent.failed };
    },
    onSuccess: (outcome) => {
      if (outcome.sent) storeTransfer(client, outcome.transfer);
      else void client.invalidateQueries({ queryKey: queuedHandoffKeys.forUser(userId) });
    },
  });
}
