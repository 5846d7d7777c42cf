import { useState } from "react";
import { formatInstant } from "@shared/dates";
import { HANDOFF_KIND_WORDS, OFFLINE_HANDOFF_STATE_WORDS, OFFLINE_HANDOFF_TEXT } from "@shared/words";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { Notice } from "@/components/ui/feedback";
import type { QueuedHandoff } from "@/lib/offline-handoffs";
import { useResolveQueuedHandoff, useSendQueuedHandoffs } from "../api/use-queued-handoffs";

/**
 * A handoff kept on this phone: waiting for signal (with "Send now"), or refused by the server,
 * in its words, until the courier discards it or tries it again (D40).
 */
export function QueuedHandoffCard({ entry, userId }: { entry: QueuedHandoff; userId: string }) {
  const { send, sending } = useSendQueuedHandoffs(userId);
  const resolve = useResolveQueuedHandoff(userId);
  const [asking, setAsking] = useState(false);
  const photos = entry.photos.length;
  const what = `${HANDOFF_KIND_WORDS[entry.kind]} (${entry.input.handoffIndex + 1})`;
  const confirmed = `Confirmed on this phone ${formatInstant(entry.createdAt)}${
    photos ? ` · ${photos} ${photos === 1 ? "photo" : "photos"} with it` : ""
  }.`;

  if (entry.state === "refused") {
    return (
      <section aria-label={`${what}: ${OFFLINE_HANDOFF_STATE_WORDS.refused}`} className="grid gap-3">
        <Notice tone="block" role="alert" title={`${what}: ${OFFLINE_HANDOFF_STATE_WORDS.refused}`}>
          <p>{OFFLINE_HANDOFF_TEXT.refusedDetail}</p>
          <p className="mt-2 text-base font-semibold">“{entry.refusal?.message}”</p>
          <p className="mt-2">{confirmed}</p>
        </Notice>
        <div className="flex flex-wrap gap-2">
          <Button type="button" variant="secondary" size="lg" onClick={() => void resolve.retry(entry).then(send)}>
            Try it again
          </Button>
          <Button type="button" variant="danger" size="lg" onClick={() => setAsking(true)}>
            Discard it
          </Button>
        </div>
        <ConfirmDialog
          open={asking}
          title={`Discard this ${HANDOFF_KIND_WORDS[entry.kind].toLowerCase()}?`}
          confirmLabel="Discard it"
          tone="danger"
          onConfirm={() => void resolve.discard(entry).then(() => setAsking(false))}
          onCancel={() => setAsking(false)}
        >
          It was never recorded and is removed from this phone. Record the handoff again on this page if it still has to
          be recorded.
        </ConfirmDialog>
      </section>
    );
  }
  return (
    <section aria-label={`${what}: ${OFFLINE_HANDOFF_STATE_WORDS.waiting}`} className="grid gap-3">
      <Notice tone="caution" role="status" title={`${what}: ${OFFLINE_HANDOFF_STATE_WORDS.waiting.toLowerCase()}`}>
        <p>{OFFLINE_HANDOFF_TEXT.waitingDetail}</p>
        <p className="mt-2">{confirmed}</p>
      </Notice>
      <div>
        <Button type="button" variant="secondary" size="lg" busy={sending} onClick={() => void send()}>
          Send now
        </Button>
      </div>
    </section>
  );
}
