import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { TransferDto, TransferInput } from "@shared/schemas/transfer";
import { api } from "@/lib/api-client";
import { storeTransfer } from "@/lib/transfer-queries";

export const createTransfer = (input: TransferInput) =>
  api<{ transfer: TransferDto }>("/api/transfers", { method: "POST", body: input }).then((r) => r.transfer);

export function useCreateTransfer() {
  const client = useQueryClient();
  return useMutation({ mutationFn: createTransfer, onSuccess: (transfer) => storeTransfer(client, transfer) });
}
