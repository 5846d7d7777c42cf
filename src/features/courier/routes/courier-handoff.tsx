import { TRANSFER_STATUS_WORDS } from "@shared/words";
import { DELIVERY_STATE_WORDS, HANDOFF_KIND_WORDS, OFFLINE_HANDOFF_STATE_WORDS } from "@shared/words";
import { useState } from "react";
import { PaperworkLinks } from "@/components/ui/paperwork-links";
import { useParams } from "react-router";
import { TransportCautions } from "@/components/ui/cautions";
import { Loading, Notice } from "@/components/ui/feedback";
import { StatusBadge } from "@/components/ui/status-badge";
import { ApiError } from "@/lib/api-client";
import { formatInstant } from "@shared/dates";
import { useTransfer } from "@/lib/transfer-queries";
import { useViewer } from "@/lib/viewer";
import { useDocumentTitle } from "@/lib/document-title";
import { useQueuedHandoffs } from "@/lib/offline-data";
import { AddPhotos } from "../components/add-photos";
import { DeliveryCodeEntry } from "../components/delivery-code-entry";
import { HandoffForm } from "../components/handoff-form";
import { QueuedHandoffCard } from "../components/queued-handoff";

const phoneLink =
  "inline-flex min-h-12 items-center rounded-md border border-rule bg-paper-card px-4 text-lg font-semibold text-fern";

/** The page a box label's QR code opens: the transfer at a glance, and the handoff to record. */
export function CourierHandoffRoute() {
  const { transferId = "" } = useParams();
  const viewer = useViewer();
  const transfer = useTransfer(transferId);
  const queue = useQueuedHandoffs(viewer.user.id);
  const [recorded, setRecorded] = useState<{ message: string; problems: string[] } | null>(null);
  useDocumentTitle(transfer.data ? `Leg of ${transfer.data.number}` : "Your leg");

  if (transfer.isPending) return <Loading label="Loading the transfer…" />;
  if (transfer.error) {
    const missing = transfer.error instanceof ApiError && transfer.error.status === 404;
    return (
      <Notice tone="block" role="alert" title={missing ? "Not one of your legs" : "This transfer did not load"}>
        {missing
          ? "Only the parties and assigned couriers see a transfer. Check that you are signed in as the assigned courier."
          : (transfer.error as Error).message}
      </Notice>
    );
  }
  const t = transfer.data;
  const legs = [...t.legs].sort((a, b) => a.sequence - b.sequence);
  const animals = t.animals.reduce((n, a) => n + a.count, 0);
  const next = t.abilities.handOff;
  // Kept on this phone and not yet on the record (D40); one the record already has is not shown twice.
  const kept = (queue.data ?? []).filter(
    (entry) => entry.transferId === t.id && !t.handoffs.some((h) => h.handoffIndex === entry.input.handoffIndex),
  );
  const keptAt = (index: number) => kept.find((entry) => entry.input.handoffIndex === index);

  return (
    <div className="mx-auto grid max-w-xl gap-5 text-lg">
      <header className="grid gap-1">
        <p className="text-sm font-semibold uppercase tracking-widest text-ink-faint">Transfer</p>
        <h1 className="text-3xl font-bold">{t.number}</h1>
        <p>
          <StatusBadge status={t.status} />
        </p>
        <p>
          {t.origin.city}, {t.origin.state} → {t.destination.city}, {t.destination.state}
        </p>
        <p className="text-ink-soft">
          {t.containers.length} {t.containers.length === 1 ? "box" : "boxes"} · {animals} live{" "}
          {animals === 1 ? "animal" : "animals"} · leaves {formatInstant(t.plannedDepartureAt, t.origin.timeZone)}
        </p>
      </header>

      {recorded ? (
        <Notice tone="ok" role="status" title={recorded.message}>
          It is in the custody trail; the sender and receiver can see it.
        </Notice>
      ) : null}
      {recorded?.problems.length ? (
        <Notice tone="block" role="alert" title="Some photos were not sent">
          {recorded.problems.join(" ")}
        </Notice>
      ) : null}
      {kept.map((entry) => (
        <QueuedHandoffCard key={entry.idempotencyKey} entry={entry} userId={viewer.user.id} />
      ))}
      {t.abilities.enterDeliveryCode ? <DeliveryCodeEntry transfer={t} /> : null}

      <TransportCautions />
      {t.handlingNotes ? (
        <Notice tone="info" title="Handling notes from the sender">
          <p className="whitespace-pre-wrap text-base">{t.handlingNotes}</p>
        </Notice>
      ) : null}

      <PaperworkLinks transferId={t.id} labels={false} />

      <section aria-label="Phone numbers" className="flex flex-wrap gap-2">
        <a className={phoneLink} href={`tel:${t.sender.organization.phone}`}>
          Call the sender
        </a>
        <a className={phoneLink} href={`tel:${t.receiver.organization.phone}`}>
          Call the receiver
        </a>
      </section>

      <section aria-label="Handoffs" className="grid gap-2">
        <h2 className="text-xl font-semibold">Handoffs</h2>
        <ol className="grid gap-2">
          {Array.from({ length: t.handoffsPlanned }, (_, i) => {
            const done = t.handoffs.find((h) => h.handoffIndex === i);
            const carrier = legs[i];
            const mine = carrier?.courier.id === viewer.user.id || legs[i - 1]?.courier.id === viewer.user.id;
            return (
              <li
                key={i}
                className={`rounded-md border p-3 ${
                  keptAt(i) && !done
                    ? keptAt(i)!.state === "refused"
                      ? "border-brick-line bg-brick-bg"
                      : "border-amber-line bg-amber-bg"
                    : i === next
                      ? "border-fern bg-fern-light"
                      : "border-rule bg-paper-card"
                }`}
              >
                <p className="font-semibold">
                  {i + 1}.{" "}
                  {done
                    ? HANDOFF_KIND_WORDS[done.kind]
                    : i === 0
                      ? HANDOFF_KIND_WORDS.pickup
                      : i === legs.length
                        ? HANDOFF_KIND_WORDS.delivery
                        : HANDOFF_KIND_WORDS.handoff}
                  {mine ? <span className="font-normal text-ink-soft"> · yours</span> : null}
                </p>
                <p className="text-base text-ink-soft">
                  {done
                    ? `${done.releasedByName} → ${done.receivedByName} · recorded ${formatInstant(done.at)}`
                    : keptAt(i)
                      ? OFFLINE_HANDOFF_STATE_WORDS[keptAt(i)!.state]
                      : i === next
                        ? "To record now"
                        : "Not yet"}
                </p>
                {done && i === legs.length && t.delivery ? (
                  <p
                    className={`text-base ${t.delivery.state === "acknowledged" ? "text-fern-dark" : "font-semibold text-amber"}`}
                  >
                    {DELIVERY_STATE_WORDS[t.delivery.state]}
                  </p>
                ) : null}
              </li>
            );
          })}
        </ol>
      </section>

      {next !== null && keptAt(next) ? null : next !== null ? (
        <HandoffForm
          key={`${next}-${t.version}`}
          transfer={t}
          index={next}
          viewer={viewer.user}
          onRecorded={(message, problems, keptOnPhone) => (keptOnPhone ? null : setRecorded({ message, problems }))}
        />
      ) : (
        <Notice tone="info" title="Nothing for you to record right now">
          {t.handoffs.length === t.handoffsPlanned && t.handoffsPlanned > 0
            ? "Every handoff of this transfer is recorded."
            : t.status === "ready" || t.status === "in_transit"
              ? "The next handoff is someone else's to record: the courier of the next leg, or the receiver."
              : `The transfer is “${TRANSFER_STATUS_WORDS[t.status]}”: handoffs are recorded once it is cleared to travel.`}
        </Notice>
      )}
      {t.abilities.addPhotos && t.handoffs.length > 0 && next === null ? <AddPhotos transfer={t} /> : null}
    </div>
  );
}
