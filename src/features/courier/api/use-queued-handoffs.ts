import { useCallback, useEffect, useState } from "react";
import { useQueryClient } from "@tanstack/react-query";
import { HANDOFF_KIND_WORDS, OFFLINE_HANDOFF_TEXT } from "@shared/words";
import { useToast } from "@/components/ui/toast";
import { newIdempotencyKey } from "@/lib/idempotency";
import { queuedHandoffKeys, useQueuedHandoffs } from "@/lib/offline-data";
import { putQueuedHandoff, removeQueuedHandoff, type QueuedHandoff } from "@/lib/offline-handoffs";
import { uploadPhoto } from "@/lib/photos";
import { storeTransfer, transferKeys } from "@/lib/transfer-queries";
import { recordHandoff } from "./record-handoff";
import { sendQueuedHandoffs } from "./send-queued-handoffs";

/** While something waits on the phone, it is tried again this often (and at once when signal returns). */
const RETRY_MS = 30_000;

const transport = { recordHandoff, uploadPhoto };

/** Sends the person's kept handoffs now; what was sent goes to the record, with a notice. */
export function useSendQueuedHandoffs(userId: string) {
  const client = useQueryClient();
  const notify = useToast();
  const [sending, setSending] = useState(false);
  const send = useCallback(async () => {
    setSending(true);
    try {
      const report = await sendQueuedHandoffs(userId, transport);
      if (!report) return;
      for (const { entry, transfer } of report.sent) {
        if (transfer) storeTransfer(client, transfer);
        else void client.invalidateQueries({ queryKey: transferKeys.detail(entry.transferId) });
        notify(`${entry.transferNumber}: ${HANDOFF_KIND_WORDS[entry.kind]} ${OFFLINE_HANDOFF_TEXT.sent}`);
      }
      if (report.photoProblems.length) notify("Not every photo was accepted", report.photoProblems.join(" "));
      if (report.refused.length) void client.invalidateQueries({ queryKey: transferKeys.lists() });
    } catch {
      // The phone's store could not be read: the next round tries again.
    } finally {
      setSending(false);
      void client.invalidateQueries({ queryKey: queuedHandoffKeys.forUser(userId) });
    }
  }, [client, notify, userId]);
  return { send, sending };
}

/**
 * Sends kept handoffs by itself: when the app starts, when the phone gets signal back (`online`),
 * when the page comes back into view, and every 30 s while something waits. Plain page code, not
 * Background Sync: it sends while a Hatchway page is open (D40).
 */
export function useQueuedHandoffSender(userId: string) {
  const queued = useQueuedHandoffs(userId);
  const { send } = useSendQueuedHandoffs(userId);
  const waiting = (queued.data ?? []).some((entry) => entry.state === "waiting");

  useEffect(() => {
    void send();
    const onVisible = () => document.visibilityState === "visible" && void send();
    window.addEventListener("online", send);
    document.addEventListener("visibilitychange", onVisible);
    return () => {
      window.removeEventListener("online", send);
      document.removeEventListener("visibilitychange", onVisible);
    };
  }, [send]);

  useEffect(() => {
    if (!waiting) return;
    const timer = setInterval(() => void send(), RETRY_MS);
    return () => clearInterval(timer);
  }, [send, waiting]);
}

/** After a refusal: discard it (once read), or try again as a new submission. */
export function useResolveQueuedHandoff(userId: string) {
  const client = useQueryClient();
  const refresh = () => client.invalidateQueries({ queryKey: queuedHandoffKeys.forUser(userId) });
  return {
    discard: async (entry: QueuedHandoff) => {
      await removeQueuedHandoff(entry.idempotencyKey);
      await refresh();
    },
    /**
     * A refusal is stored with its key on the server (a retry with it gets the same refusal), and
     * nothing was recorded: a new key makes it a new submission.
     */
    retry: async (entry: QueuedHandoff) => {
      await putQueuedHandoff({ ...entry, idempotencyKey: newIdempotencyKey(), state: "waiting", refusal: null });
      await removeQueuedHandoff(entry.idempotencyKey);
      await refresh();
    },
  };
}
