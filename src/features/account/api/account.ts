import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { AccountDto, AccountPatchInput, InvitationDto, SignupInput } from "@shared/schemas/account";
import type { UserDto } from "@shared/schemas/auth";
import { api } from "@/lib/api-client";

/** The session's key (owned by the auth feature): signing in by confirmation refreshes it. */
const sessionKey = ["session"] as const;
export const accountKey = ["account"] as const;

export function useSignUp() {
  return useMutation({
    mutationFn: (input: SignupInput) =>
      api<{ status: "check_your_email" }>("/api/signup", { method: "POST", body: input }),
  });
}

export function useConfirmSignup() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (token: string) => api<{ user: UserDto }>("/api/signup/confirm", { method: "POST", body: { token } }),
    onSuccess: () => client.invalidateQueries({ queryKey: sessionKey }),
  });
}

export const invitationQueryOptions = (token: string) =>
  queryOptions({
    queryKey: ["invitation", token],
    queryFn: ({ signal }) =>
      api<{ invitation: InvitationDto }>(`/api/signup/invitation?token=${encodeURIComponent(token)}`, { signal }).then(
        (r) => r.invitation,
      ),
    retry: false,
  });

export const useInvitation = (token: string | null) =>
  useQuery({ ...invitationQueryOptions(token ?? ""), enabled: !!token });

export function useRequestPasswordReset() {
  return useMutation({
    mutationFn: (email: string) =>
      api<{ status: string }>("/api/auth/password-reset", { method: "POST", body: { email } }),
  });
}

export const useAccount = () =>
  useQuery({
    queryKey: accountKey,
    queryFn: ({ signal }) => api<{ account: AccountDto }>("/api/account", { signal }).then((r) => r.account),
  });

export function useUpdateAccount() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: AccountPatchInput) =>
      api<{ account: AccountDto }>("/api/account", { method: "PATCH", body: input }).then((r) => r.account),
    onSuccess: (account) => {
      client.setQueryData(accountKey, account);
      void client.invalidateQueries({ queryKey: sessionKey });
    },
  });
}

export function useChangePassword() {
  return useMutation({
    mutationFn: (input: { currentPassword: string; newPassword: string }) =>
      api<void>("/api/account/password", { method: "POST", body: input }),
  });
}

export function useJoinOrganization() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (token: string) =>
      api<{ organization: { name: string } }>("/api/organizations/join", { method: "POST", body: { token } }),
    onSuccess: () => client.invalidateQueries({ queryKey: sessionKey }),
  });
}
