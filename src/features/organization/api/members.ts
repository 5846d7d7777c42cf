import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { MemberDto, MemberInviteInput, MemberPatchInput, OrganizationDto } from "@shared/schemas/auth";
import { api } from "@/lib/api-client";

export const organizationKeys = {
  detail: (id: string) => ["organizations", id] as const,
  members: (id: string) => ["organizations", id, "members"] as const,
};

export const useOrganization = (id: string) =>
  useQuery({
    queryKey: organizationKeys.detail(id),
    queryFn: ({ signal }) =>
      api<{ organization: OrganizationDto }>(`/api/organizations/${id}`, { signal }).then((r) => r.organization),
  });

export const useMembers = (id: string) =>
  useQuery({
    queryKey: organizationKeys.members(id),
    queryFn: ({ signal }) =>
      api<{ members: MemberDto[] }>(`/api/organizations/${id}/members`, { signal }).then((r) => r.members),
  });

export function useInviteMember(id: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: MemberInviteInput) =>
      api<{ invitation: { awaitingAcceptance: boolean } }>(`/api/organizations/${id}/members`, {
        method: "POST",
        body: input,
      }),
    onSuccess: () => client.invalidateQueries({ queryKey: organizationKeys.members(id) }),
  });
}

export function useChangeMember(id: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ userId, change }: { userId: string; change: MemberPatchInput }) =>
      api(`/api/organizations/${id}/members/${userId}`, { method: "PATCH", body: change }),
    onSuccess: () => client.invalidateQueries({ queryKey: organizationKeys.members(id) }),
  });
}

export function useUpdateOrganization(id: string) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: { listed?: boolean; phone?: string; email?: string }) =>
      api<{ organization: OrganizationDto }>(`/api/organizations/${id}`, { method: "PATCH", body: input }),
    onSuccess: () => client.invalidateQueries({ queryKey: organizationKeys.detail(id) }),
  });
}
