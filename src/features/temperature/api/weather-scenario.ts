import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api-client";
import { temperatureKeys } from "./keys";

type ScenarioDto = { scenario: string; scenarios: string[] };

/** Demo only: the local weather fake's scenario. A 403 or 404 simply means "not for you, or not here". */
export const weatherScenarioQueryOptions = () =>
  queryOptions({
    queryKey: temperatureKeys.weatherScenario(),
    queryFn: ({ signal }) => api<ScenarioDto>("/api/dev/weather-scenario", { signal }),
    retry: false,
  });

export const useWeatherScenario = () => useQuery(weatherScenarioQueryOptions());

export function useSwitchWeatherScenario() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (scenario: string) =>
      api<{ scenario: string }>("/api/dev/weather-scenario", { method: "POST", body: { scenario } }),
    onSuccess: () => {
      void client.invalidateQueries({ queryKey: temperatureKeys.weatherScenario() });
      void client.invalidateQueries({ predicate: (q) => q.queryKey.at(-1) === "temperature" });
    },
  });
}
