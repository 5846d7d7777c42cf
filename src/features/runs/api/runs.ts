import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { RunDto, RunInput, RunPatch, RunPatchAnswerDto, RunSummaryDto } from "@shared/schemas/run";
import { api } from "@/lib/api-client";

/** Query keys for runs, from general to specific. */
export const runKeys = {
  all: ["runs"] as const,
  lists: () => [...runKeys.all, "list"] as const,
  detail: (id: string) => [...runKeys.all, "detail", id] as const,
};

const runUrl = (id: string) => `/api/runs/${encodeURIComponent(id)}`;

/** The run sheet to print or keep on the phone (PDF). */
export const runSheetHref = (id: string) => `${runUrl(id)}/sheet.pdf`;

export const runsQueryOptions = () =>
  queryOptions({
    queryKey: runKeys.lists(),
    queryFn: ({ signal }) => api<{ runs: RunSummaryDto[] }>("/api/runs", { signal }).then((body) => body.runs),
  });

export const useRuns = () => useQuery(runsQueryOptions());

export const runQueryOptions = (id: string) =>
  queryOptions({ queryKey: runKeys.detail(id), queryFn: ({ signal }) => api<RunDto>(runUrl(id), { signal }) });

export const useRun = (id: string) => useQuery(runQueryOptions(id));

/** Plans a run from the service's transfers; the server orders and times the stops. */
export function useCreateRun() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: RunInput) => api<RunDto>("/api/runs", { method: "POST", body: input }),
    onSuccess: (run) => {
      client.setQueryData(runKeys.detail(run.id), run);
      void client.invalidateQueries({ queryKey: runKeys.lists() });
    },
  });
}

/** Reorders, adds or removes stops; the answer says whose arrival moved and who was told. */
export function useUpdateRun(id: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (patch: RunPatch) => api<RunPatchAnswerDto>(runUrl(id), { method: "PATCH", body: patch }),
    onSuccess: (run) => {
      client.setQueryData(runKeys.detail(id), run);
      void client.invalidateQueries({ queryKey: runKeys.lists() });
    },
  });
}
