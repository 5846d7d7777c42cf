import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { LegsInput, TransferDto } from "@shared/schemas/transfer";
import { api } from "@/lib/api-client";
import { storeTransfer } from "@/lib/transfer-queries";

/** Replaces the couriers and their legs, in order. */
export const assignLegs = (id: string, input: LegsInput) =>
  api<{ transfer: TransferDto }>(`/api/transfers/${encodeURIComponent(id)}/legs`, { method: "PUT", body: input }).then(
    (r) => r.transfer,
  );

export function useAssignLegs(id: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: LegsInput) => assignLegs(id, input),
    onSuccess: (transfer) => storeTransfer(client, transfer),
  });
}
