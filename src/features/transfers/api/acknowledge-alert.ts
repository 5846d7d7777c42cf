import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { AlertDto, TransferDto } from "@shared/schemas/transfer";
import { api } from "@/lib/api-client";
import { transferKeys } from "@/lib/transfer-queries";

/** A party says they have seen an alert, with a note; the alert stays on the record. */
export function useAcknowledgeAlert(transferId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ alertId, note }: { alertId: string; note: string }) =>
      api<{ alert: AlertDto; transfer: TransferDto }>(
        `/api/transfers/${encodeURIComponent(transferId)}/alerts/${encodeURIComponent(alertId)}/acknowledge`,
        { method: "POST", body: { note } },
      ),
    onSuccess: ({ transfer }) => {
      client.setQueryData(transferKeys.detail(transferId), transfer);
      return client.invalidateQueries({ queryKey: transferKeys.detail(transferId) });
    },
  });
}
