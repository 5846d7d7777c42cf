import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { OrganizationDto, OrganizationInput, OrganizationPatch } from "@shared/schemas/auth";
import { api } from "@/lib/api-client";

export const organizationsKey = ["admin", "organizations"] as const;

export const organizationsQueryOptions = () =>
  queryOptions({
    queryKey: organizationsKey,
    queryFn: () => api<{ organizations: OrganizationDto[] }>("/api/organizations").then((r) => r.organizations),
  });

export const useOrganizations = () => useQuery(organizationsQueryOptions());

export function useCreateOrganization() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: OrganizationInput) =>
      api<{ organization: OrganizationDto }>("/api/organizations", { method: "POST", body: input }),
    onSuccess: () => client.invalidateQueries({ queryKey: organizationsKey }),
  });
}

export function useUpdateOrganization() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ id, patch }: { id: string; patch: OrganizationPatch }) =>
      api<{ organization: OrganizationDto }>(`/api/organizations/${id}`, { method: "PATCH", body: patch }),
    onSuccess: () => client.invalidateQueries({ queryKey: organizationsKey }),
  });
}
