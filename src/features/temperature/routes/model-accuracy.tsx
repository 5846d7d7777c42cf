import { Link } from "react-router";
import { formatInstant } from "@shared/dates";
import type { ModelAccuracyDto } from "@shared/temperature/report";
import { formatTemp, tempUnit, type UnitSystem } from "@shared/units";
import { EmptyState, Loading, Notice } from "@/components/ui/feedback";
import { Card, PageHeader } from "@/components/ui/page";
import { paths } from "@/config/paths";
import { useUnitSystem } from "@/lib/units-preference";
import { useModelAccuracy } from "../api/model-accuracy";
import { ScrollRegion } from "@/components/ui/table";

/** A temperature difference in the chosen unit: °F differences are 1.8 times °C differences. */
function difference(differenceF: number, system: UnitSystem, signed = false): string {
  const value = system === "imperial" ? differenceF : differenceF / 1.8;
  const sign = signed ? (value > 0 ? "+" : value < 0 ? "−" : "±") : "";
  return `${sign}${Math.abs(value).toFixed(1)} ${tempUnit(system)}`;
}

/**
 * How far the model has been from the box temperatures read on the way, across the transfers the
 * organisation sent or received: so keepers can judge it. Nothing here changes a verdict.
 */
export function ModelAccuracyRoute() {
  const accuracy = useModelAccuracy();
  return (
    <>
      <PageHeader title="The model against the readings" eyebrow="Temperature">
        How far the box temperatures read at pickups, handoffs and check-ins have been from what the model predicted
        when each box left. Readings never change a verdict: use this to judge how much to trust it.
      </PageHeader>
      {accuracy.isPending ? (
        <Loading label="Comparing readings with the model…" />
      ) : accuracy.error ? (
        <Notice tone="block" role="alert" title="The comparison did not load">
          {(accuracy.error as Error).message}
        </Notice>
      ) : (
        <AccuracyBody data={accuracy.data} />
      )}
    </>
  );
}

function AccuracyBody({ data }: { data: ModelAccuracyDto }) {
  const [system] = useUnitSystem();
  if (data.readings === 0)
    return (
      <EmptyState title="No readings to compare yet">
        {data.readingsWithoutModel > 0
          ? `${data.readingsWithoutModel} box temperatures were read on transfers with no forecast check on record when the box left, so there is nothing to compare them with.`
          : "Box temperatures read at pickups, handoffs and check-ins appear here once there is a forecast check on record for the transfer."}
      </EmptyState>
    );
  return (
    <div className="grid gap-6 lg:grid-cols-2">
      <Card title="Across your transfers">
        <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-[auto_1fr]">
          <dt className="text-ink-soft">Readings compared</dt>
          <dd>
            {data.readings} on {data.byTransfer.length} {data.byTransfer.length === 1 ? "transfer" : "transfers"}
            {data.readingsWithoutModel ? ` (${data.readingsWithoutModel} more had no prediction on record)` : ""}
          </dd>
          <dt className="text-ink-soft">Mean difference, either way</dt>
          <dd>{difference(data.meanAbsoluteDifferenceF ?? 0, system)}</dd>
          <dt className="text-ink-soft">On average the boxes ran</dt>
          <dd>
            {difference(data.meanDifferenceF ?? 0, system, true)}{" "}
            {(data.meanDifferenceF ?? 0) >= 0 ? "warmer than the model said" : "colder than the model said"}
          </dd>
          {data.worst ? (
            <>
              <dt className="text-ink-soft">Worst difference</dt>
              <dd>
                {difference(data.worst.differenceF, system, true)}: {data.worst.number}, {data.worst.place},{" "}
                {formatInstant(data.worst.at)} — the box read {formatTemp(data.worst.tempF, system)}, the model said{" "}
                {formatTemp(data.worst.modelF, system)}.
              </dd>
            </>
          ) : null}
        </dl>
      </Card>
      <Card title="Transfer by transfer">
        <ScrollRegion label="Readings against the model, transfer by transfer">
          <table className="w-full text-left text-sm">
            <thead>
              <tr className="border-b border-rule text-ink-soft">
                {["Transfer", "Readings", "Mean difference", "Worst"].map((h) => (
                  <th key={h} scope="col" className="py-1 pr-3 font-semibold">
                    {h}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {data.byTransfer.map((t) => (
                <tr key={t.transferId} className="border-b border-rule/60 last:border-0">
                  <td className="py-1 pr-3">
                    <Link to={paths.transfers.detail.href(t.transferId)} className="text-fern underline">
                      {t.number}
                    </Link>
                  </td>
                  <td className="py-1 pr-3">{t.readings}</td>
                  <td className="py-1 pr-3">{difference(t.meanAbsoluteDifferenceF, system)}</td>
                  <td className="py-1">{difference(t.worstDifferenceF, system, true)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </ScrollRegion>
      </Card>
      <p className="text-sm text-ink-faint lg:col-span-2">
        The prediction compared is the last forecast check kept before the pickup, followed from the pickup itself. A
        planning aid, not a guarantee.
      </p>
    </div>
  );
}
