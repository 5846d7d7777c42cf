import { useState } from "react";
import { useParams } from "react-router";
import type { RunNotifiedDto, RunPatch } from "@shared/schemas/run";
import { formatInstant } from "@shared/dates";
import { formatDistance, formatTemp } from "@shared/units";
import { LazyRouteMap } from "@/components/map/lazy-route-map";
import { Loading, Notice } from "@/components/ui/feedback";
import { Card, PageHeader } from "@/components/ui/page";
import { ApiError } from "@/lib/api-client";
import { useUnitSystem } from "@/lib/units-preference";
import { runSheetHref, useRun, useUpdateRun } from "../api/runs";
import { AddTransfers } from "../components/add-transfers";
import { runMapProps } from "../components/run-order";
import { RunRests } from "../components/run-rests";
import { RunStops } from "../components/run-stops";
import { useViewer } from "@/lib/viewer";
import { paths } from "@/config/paths";
import { RunTold } from "../components/run-told";

/** A run: its stops in order, the rests as guidance, the map, the sheet; the manager changes the order. */
export function RunPageRoute() {
  const { runId = "" } = useParams();
  const run = useRun(runId);
  const update = useUpdateRun(runId);
  const [system] = useUnitSystem();
  const viewer = useViewer();
  const [told, setTold] = useState<RunNotifiedDto[] | null>(null);
  if (run.isPending) return <Loading label="Loading the run…" />;
  if (run.error)
    return (
      <Notice tone="block" role="alert" title="The run did not load">
        {(run.error as Error).message}
      </Notice>
    );
  const data = run.data;
  const change = (patch: RunPatch) =>
    update.mutateAsync(patch).then(
      (answer) => setTold(answer.notified),
      () => setTold(null),
    );
  const failure = update.error instanceof ApiError ? update.error.message : update.error ? String(update.error) : null;
  const van = data.climateControlled
    ? `Climate-controlled${data.vehicleRangeF ? `, ${formatTemp(data.vehicleRangeF.min, system)} to ${formatTemp(data.vehicleRangeF.max, system)}` : ""}`
    : "Not climate-controlled";
  return (
    <div className="mx-auto grid max-w-4xl gap-5">
      <PageHeader
        title={`Run leaving ${formatInstant(data.departAt, data.stops[0]?.place.timeZone)}`}
        documentTitle="Run"
        eyebrow={data.courierOrganization.name}
        actions={
          <a href={runSheetHref(data.id)} className="inline-flex min-h-11 items-center text-fern underline">
            Run sheet (PDF)
          </a>
        }
      />
      <dl className="grid gap-x-6 gap-y-1 text-sm sm:grid-cols-[auto_1fr]">
        <dt className="text-ink-soft">Driving</dt>
        <dd>
          {data.drivingH.toFixed(1)} h, {formatDistance(data.roadKm, system)} by road (estimated)
        </dd>
        <dt className="text-ink-soft">Done</dt>
        <dd>{formatInstant(data.finishAt, data.stops.at(-1)?.place.timeZone)}</dd>
        <dt className="text-ink-soft">Van</dt>
        <dd>{van}</dd>
        <dt className="text-ink-soft">Drivers</dt>
        <dd>{data.drivers.map((d) => d.displayName).join(", ") || "Not named yet"}</dd>
      </dl>
      {told ? <RunTold notified={told} /> : null}
      {failure ? (
        <Notice tone="block" role="alert" title="The run was not changed">
          {failure}
        </Notice>
      ) : null}
      <Card title="Stops in order">
        <RunStops
          run={data}
          busy={update.isPending}
          onChange={change}
          transferHref={viewer.abilities.carryTransfers ? paths.courier.handoff.href : paths.transfers.detail.href}
        />
      </Card>
      <Card title="Map of the run">
        <LazyRouteMap {...runMapProps(data)} />
      </Card>
      <Card title="Rests on the way">
        <RunRests run={data} />
      </Card>
      {data.abilities.edit ? (
        <Card title="Add transfers">
          <AddTransfers run={data} busy={update.isPending} onChange={change} />
        </Card>
      ) : null}
    </div>
  );
}
