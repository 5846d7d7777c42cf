import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { DocumentDto, DocumentInput, ScanDto } from "@shared/schemas/compliance";
import { api, ApiError } from "@/lib/api-client";
import { complianceKeys } from "./keys";

export const documentsQueryOptions = () =>
  queryOptions({
    queryKey: complianceKeys.documents(),
    queryFn: ({ signal }) => api<{ documents: DocumentDto[] }>("/api/documents", { signal }).then((r) => r.documents),
  });

/** The caller's organisation's permits and certificates. */
export const useDocuments = (options: { enabled?: boolean } = {}) =>
  useQuery({ ...documentsQueryOptions(), enabled: options.enabled ?? true });

/** A record changed: its own list, and every transfer's verdict that may lean on it. */
function useInvalidateDocuments() {
  const client = useQueryClient();
  return () =>
    client.invalidateQueries({
      queryKey: complianceKeys.all,
      predicate: (q) => q.queryKey[1] === "documents" || q.queryKey[1] === "transfer",
    });
}

export function useCreateDocument() {
  const invalidate = useInvalidateDocuments();
  return useMutation({
    mutationFn: (input: DocumentInput) =>
      api<{ document: DocumentDto }>("/api/documents", { method: "POST", body: input }).then((r) => r.document),
    onSuccess: invalidate,
  });
}

export function useUpdateDocument() {
  const invalidate = useInvalidateDocuments();
  return useMutation({
    mutationFn: ({ id, input }: { id: string; input: DocumentInput }) =>
      api<{ document: DocumentDto }>(`/api/documents/${encodeURIComponent(id)}`, { method: "PATCH", body: input }).then(
        (r) => r.document,
      ),
    onSuccess: invalidate,
  });
}

async function errorOf(response: Response): Promise<ApiError> {
  const body = (await response.json().catch(() => null)) as {
    error?: { code: string; message: string; field?: string };
  } | null;
  return new ApiError(
    response.status,
    body?.error?.code ?? "error",
    body?.error?.message ?? `The request failed (${response.status}).`,
    body?.error?.field,
  );
}

/**
 * Sends the file itself as the body (the API's JSON client cannot): the server reads its type
 * from its first bytes and refuses anything but PDF, JPEG and PNG up to 10 MB.
 */
async function uploadScan(documentId: string, file: File): Promise<ScanDto> {
  const token = await fetch("/api/auth/csrf", { credentials: "same-origin" });
  if (!token.ok) throw await errorOf(token);
  const { csrfToken } = (await token.json()) as { csrfToken: string };
  let response: Response;
  try {
    response = await fetch(`/api/documents/${encodeURIComponent(documentId)}/scans`, {
      method: "POST",
      credentials: "same-origin",
      headers: {
        "Content-Type": "application/octet-stream",
        "X-CSRF-Token": csrfToken,
        "X-File-Name": encodeURIComponent(file.name),
        Accept: "application/json",
      },
      body: file,
    });
  } catch {
    throw new ApiError(0, "network", "Hatchway cannot be reached. Check your connection and try again.");
  }
  if (!response.ok) throw await errorOf(response);
  return ((await response.json()) as { scan: ScanDto }).scan;
}

export function useUploadScan() {
  const invalidate = useInvalidateDocuments();
  return useMutation({
    mutationFn: ({ documentId, file }: { documentId: string; file: File }) => uploadScan(documentId, file),
    onSuccess: invalidate,
  });
}

/** A scan's bytes, for an inline preview through an object URL (the download itself is an attachment). */
export async function fetchScan(scan: ScanDto): Promise<Blob> {
  const response = await fetch(scan.downloadUrl, { credentials: "same-origin" });
  if (!response.ok) throw await errorOf(response);
  return response.blob();
}
