import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type {
  RegisterEntryDto,
  RegisterEntryInput,
  RegisterEventDto,
  RegisterEventInput,
  RegisterSplitInput,
} from "@shared/schemas/register";
import { api } from "@/lib/api-client";
import { registerKeys } from "./get-register";

export type EntryView = {
  entry: RegisterEntryDto;
  events: RegisterEventDto[];
  earlier: { entry: RegisterEntryDto; events: RegisterEventDto[] }[];
};

export const registerEntryQueryOptions = (id: string) =>
  queryOptions({
    queryKey: registerKeys.entry(id),
    queryFn: ({ signal }) => api<EntryView>(`/api/register/entries/${encodeURIComponent(id)}`, { signal }),
  });

export const useRegisterEntry = (id: string) => useQuery(registerEntryQueryOptions(id));

/** Records an event; the entry and the register's pages are read again. */
export function useRecordEvent(id: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: RegisterEventInput) =>
      api<{ event: RegisterEventDto; entry: RegisterEntryDto }>(
        `/api/register/entries/${encodeURIComponent(id)}/events`,
        {
          method: "POST",
          body: input,
        },
      ),
    onSuccess: () => client.invalidateQueries({ queryKey: registerKeys.all }),
  });
}

export function useSplitEntry(id: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: RegisterSplitInput) =>
      api<EntryView>(`/api/register/entries/${encodeURIComponent(id)}/split`, { method: "POST", body: input }),
    onSuccess: () => client.invalidateQueries({ queryKey: registerKeys.all }),
  });
}

export function useAddEntry() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: RegisterEntryInput) => api<EntryView>("/api/register/entries", { method: "POST", body: input }),
    onSuccess: () => client.invalidateQueries({ queryKey: registerKeys.all }),
  });
}
