import type { QuarantineOverride } from "@shared/register/quarantine";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { RegisterReportDto } from "@shared/schemas/register";
import { api, type ApiError } from "@/lib/api-client";
import { registerKeys } from "./get-register";

export type PermitPlan = {
  id: string;
  kind: string;
  jurisdiction: string;
  number: string;
  reportStartMonth: number | null;
  reportDueMonth: number | null;
  reportDueDay: number | null;
  nextReport: { from: string; to: string; dueOn: string } | null;
};

export const usePermitPlans = () =>
  useQuery({
    queryKey: registerKeys.permits(),
    queryFn: async ({ signal }): Promise<PermitPlan[]> =>
      (await api<{ permits: PermitPlan[] }>("/api/register/permits", { signal })).permits,
  });

export type ReportQuery = { permitId: string; from?: string; to?: string };

const queryString = (query: ReportQuery) =>
  new URLSearchParams(Object.entries(query).filter(([, v]) => v) as [string, string][]).toString();

export const useRegisterReport = (query: ReportQuery | null) =>
  useQuery({
    queryKey: registerKeys.report({ ...(query ?? {}) } as Record<string, string>),
    queryFn: ({ signal }) => api<RegisterReportDto>(`/api/register/report?${queryString(query!)}`, { signal }),
    enabled: query !== null,
  });

/** The report as a file: a plain link, so the browser downloads it itself. */
export const reportDownloadHref = (query: ReportQuery, format: "csv" | "pdf") =>
  `/api/register/report?${queryString(query)}&format=${format}`;

export function useSaveReportingPlan() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({
      permitId,
      ...plan
    }: {
      permitId: string;
      reportStartMonth: number | null;
      reportDueMonth: number | null;
      reportDueDay: number | null;
    }) => api(`/api/register/permits/${encodeURIComponent(permitId)}/reporting`, { method: "PUT", body: plan }),
    onSuccess: () => client.invalidateQueries({ queryKey: registerKeys.all }),
  });
}

export type ImportResult = { imported: number } | { rows: { row: number; field: string | null; message: string }[] };

/** Sends the CSV; a 400 with rows is a result to show, not a failure of the page. */
export function useImportRegister() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (csv: string): Promise<ImportResult> => {
      try {
        return await api<{ imported: number }>("/api/register/import", {
          method: "POST",
          body: csv,
          contentType: "text/csv",
        });
      } catch (err) {
        const body = (err as ApiError).body as
          { rows?: { row: number; field: string | null; message: string }[] } | undefined;
        if (body?.rows) return { rows: body.rows };
        throw err;
      }
    },
    onSuccess: () => client.invalidateQueries({ queryKey: registerKeys.all }),
  });
}

/** The organisation's quarantine length, and the lengths it set for a genus or a species. */
export type QuarantineSettings = { quarantineDays: number; overrides: QuarantineOverride[] };

export function useQuarantineSettings() {
  return useQuery({
    queryKey: [...registerKeys.all, "settings"],
    queryFn: ({ signal }) => api<QuarantineSettings>("/api/register/settings", { signal }),
  });
}

export function useSaveQuarantine() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (settings: QuarantineSettings) =>
      api<QuarantineSettings>("/api/register/settings", { method: "PUT", body: settings }),
    onSuccess: () => client.invalidateQueries({ queryKey: registerKeys.all }),
  });
}
