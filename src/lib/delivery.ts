import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { DeliveryCodeDto, TransferDto } from "@shared/schemas/transfer";
import { api } from "./api-client";
import { storeTransfer } from "./transfer-queries";

/**
 * The receiver's "I have the boxes" for a delivery the courier recorded: from the receiver's own
 * account (no code), or typed on the courier's phone with the receiver's one-time code.
 */
export function useAcknowledgeDelivery(transferId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (code?: string) =>
      api<{ transfer: TransferDto }>(`/api/transfers/${encodeURIComponent(transferId)}/delivery/acknowledge`, {
        method: "POST",
        body: code ? { code } : {},
      }).then((r) => r.transfer),
    onSuccess: (transfer) => storeTransfer(client, transfer),
  });
}

/** A fresh one-time code for the receiver to show the courier; shown once, valid for minutes. */
export function useDeliveryCode(transferId: string) {
  return useMutation({
    mutationFn: () =>
      api<DeliveryCodeDto>(`/api/transfers/${encodeURIComponent(transferId)}/delivery-code`, {
        method: "POST",
        body: {},
      }),
  });
}
