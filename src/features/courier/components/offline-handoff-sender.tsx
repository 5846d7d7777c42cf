import { useQueuedHandoffSender } from "../api/use-queued-handoffs";

/** Mounted once by the app's layout: sends the handoffs kept on this phone whenever it can (D40). */
export function OfflineHandoffSender({ userId }: { userId: string }) {
  useQueuedHandoffSender(userId);
  return null;
}
