import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { TransferDto, TransitionInput } from "@shared/schemas/transfer";
import { api } from "@/lib/api-client";
import { storeTransfer } from "@/lib/transfer-queries";

/** Asks for one step of the transfer's life; 409 when the server does not allow it now. */
export const transitionTransfer = (id: string, input: TransitionInput) =>
  api<{ transfer: TransferDto }>(`/api/transfers/${encodeURIComponent(id)}/transition`, {
    method: "POST",
    body: input,
  }).then((r) => r.transfer);

export function useTransitionTransfer(id: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: TransitionInput) => transitionTransfer(id, input),
    onSuccess: (transfer) => storeTransfer(client, transfer),
  });
}
