import { Link } from "react-router";
import type { RunSummaryDto } from "@shared/schemas/run";
import { formatInstant } from "@shared/dates";
import { EmptyState, Loading, Notice } from "@/components/ui/feedback";
import { PageHeader } from "@/components/ui/page";
import { paths } from "@/config/paths";
import { useViewer } from "@/lib/viewer";
import { useRuns } from "../api/runs";

const linkButton =
  "inline-flex min-h-11 items-center justify-center rounded-md border border-fern-dark bg-fern px-4 font-medium text-paper-card hover:bg-fern-dark";

function RunCard({ run }: { run: RunSummaryDto }) {
  const transfers = run.transferIds.length;
  return (
    <li className="grid gap-1 rounded-card border border-rule bg-paper-card p-4 shadow-card">
      <p className="font-semibold">Leaves {formatInstant(run.departAt)}</p>
      <p className="text-sm text-ink-soft">
        {transfers} {transfers === 1 ? "transfer" : "transfers"}, {run.stopCount} stops · {run.drivingH.toFixed(1)} h
        driving · done {formatInstant(run.finishAt)}
      </p>
      <p className="text-sm text-ink-soft">
        {run.climateControlled ? "Climate-controlled van" : "Van not climate-controlled"}
      </p>
      <Link
        to={paths.run.href(run.id)}
        className="mt-1 text-fern underline"
        aria-label={`Open the run leaving ${formatInstant(run.departAt)}`}
      >
        Open the run
      </Link>
    </li>
  );
}

/** A courier service's runs, soonest departure first; its manager plans new ones from here. */
export function RunsRoute() {
  const { abilities } = useViewer();
  const runs = useRuns();
  return (
    <div className="mx-auto grid max-w-3xl gap-5">
      <PageHeader
        title="Runs"
        actions={
          abilities.planRuns ? (
            <Link to={paths.runNew} className={linkButton}>
              Plan a run
            </Link>
          ) : undefined
        }
      >
        One van, many transfers: the stops in order with their times, and the rests the drive needs. Soonest first.
      </PageHeader>
      {runs.isPending ? (
        <Loading label="Loading the runs…" />
      ) : runs.error ? (
        <Notice tone="block" role="alert">
          {(runs.error as Error).message}
        </Notice>
      ) : runs.data.length === 0 ? (
        <EmptyState title="No runs yet">
          {abilities.planRuns
            ? "Plan a run to put the transfers your service was asked to carry in one van."
            : "Your manager plans the runs; they appear here."}
        </EmptyState>
      ) : (
        <ul className="grid gap-3">
          {runs.data.map((run) => (
            <RunCard key={run.id} run={run} />
          ))}
        </ul>
      )}
    </div>
  );
}
