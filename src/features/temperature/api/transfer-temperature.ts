import { queryOptions, useQuery } from "@tanstack/react-query";
import { blocksShipping, type TransferTemperatureDto } from "@shared/temperature/report";
import { api } from "@/lib/api-client";
import { temperatureKeys } from "./keys";

export const transferTemperatureQueryOptions = (transferId: string) =>
  queryOptions({
    queryKey: temperatureKeys.transfer(transferId),
    queryFn: ({ signal }) =>
      api<TransferTemperatureDto>(`/api/transfers/${encodeURIComponent(transferId)}/temperature`, { signal }),
    // Forecasts change by the hour; the server caches them, so a minute's staleness costs nothing.
    staleTime: 60_000,
  });

export const useTransferTemperature = (transferId: string) => useQuery(transferTemperatureQueryOptions(transferId));

/**
 * The transfer's temperature state for the transfer page: the verdict, whether it blocks
 * "cleared to travel" (then confirming needs an override with a reason), and the advice.
 */
export function useTemperatureVerdict(transferId: string) {
  const query = useTransferTemperature(transferId);
  const data = query.data;
  return {
    isPending: query.isPending,
    error: query.error,
    verdict: data?.verdict ?? null,
    advice: data?.advice ?? null,
    blocks: data ? blocksShipping(data.verdict) : false,
  };
}
