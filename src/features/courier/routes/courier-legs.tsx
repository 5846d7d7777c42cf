import { Link } from "react-router";
import type { TransferStatus } from "@shared/constants";
import type { TransferSummaryDto } from "@shared/schemas/transfer";
import { Button } from "@/components/ui/button";
import { TransportCautions } from "@/components/ui/cautions";
import { Badge, EmptyState, Loading, Notice } from "@/components/ui/feedback";
import { PageHeader } from "@/components/ui/page";
import { StatusBadge } from "@/components/ui/status-badge";
import { paths } from "@/config/paths";
import { formatInstant } from "@shared/dates";
import { useQueuedHandoffs } from "@/lib/offline-data";
import type { QueuedHandoff } from "@/lib/offline-handoffs";
import { useTransfers } from "@/lib/transfer-queries";
import { useViewer } from "@/lib/viewer";
import { OFFLINE_HANDOFF_STATE_WORDS } from "@shared/words";

const FINISHED: readonly TransferStatus[] = ["delivered", "checked_in", "closed", "cancelled"];

/** Handoffs of this leg kept on the phone (D40): said on the card, so nothing waits unseen. */
function KeptOnPhone({ entries }: { entries: QueuedHandoff[] }) {
  if (!entries.length) return null;
  const refused = entries.filter((e) => e.state === "refused").length;
  const waiting = entries.length - refused;
  return (
    <div className="grid justify-items-start gap-1">
      {waiting ? (
        <Badge tone="caution">
          {waiting === 1 ? "1 handoff" : `${waiting} handoffs`}: {OFFLINE_HANDOFF_STATE_WORDS.waiting.toLowerCase()}
        </Badge>
      ) : null}
      {refused ? (
        <Badge tone="block">
          {refused === 1 ? "1 handoff" : `${refused} handoffs`}: {OFFLINE_HANDOFF_STATE_WORDS.refused.toLowerCase()}
        </Badge>
      ) : null}
    </div>
  );
}

function LegCard({ transfer: t, kept }: { transfer: TransferSummaryDto; kept: QueuedHandoff[] }) {
  return (
    <li className="grid gap-2 rounded-card border border-rule bg-paper-card p-4 shadow-card">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p className="font-display text-2xl font-bold">{t.number}</p>
        <StatusBadge status={t.status} />
      </div>
      <p className="text-lg">
        {t.origin.city}, {t.origin.state} → {t.destination.city}, {t.destination.state}
      </p>
      <p className="text-ink-soft">
        Leaves {formatInstant(t.plannedDepartureAt, t.origin.timeZone)} · {t.animalCount}{" "}
        {t.animalCount === 1 ? "animal" : "animals"}
      </p>
      <p className="text-sm text-ink-soft">
        {t.sender.name} to {t.receiver.name}
      </p>
      <KeptOnPhone entries={kept} />
      <Link
        to={paths.courier.handoff.href(t.id)}
        className="mt-1 inline-flex min-h-14 items-center justify-center rounded-md border border-fern-dark bg-fern px-6 text-lg font-semibold text-paper-card hover:bg-fern-dark"
        aria-label={`Open ${t.number}`}
      >
        Open
      </Link>
    </li>
  );
}

/** The courier's home on the phone: the legs they carry, soonest first; finished ones below. */
export function CourierLegsRoute() {
  const list = useTransfers({ role: "carrying", sort: "departure", dir: "asc" });
  const viewer = useViewer();
  const queue = useQueuedHandoffs(viewer.user.id);
  const keptFor = (id: string) => (queue.data ?? []).filter((entry) => entry.transferId === id);
  const rows = list.data?.pages.flatMap((p) => p.transfers) ?? [];
  const open = rows.filter((t) => !FINISHED.includes(t.status));
  const done = rows.filter((t) => FINISHED.includes(t.status));
  return (
    <div className="mx-auto grid max-w-xl gap-5">
      <PageHeader title="My legs">Scan a box label's code, or open a transfer here.</PageHeader>
      <TransportCautions />
      {list.isPending ? (
        <Loading label="Loading your legs…" />
      ) : list.error ? (
        <Notice tone="block" role="alert">
          {(list.error as Error).message}
        </Notice>
      ) : rows.length === 0 ? (
        <EmptyState title="No legs assigned to you">When a sender assigns you a leg, it appears here.</EmptyState>
      ) : (
        <>
          <section aria-labelledby="legs-open" className="grid gap-3">
            <h2 id="legs-open" className="text-xl font-semibold">
              To carry
            </h2>
            {open.length ? (
              <ul className="grid gap-3">
                {open.map((t) => (
                  <LegCard key={t.id} transfer={t} kept={keptFor(t.id)} />
                ))}
              </ul>
            ) : (
              <p className="text-ink-soft">Nothing waiting.</p>
            )}
          </section>
          {done.length ? (
            <section aria-labelledby="legs-done" className="grid gap-3">
              <h2 id="legs-done" className="text-xl font-semibold">
                Delivered or ended
              </h2>
              <ul className="grid gap-3">
                {done.map((t) => (
                  <LegCard key={t.id} transfer={t} kept={keptFor(t.id)} />
                ))}
              </ul>
            </section>
          ) : null}
          {list.hasNextPage ? (
            <Button
              variant="secondary"
              size="lg"
              onClick={() => void list.fetchNextPage()}
              busy={list.isFetchingNextPage}
            >
              Show more
            </Button>
          ) : null}
        </>
      )}
    </div>
  );
}
