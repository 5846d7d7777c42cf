import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { CheckInInput, TransferDto } from "@shared/schemas/transfer";
import { api } from "@/lib/api-client";
import { uploadPhotos, type ChosenPhoto } from "@/lib/photos";
import { storeTransfer } from "@/lib/transfer-queries";

/** Signs the check-in; the answer's `checkIn.discrepancies` compares it with the manifest. */
export const checkIn = (transferId: string, input: CheckInInput, idempotencyKey: string) =>
  api<{ transfer: TransferDto }>(`/api/transfers/${encodeURIComponent(transferId)}/check-in`, {
    method: "POST",
    body: input,
    headers: { "Idempotency-Key": idempotencyKey },
  }).then((r) => r.transfer);

/** Signs the check-in, then sends its photos; the check-in stands even when a photo does not go through. */
export function useCheckIn(transferId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async ({
      input,
      idempotencyKey,
      photos = [],
    }: {
      input: CheckInInput;
      idempotencyKey: string;
      photos?: readonly ChosenPhoto[];
    }) => {
      const signed = await checkIn(transferId, input, idempotencyKey);
      if (photos.length === 0) return { transfer: signed, failed: [] as string[] };
      const sent = await uploadPhotos(transferId, { moment: "check_in" }, photos);
      return { transfer: sent.transfer ?? signed, failed: sent.failed.map((f) => f.message) };
    },
    onSuccess: ({ transfer }) => storeTransfer(client, transfer),
  });
}
