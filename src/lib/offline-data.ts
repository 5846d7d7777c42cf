import { queryOptions, useQuery } from "@tanstack/react-query";
import { OFFLINE_API_CACHE } from "@/config/offline-cache";
import { forgetQueuedHandoffs, listQueuedHandoffs } from "./offline-handoffs";

const LAST_USER_KEY = "hatchway.offline.lastUser";

export const queuedHandoffKeys = {
  all: ["queued-handoffs"] as const,
  forUser: (userId: string) => [...queuedHandoffKeys.all, userId] as const,
};

/** The person's handoffs kept on this phone. IndexedDB needs no network: asked for offline too. */
export const queuedHandoffsQueryOptions = (userId: string) =>
  queryOptions({
    queryKey: queuedHandoffKeys.forUser(userId),
    queryFn: () => listQueuedHandoffs(userId).catch(() => []),
    networkMode: "always",
  });

export const useQueuedHandoffs = (userId: string) => useQuery(queuedHandoffsQueryOptions(userId));

/**
 * Forgets what the phone kept for a person: the service worker's copies of API answers and the
 * kept handoffs of everyone but `keepUserId` (null at sign-out). Never throws: a browser without
 * these stores has nothing to forget.
 */
export async function forgetOfflineData(keepUserId: string | null): Promise<void> {
  await Promise.all([
    typeof caches !== "undefined" ? caches.delete(OFFLINE_API_CACHE).catch(() => false) : null,
    forgetQueuedHandoffs(keepUserId).catch(() => undefined),
  ]);
  try {
    if (keepUserId) localStorage.setItem(LAST_USER_KEY, keepUserId);
    else localStorage.removeItem(LAST_USER_KEY);
  } catch {
    // storage switched off: nothing was kept either
  }
}

/**
 * Called with each signed-in person: when the phone last served someone else (a session that
 * changed hands without our sign-out), what it kept for them goes. Sign-in and sign-out forget
 * by themselves; after them there is no "last" person and nothing to forget.
 */
export async function forgetOtherPeople(userId: string): Promise<void> {
  let last: string | null;
  try {
    last = localStorage.getItem(LAST_USER_KEY);
    if (last === null) localStorage.setItem(LAST_USER_KEY, userId);
  } catch {
    return;
  }
  if (last !== null && last !== userId) await forgetOfflineData(userId);
}
