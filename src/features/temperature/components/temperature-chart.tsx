import {
  CartesianGrid,
  Legend,
  Line,
  LineChart,
  ReferenceArea,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from "recharts";
import { formatAxisHour, formatInstant } from "@shared/dates";
import type { TemperatureReport } from "@shared/temperature/report";
import { tempUnit } from "@shared/units";
import { useUnitSystem } from "@/lib/units-preference";
import { chartRows, safeBand, type ChartRow } from "./chart-rows";

// The palette of tailwind.config.ts: slate for the weather, fern for the box, fern-light for the band.
const COLOURS = { outside: "#3d5566", inside: "#2f5d3a", band: "#6f9a76" };

/**
 * Outside and predicted inside temperature over the trip, with the profile's safe band shaded,
 * in the unit the person chose. The hour-by-hour table says the same in words, for screen readers and keyboards.
 */
export function TemperatureChart({ report }: { report: TemperatureReport }) {
  const [system] = useUnitSystem();
  const unit = tempUnit(system);
  const rows = chartRows(report.hours, system);
  const band = safeBand(report.profile.safeTransitF, system);
  if (rows.every((r) => r.outside === null)) return null;
  return (
    <figure className="flex flex-col gap-2">
      <div className="h-72 w-full" aria-hidden>
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={rows} margin={{ top: 8, right: 16, bottom: 8, left: 0 }} accessibilityLayer={false}>
            <CartesianGrid stroke="#e6dcc6" strokeDasharray="3 3" />
            <ReferenceArea
              y1={band.low}
              y2={band.high}
              fill={COLOURS.band}
              fillOpacity={0.18}
              ifOverflow="extendDomain"
            />
            <XAxis
              dataKey="atMs"
              type="number"
              scale="time"
              domain={["dataMin", "dataMax"]}
              tickFormatter={(ms: number) => formatAxisHour(ms)}
              minTickGap={24}
            />
            <YAxis unit={unit} width={64} domain={["auto", "auto"]} />
            <Tooltip
              labelFormatter={(ms) => formatInstant(Number(ms))}
              formatter={(value, name) => [
                `${String(value)} ${unit}`,
                name === "outside" ? "Outside" : "Inside the box",
              ]}
            />
            <Legend formatter={(name) => (name === "outside" ? "Outside (forecast)" : "Inside the box (model)")} />
            <Line
              type="monotone"
              dataKey="outside"
              stroke={COLOURS.outside}
              strokeWidth={2}
              dot={false}
              isAnimationActive={false}
            />
            <Line
              type="monotone"
              dataKey="inside"
              stroke={COLOURS.inside}
              strokeWidth={2}
              strokeDasharray="6 3"
              dot={false}
              isAnimationActive={false}
            />
          </LineChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="text-sm text-ink-soft">
        Shaded: the safe range in transit for {report.profile.label.toLowerCase()}, {band.low}–{band.high} {unit}.
      </figcaption>
      <HoursTable rows={rows} unit={unit} />
    </figure>
  );
}

function HoursTable({ rows, unit }: { rows: ChartRow[]; unit: string }) {
  return (
    <details className="text-sm">
      <summary className="inline-flex min-h-11 cursor-pointer items-center text-fern">Hour by hour</summary>
      <div className="max-h-72 overflow-auto">
        <table className="w-full text-left">
          <thead>
            <tr className="border-b border-rule text-ink-soft">
              <th scope="col" className="py-1 pr-3 font-semibold">
                Hour
              </th>
              <th scope="col" className="py-1 pr-3 font-semibold">
                Where
              </th>
              <th scope="col" className="py-1 pr-3 font-semibold">
                Outside ({unit})
              </th>
              <th scope="col" className="py-1 font-semibold">
                Inside ({unit})
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.atMs} className="border-b border-rule/60 last:border-0">
                <td className="py-1 pr-3">{formatInstant(r.atMs)}</td>
                <td className="py-1 pr-3">{r.place}</td>
                <td className="py-1 pr-3">{r.outside ?? "—"}</td>
                <td className="py-1">{r.inside ?? "—"}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </details>
  );
}
