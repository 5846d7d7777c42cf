import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { HandoffInput, TransferDto } from "@shared/schemas/transfer";
import { api } from "@/lib/api-client";
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
 * Records the handoff, then sends its photos one by one. The handoff stands even when a photo does
 * not go through: the answer says which ones failed, so they can be added again.
 */
export function useRecordHandoff(transferId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async ({
      input,
      idempotencyKey,
      photos,
    }: {
      input: HandoffInput;
      idempotencyKey: string;
      photos: readonly ChosenPhoto[];
    }) => {
      const recorded = await recordHandoff(transferId, input, idempotencyKey);
      if (photos.length === 0) return { transfer: recorded, failed: [] };
      const sent = await uploadPhotos(transferId, { moment: "handoff", handoffIndex: input.handoffIndex }, photos);
      return { transfer: sent.transfer ?? recorded, failed: sent.failed };
    },
    onSuccess: ({ transfer }) => storeTransfer(client, transfer),
  });
}
