import { queryOptions, useQuery } from "@tanstack/react-query";
import type { OutboxStatus } from "@shared/constants";
import { api } from "@/lib/api-client";

export type CaughtMail = { id: number; from: string; to: string[]; subject: string; text: string; receivedAt: string };
export type OutboxEntry = {
  id: string;
  to: string;
  subject: string;
  status: OutboxStatus;
  attempts: number;
  lastError: string | null;
  createdAt: string;
  sentAt: string | null;
};

export const caughtMailKey = ["admin", "caught-mail"] as const;

export const caughtMailQueryOptions = () =>
  queryOptions({
    queryKey: caughtMailKey,
    queryFn: () => api<{ messages: CaughtMail[]; outbox: OutboxEntry[]; inboxError: string | null }>("/api/dev/mail"),
    refetchInterval: 5_000,
  });

export const useCaughtMail = () => useQuery(caughtMailQueryOptions());
