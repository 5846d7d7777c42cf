import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { TransferComplianceDto, TransferDocumentDto } from "@shared/schemas/compliance";
import { api } from "@/lib/api-client";
import { transferKeys } from "@/lib/transfer-queries";
import { complianceKeys } from "./keys";

const base = (transferId: string) => `/api/transfers/${encodeURIComponent(transferId)}`;

export const transferComplianceQueryOptions = (transferId: string) =>
  queryOptions({
    queryKey: complianceKeys.transfer(transferId),
    queryFn: ({ signal }) => api<TransferComplianceDto>(`${base(transferId)}/compliance`, { signal }),
  });

export const useTransferCompliance = (transferId: string) => useQuery(transferComplianceQueryOptions(transferId));

export const transferDocumentsQueryOptions = (transferId: string) =>
  queryOptions({
    queryKey: complianceKeys.transferDocuments(transferId),
    queryFn: ({ signal }) =>
      api<{ documents: TransferDocumentDto[] }>(`/api/documents?transferId=${encodeURIComponent(transferId)}`, {
        signal,
      }).then((r) => r.documents),
  });

export const useTransferDocuments = (transferId: string, options: { enabled?: boolean } = {}) =>
  useQuery({ ...transferDocumentsQueryOptions(transferId), enabled: options.enabled ?? true });

/** The admin's override; the custody log gained an entry, so the transfer's satellites refresh too. */
export function useOverrideCompliance(transferId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (reason: string) =>
      api<TransferComplianceDto>(`${base(transferId)}/compliance/override`, { method: "POST", body: { reason } }),
    onSuccess: (compliance) => {
      client.setQueryData(complianceKeys.transfer(transferId), compliance);
      void client.invalidateQueries({ queryKey: transferKeys.detail(transferId) });
    },
  });
}

export function useAttachDocument(transferId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (documentId: string) =>
      api<{ documents: TransferDocumentDto[] }>(`${base(transferId)}/documents`, {
        method: "POST",
        body: { documentId },
      }),
    onSuccess: () => client.invalidateQueries({ queryKey: complianceKeys.transfer(transferId) }),
  });
}

export function useDetachDocument(transferId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (documentId: string) =>
      api<void>(`${base(transferId)}/documents/${encodeURIComponent(documentId)}`, { method: "DELETE" }),
    onSuccess: () => client.invalidateQueries({ queryKey: complianceKeys.transfer(transferId) }),
  });
}
