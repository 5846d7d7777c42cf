import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { AdminUserDto, UserInviteInput, UserPatch } from "@shared/schemas/auth";
import { api } from "@/lib/api-client";

export const usersKey = ["admin", "users"] as const;

export const usersQueryOptions = () =>
  queryOptions({
    queryKey: usersKey,
    queryFn: () => api<{ users: AdminUserDto[] }>("/api/users").then((r) => r.users),
  });

export const useUsers = () => useQuery(usersQueryOptions());

export function useInviteUser() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: UserInviteInput) => api<{ user: AdminUserDto }>("/api/users", { method: "POST", body: input }),
    onSuccess: () => client.invalidateQueries({ queryKey: usersKey }),
  });
}

export function useUpdateUser() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ id, patch }: { id: string; patch: UserPatch }) =>
      api<{ user: AdminUserDto }>(`/api/users/${id}`, { method: "PATCH", body: patch }),
    onSuccess: () => client.invalidateQueries({ queryKey: usersKey }),
  });
}
