import { VIEWER_ROLE_WORDS } from "@shared/words";
import type { ReactNode } from "react";
import { PaperworkLinks } from "@/components/ui/paperwork-links";
import { useParams } from "react-router";
import type { TransferDto } from "@shared/schemas/transfer";
import { TransportCautions } from "@/components/ui/cautions";
import { Loading, Notice } from "@/components/ui/feedback";
import { PageHeader } from "@/components/ui/page";
import { StatusBadge } from "@/components/ui/status-badge";
import { ApiError } from "@/lib/api-client";
import { formatInstant } from "@shared/dates";
import { useTransfer } from "@/lib/transfer-queries";
import { ActionsBar } from "../components/actions-bar";
import { AlertsSection } from "../components/alerts-section";
import { BoxesSection } from "../components/boxes-section";
import { CustodySection } from "../components/custody-section";
import { DeliverySection } from "../components/delivery-section";
import { DiscussionSection } from "../components/discussion-section";
import { HistorySection } from "../components/history-section";
import { LegsSection } from "../components/legs-section";
import { OverviewSection } from "../components/overview-section";
import { PackingSection } from "../components/packing-section";
import { StateNoticesSection } from "../components/state-notices-section";

type Props = {
  /**
   * The compliance and temperature verdicts, composed in by src/app (features do not import
   * each other). Rendered between the overview and the boxes; nothing is shown without it.
   */
  checks?: (transfer: TransferDto) => ReactNode;
  /** What the check-in recorded (losses, each line's notes, weight and photos), composed in by src/app. */
  arrival?: (transfer: TransferDto) => ReactNode;
};

/** The edit history is the parties' record; the server keeps it from couriers. */
const showHistory = (t: TransferDto) => t.viewerRole !== "courier";

function Contents({
  transfer: t,
  withChecks,
  withArrival,
}: {
  transfer: TransferDto;
  withChecks: boolean;
  withArrival: boolean;
}) {
  const items = [
    ["overview", "Who and where"],
    withChecks ? ["checks", "Rules and weather"] : null,
    ["boxes", "Boxes and animals"],
    ["packing", "Packing"],
    ["legs", "Couriers"],
    ["custody", "Custody trail"],
    withArrival ? ["arrival", "Arrival"] : null,
    t.abilities.discuss ? ["discussion", "Conversation"] : null,
    showHistory(t) ? ["history", "Change history"] : null,
  ].filter((i): i is [string, string] => i !== null);
  return (
    <nav aria-label="On this page" className="text-sm">
      <ul className="flex flex-wrap gap-x-4 gap-y-1">
        {items.map(([id, label]) => (
          <li key={id}>
            <a
              href={`#${id}`}
              className="inline-flex min-h-11 items-center text-fern underline-offset-2 hover:underline"
            >
              {label}
            </a>
          </li>
        ))}
      </ul>
    </nav>
  );
}

const CHECK_NAMES: Record<string, string> = { compliance: "the rules of the route", temperature: "the weather" };

/**
 * Demo or benchmark data cleared past the gates (D16): its "cleared" was never checked, and the
 * page says so rather than let the status read as a verdict.
 */
function LoadedWithoutChecks({ loaded }: { loaded: NonNullable<TransferDto["loadedWithoutChecks"]> }) {
  const names = loaded.checksNotRun.map((c) => CHECK_NAMES[c] ?? c);
  return (
    <Notice tone="caution" title={loaded.loadedAs === "demo" ? "Demo data: not checked" : "Test data: not checked"}>
      This transfer was loaded as {loaded.loadedAs === "demo" ? "invented demo data" : "benchmark data"} and cleared to
      travel on {formatInstant(loaded.at, null)} without checking {names.join(" or ")}. Its status is not a verdict:
      nothing here says these animals may travel.
    </Notice>
  );
}

/** The shared record of one transfer, as the caller may see it. */
export function TransferDetailRoute({ checks, arrival }: Props) {
  const { transferId = "" } = useParams();
  const transfer = useTransfer(transferId);
  if (transfer.isPending) return <Loading label="Loading the transfer…" />;
  if (transfer.error) {
    const missing = transfer.error instanceof ApiError && transfer.error.status === 404;
    return (
      <Notice tone="block" role="alert" title={missing ? "No such transfer" : "This transfer did not load"}>
        {missing ? "It does not exist, or it is not one of yours." : (transfer.error as Error).message}
      </Notice>
    );
  }
  const t = transfer.data;
  return (
    // minmax(0, 1fr): a wide table scrolls inside its box instead of widening the page on a phone.
    <div className="grid grid-cols-1 gap-5">
      <PageHeader
        title={`Transfer ${t.number}`}
        eyebrow={VIEWER_ROLE_WORDS[t.viewerRole]}
        actions={<StatusBadge status={t.status} />}
      >
        {t.origin.city}, {t.origin.state} → {t.destination.city}, {t.destination.state} · leaves{" "}
        {formatInstant(t.plannedDepartureAt, t.origin.timeZone)}
      </PageHeader>
      {t.status === "cancelled" && t.cancelledReason ? (
        <Notice tone="block" title="Cancelled">
          {t.cancelledReason}
        </Notice>
      ) : null}
      {t.loadedWithoutChecks ? <LoadedWithoutChecks loaded={t.loadedWithoutChecks} /> : null}
      {t.reconfirmationReason && t.status === "awaiting_receiver" ? (
        <Notice tone="caution" title="Changed after confirmation">
          {t.reconfirmationReason}
        </Notice>
      ) : null}
      <AlertsSection transfer={t} />
      <StateNoticesSection transfer={t} />
      <DeliverySection transfer={t} />
      <ActionsBar transfer={t} />
      <PaperworkLinks transferId={t.id} />
      <TransportCautions />
      <Contents transfer={t} withChecks={Boolean(checks)} withArrival={Boolean(arrival && t.checkIn)} />
      <OverviewSection transfer={t} />
      {checks ? (
        <section id="checks" aria-label="Rules and weather" className="scroll-mt-4">
          {checks(t)}
        </section>
      ) : null}
      <BoxesSection transfer={t} />
      <PackingSection transfer={t} />
      <LegsSection transfer={t} />
      <CustodySection transfer={t} />
      {arrival && t.checkIn ? (
        <section
          id="arrival"
          aria-labelledby="arrival-heading"
          className="scroll-mt-4 rounded-card border border-rule bg-paper-card p-4 shadow-card sm:p-5"
        >
          <h2 id="arrival-heading" className="mb-3 text-lg font-semibold">
            Arrival
          </h2>
          {arrival(t)}
        </section>
      ) : null}
      <DiscussionSection transfer={t} />
      {showHistory(t) ? <HistorySection transfer={t} /> : null}
    </div>
  );
}
