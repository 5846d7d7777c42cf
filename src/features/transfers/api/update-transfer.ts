import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { TransferDto, TransferPatch } from "@shared/schemas/transfer";
import { api } from "@/lib/api-client";
import { storeTransfer } from "@/lib/transfer-queries";

/** PATCH with the version the editor saw; a stale version answers 409. Lists replace. */
export const updateTransfer = (id: string, patch: TransferPatch) =>
  api<{ transfer: TransferDto }>(`/api/transfers/${encodeURIComponent(id)}`, { method: "PATCH", body: patch }).then(
    (r) => r.transfer,
  );

export function useUpdateTransfer(id: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (patch: TransferPatch) => updateTransfer(id, patch),
    onSuccess: (transfer) => storeTransfer(client, transfer),
  });
}
