import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { TransferDto } from "@shared/schemas/transfer";
import { api } from "@/lib/api-client";
import { storeTransfer } from "@/lib/transfer-queries";

/** PUT /api/transfers/:id/courier-service: the sender asks a courier service to carry it (null: none). */
export const chooseCourierService = (id: string, organizationId: string | null) =>
  api<{ transfer: TransferDto }>(`/api/transfers/${encodeURIComponent(id)}/courier-service`, {
    method: "PUT",
    body: { organizationId },
  }).then((r) => r.transfer);

export function useChooseCourierService(id: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (organizationId: string | null) => chooseCourierService(id, organizationId),
    onSuccess: (transfer) => storeTransfer(client, transfer),
  });
}
