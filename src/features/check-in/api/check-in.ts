import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { CheckInInput, TransferDto } from "@shared/schemas/transfer";
import { api } from "@/lib/api-client";
import { storeTransfer } from "@/lib/transfer-queries";

/** Signs the check-in; the answer's `checkIn.discrepancies` compares it with the manifest. */
export const checkIn = (transferId: string, input: CheckInInput, idempotencyKey: string) =>
  api<{ transfer: TransferDto }>(`/api/transfers/${encodeURIComponent(transferId)}/check-in`, {
    method: "POST",
    body: input,
    headers: { "Idempotency-Key": idempotencyKey },
  }).then((r) => r.transfer);

export function useCheckIn(transferId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ input, idempotencyKey }: { input: CheckInInput; idempotencyKey: string }) =>
      checkIn(transferId, input, idempotencyKey),
    onSuccess: (transfer) => storeTransfer(client, transfer),
  });
}
