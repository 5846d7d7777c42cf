import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { StateNoticeDoneInput, StateNoticeDto } from "@shared/schemas/register";
import { api } from "@/lib/api-client";

const stateNoticesKey = (transferId: string) => ["transfers", transferId, "state-notices"] as const;

/** The state notices the caller's side owes after this move, once the animals have arrived, each with who marked it done. */
export const useStateNotices = (transferId: string, enabled: boolean) =>
  useQuery({
    queryKey: stateNoticesKey(transferId),
    queryFn: ({ signal }) =>
      api<{ arrived: boolean; notices: StateNoticeDto[] }>(
        `/api/register/transfers/${encodeURIComponent(transferId)}/notices`,
        { signal },
      ),
    enabled,
  });

/** Marks one notice done (once: the mark is kept as it was written). */
export function useMarkStateNoticeDone(transferId: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ key, ...input }: StateNoticeDoneInput & { key: string }) =>
      api<{ notice: StateNoticeDto }>(
        `/api/register/transfers/${encodeURIComponent(transferId)}/notices/${encodeURIComponent(key)}/done`,
        { method: "POST", body: input },
      ),
    onSuccess: () => client.invalidateQueries({ queryKey: stateNoticesKey(transferId) }),
  });
}
