import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { HandoffInput, TransferDto } from "@shared/schemas/transfer";
import { api } from "@/lib/api-client";
import { storeTransfer } from "@/lib/transfer-queries";

/** Records a pickup, handoff or delivery; the key makes a retried submission count once. */
export const recordHandoff = (transferId: string, input: HandoffInput, idempotencyKey: string) =>
  api<{ transfer: TransferDto }>(`/api/transfers/${encodeURIComponent(transferId)}/handoffs`, {
    method: "POST",
    body: input,
    headers: { "Idempotency-Key": idempotencyKey },
  }).then((r) => r.transfer);

export function useRecordHandoff(transferId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ input, idempotencyKey }: { input: HandoffInput; idempotencyKey: string }) =>
      recordHandoff(transferId, input, idempotencyKey),
    onSuccess: (transfer) => storeTransfer(client, transfer),
  });
}
