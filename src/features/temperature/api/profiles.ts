import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { ProfileGroup } from "@shared/constants";
import type { ProfileData } from "@shared/temperature/profile-schema";
import type { TemperatureProfileDto } from "@shared/temperature/report";
import { api } from "@/lib/api-client";
import { temperatureKeys } from "./keys";

type ProfilesDto = { profiles: TemperatureProfileDto[]; abilities: { edit: boolean } };

export const profilesQueryOptions = () =>
  queryOptions({
    queryKey: temperatureKeys.profiles(),
    queryFn: ({ signal }) => api<ProfilesDto>("/api/temperature/profiles", { signal }),
  });

export const useProfiles = () => useQuery(profilesQueryOptions());

/** An admin's edit; every verdict computed afterwards uses it, so cached verdicts are refreshed. */
export function useUpdateProfile() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ group, data }: { group: ProfileGroup; data: ProfileData }) =>
      api<{ profile: TemperatureProfileDto }>(`/api/temperature/profiles/${encodeURIComponent(group)}`, {
        method: "PUT",
        body: data,
      }),
    onSuccess: () => {
      void client.invalidateQueries({ queryKey: temperatureKeys.profiles() });
      void client.invalidateQueries({ predicate: (q) => q.queryKey.at(-1) === "temperature" });
    },
  });
}
