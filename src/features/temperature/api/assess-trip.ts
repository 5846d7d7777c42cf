import { useMutation } from "@tanstack/react-query";
import type { TemperatureReport } from "@shared/temperature/report";
import type { WhatIfInput } from "@shared/temperature/schemas";
import { api } from "@/lib/api-client";

/** The what-if: assesses a planned trip and stores nothing. */
export const assessTrip = (input: WhatIfInput) =>
  api<TemperatureReport>("/api/temperature/assess", { method: "POST", body: input });

export const useAssessTrip = () => useMutation({ mutationFn: assessTrip });
