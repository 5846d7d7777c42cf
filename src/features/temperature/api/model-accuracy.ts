import { queryOptions, useQuery } from "@tanstack/react-query";
import type { ModelAccuracyDto } from "@shared/temperature/report";
import { api } from "@/lib/api-client";
import { temperatureKeys } from "./keys";

export const modelAccuracyQueryOptions = () =>
  queryOptions({
    queryKey: temperatureKeys.modelAccuracy(),
    queryFn: ({ signal }) => api<ModelAccuracyDto>("/api/temperature/model-accuracy", { signal }),
  });

export const useModelAccuracy = () => useQuery(modelAccuracyQueryOptions());
