import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { MessageDto } from "@shared/schemas/transfer";
import { api } from "@/lib/api-client";
import { transferKeys } from "@/lib/transfer-queries";

export const messagesQueryOptions = (id: string) =>
  queryOptions({
    queryKey: transferKeys.messages(id),
    queryFn: ({ signal }) =>
      api<{ messages: MessageDto[] }>(`/api/transfers/${encodeURIComponent(id)}/messages`, { signal }).then(
        (r) => r.messages,
      ),
    // The other party may be writing: look again now and then while the page is open.
    refetchInterval: 30_000,
  });

export const useMessages = (id: string, enabled: boolean) => useQuery({ ...messagesQueryOptions(id), enabled });

export function usePostMessage(id: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (body: string) =>
      api<{ message: MessageDto }>(`/api/transfers/${encodeURIComponent(id)}/messages`, {
        method: "POST",
        body: { body },
      }),
    onSuccess: () => client.invalidateQueries({ queryKey: transferKeys.messages(id) }),
  });
}
