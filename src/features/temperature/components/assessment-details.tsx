import { PACK_HANDLING_WORDS, PACK_WORDS, TEMPERATURE_VERDICT_WORDS } from "@shared/words";
import type { Verdict } from "@shared/temperature/advice";
import type { TemperatureReport } from "@shared/temperature/report";
import { Badge, Notice } from "@/components/ui/feedback";
import { formatInstant } from "@shared/dates";
import { formatTemp } from "@shared/units";
import { useUnitSystem } from "@/lib/units-preference";
import { ScrollRegion } from "@/components/ui/table";

type Tone = "ok" | "info" | "caution" | "block";
/** An unknown forecast wears the colour of a block: it is never a kind of "ship". */
export const VERDICT_TONE: Readonly<Record<Verdict, Tone>> = {
  ship: "ok",
  pack: "info",
  hold: "caution",
  do_not_ship: "block",
  forecast_unavailable: "block",
};

/** The verdict in a sentence, the packing to do, the temperatures, a safer day, the calendar and (for transfers) each box. */
export function AssessmentDetails({ report, showBoxes = false }: { report: TemperatureReport; showBoxes?: boolean }) {
  const [system] = useUnitSystem();
  const range = (r: { min: number; max: number } | null) =>
    r ? `${formatTemp(r.min, system)} to ${formatTemp(r.max, system)}` : "—";
  const searched = report.verdict === "hold" || report.verdict === "do_not_ship";
  return (
    <div className="flex flex-col gap-3">
      <Notice tone={VERDICT_TONE[report.verdict]} title={TEMPERATURE_VERDICT_WORDS[report.verdict]} role="status">
        {report.advice.message}
      </Notice>
      {report.vehicle?.note ? (
        <Notice tone="caution" title="How the vehicle is held was not given">
          {report.vehicle.note}
        </Notice>
      ) : null}
      {report.advice.pack ? (
        <div>
          <h3 className="font-semibold">Packing</h3>
          <p className="text-sm">
            <strong>{PACK_WORDS[report.advice.pack]}.</strong> {PACK_HANDLING_WORDS[report.advice.pack]}
          </p>
        </div>
      ) : null}
      <dl className="grid gap-x-6 gap-y-1 text-sm sm:grid-cols-[auto_1fr]">
        <dt className="text-ink-soft">Outside on the way</dt>
        <dd>{range(report.ambientF)}</dd>
        <dt className="text-ink-soft">Around the box, where it is (model)</dt>
        <dd>{range(aroundRange(report))}</dd>
        <dt className="text-ink-soft">Inside the box, as packed (model)</dt>
        <dd>{range(report.insideF)}</dd>
        <dt className="text-ink-soft">Safe in transit for {report.profile.label.toLowerCase()}</dt>
        <dd>{range(report.profile.safeTransitF)}</dd>
        <dt className="text-ink-soft">Hours outside the safe range, as packed</dt>
        <dd>{report.hoursOutsideRange ?? "—"}</dd>
      </dl>
      {report.suggestedDeparture ? (
        <Notice tone="info" title="A safer departure">
          Leaving {formatInstant(report.suggestedDeparture)} looks better for every box and avoids weekends and federal
          holidays in transit.
        </Notice>
      ) : searched ? (
        <p className="text-sm text-ink-soft">
          No safer departure in the coming week: the forecast does not improve enough.
        </p>
      ) : null}
      {report.warnings.map((w) => (
        <Notice key={`${w.code}-${w.date}`} tone={w.severity === "warning" ? "caution" : "info"}>
          {w.message}
        </Notice>
      ))}
      {showBoxes && report.boxes.length > 0 ? <BoxVerdicts report={report} /> : null}
      <details className="text-sm">
        <summary className="inline-flex min-h-11 cursor-pointer items-center text-fern">
          Where the numbers come from
        </summary>
        <ul className="list-disc space-y-1 pl-5 text-ink-soft">
          {report.sources.map((s) => (
            <li key={s.id}>{s.title}</li>
          ))}
        </ul>
      </details>
    </div>
  );
}

/** The warmest and coldest air around the box over the trip's hours, °F; null without weather. */
function aroundRange(report: TemperatureReport): { min: number; max: number } | null {
  const values = report.hours.flatMap((h) =>
    h.aroundBoxF === null || h.aroundBoxF === undefined ? [] : [h.aroundBoxF],
  );
  return values.length ? { min: Math.min(...values), max: Math.max(...values) } : null;
}

/** Each box's own verdict; the transfer's is the worst of them. */
function BoxVerdicts({ report }: { report: TemperatureReport }) {
  const [system] = useUnitSystem();
  return (
    <ScrollRegion label="Box by box">
      <table className="w-full text-left text-sm">
        <caption className="mb-1 text-left font-semibold">Box by box</caption>
        <thead>
          <tr className="border-b border-rule text-ink-soft">
            <th scope="col" className="py-1 pr-3 font-semibold">
              Box
            </th>
            <th scope="col" className="py-1 pr-3 font-semibold">
              Profile
            </th>
            <th scope="col" className="py-1 pr-3 font-semibold">
              Verdict
            </th>
            <th scope="col" className="py-1 pr-3 font-semibold">
              Inside (model)
            </th>
            <th scope="col" className="py-1 font-semibold">
              Advice
            </th>
          </tr>
        </thead>
        <tbody>
          {report.boxes.map((b) => (
            <tr key={b.containerId ?? b.label} className="border-b border-rule/60 align-top last:border-0">
              <td className="py-1 pr-3">{b.label}</td>
              <td className="py-1 pr-3">{b.profile.label}</td>
              <td className="py-1 pr-3">
                <Badge tone={VERDICT_TONE[b.verdict]}>{TEMPERATURE_VERDICT_WORDS[b.verdict]}</Badge>
              </td>
              <td className="py-1 pr-3">
                {b.insideF ? `${formatTemp(b.insideF.min, system)} to ${formatTemp(b.insideF.max, system)}` : "—"}
              </td>
              <td className="py-1">{b.advice.message}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </ScrollRegion>
  );
}
