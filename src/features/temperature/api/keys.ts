import { transferKeys } from "@/lib/transfer-queries";

/**
 * Query keys of the temperature feature, from general to specific. A transfer's verdict sits
 * under the transfer's own key, so every write that refreshes the transfer refreshes it too.
 */
export const temperatureKeys = {
  all: ["temperature"] as const,
  profiles: () => [...temperatureKeys.all, "profiles"] as const,
  weatherScenario: () => [...temperatureKeys.all, "weather-scenario"] as const,
  modelAccuracy: () => [...temperatureKeys.all, "model-accuracy"] as const,
  transfer: (transferId: string) => [...transferKeys.detail(transferId), "temperature"] as const,
};
