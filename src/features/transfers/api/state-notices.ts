import { useQuery } from "@tanstack/react-query";
import type { StateNoticeTodo } from "@shared/register/state-notices";
import { api } from "@/lib/api-client";

/** The state notices the caller's side owes after this move, once the animals have arrived. */
export const useStateNotices = (transferId: string, enabled: boolean) =>
  useQuery({
    queryKey: ["transfers", transferId, "state-notices"],
    queryFn: ({ signal }) =>
      api<{ arrived: boolean; notices: StateNoticeTodo[] }>(
        `/api/register/transfers/${encodeURIComponent(transferId)}/notices`,
        { signal },
      ),
    enabled,
  });
