import { queryOptions, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import type { LoginInput, SetPasswordInput, UserDto } from "@shared/schemas/auth";
import { api, ApiError, resetCsrf } from "@/lib/api-client";
import { forgetAllWork } from "@/lib/kept-work";
import { forgetOfflineData } from "@/lib/offline-data";

export type Abilities = {
  manageUsers: boolean;
  manageOrganizations: boolean;
  readCaughtMail: boolean;
  draftTransfers: boolean;
  carryTransfers: boolean;
  /** A manager runs their own organisation's people and details. */
  manageOwnOrganization: boolean;
  /** A courier service's people read its runs; its manager plans them. */
  readRuns: boolean;
  planRuns: boolean;
};
export type Session = { user: UserDto; abilities: Abilities } | null;

export const sessionKey = ["session"] as const;

async function getSession(): Promise<Session> {
  try {
    return await api<{ user: UserDto; abilities: Abilities }>("/api/auth/me");
  } catch (err) {
    if (err instanceof ApiError && err.status === 401) return null;
    throw err;
  }
}

export const sessionQueryOptions = () => queryOptions({ queryKey: sessionKey, queryFn: getSession, staleTime: 60_000 });

export function useSession() {
  return useQuery(sessionQueryOptions());
}

export function useSignIn() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: LoginInput) => api<{ user: UserDto }>("/api/auth/login", { method: "POST", body: input }),
    // Pages the phone kept for someone else go before this person's are read (D40).
    onSuccess: async ({ user }) => {
      await forgetOfflineData(user.id);
      await client.invalidateQueries({ queryKey: sessionKey });
    },
  });
}

export function useSignOut() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => api<void>("/api/auth/logout", { method: "POST" }),
    onSettled: async () => {
      resetCsrf();
      // What the browser kept for the person (e.g. a half-typed transfer, the pages and handoffs
      // kept for use without signal) goes with them.
      forgetAllWork();
      await forgetOfflineData(null);
      client.clear();
      client.setQueryData(sessionKey, null);
    },
  });
}

export function useSetPassword() {
  return useMutation({
    mutationFn: (input: SetPasswordInput) => api<void>("/api/auth/password", { method: "POST", body: input }),
  });
}
