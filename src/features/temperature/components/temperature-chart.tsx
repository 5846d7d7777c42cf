import {
  CartesianGrid,
  ComposedChart,
  Legend,
  Line,
  ReferenceArea,
  ResponsiveContainer,
  Scatter,
  Tooltip,
  XAxis,
  YAxis,
} from "recharts";
import { formatAxisHour, formatInstant } from "@shared/dates";
import type { BoxReadingDto, TemperatureReport } from "@shared/temperature/report";
import { tempUnit } from "@shared/units";
import { useUnitSystem } from "@/lib/units-preference";
import { bandSegments, chartRows, hourTicks, readingPoints, safeBand } from "./chart-rows";
import { ExposureBand } from "./exposure-band";
import { HoursTable } from "./hours-table";

// The palette of tailwind.config.ts: slate for the weather, amber for the air around the box,
// fern for the box, fern-light for the band, brick for what a person read.
const COLOURS = { outside: "#3d5566", around: "#84510c", inside: "#2f5d3a", band: "#6f9a76", reading: "#a23b2a" };
const SERIES_WORDS: Readonly<Record<string, string>> = {
  outside: "Outside (forecast)",
  around: "Around the box (model)",
  inside: "Inside the box (model)",
  reading: "Box reading",
};
// The plotting area starts after the y axis and ends before the right margin: the band aligns with it.
const Y_AXIS_WIDTH = 64;
const MARGIN = { top: 8, right: 16, bottom: 8, left: 0 };

/**
 * Outside air, the air around the box and the box's modelled inside over the trip, with the
 * profile's safe band shaded, the box readings as points and, under the time axis, a band that
 * shows where the box is; in the unit the person chose. The hour-by-hour table says the same in
 * words, for screen readers and keyboards.
 */
export function TemperatureChart({ report, readings = [] }: { report: TemperatureReport; readings?: BoxReadingDto[] }) {
  const [system] = useUnitSystem();
  const unit = tempUnit(system);
  const rows = chartRows(report.hours, system);
  const points = readingPoints(readings, system);
  const band = safeBand(report.profile.safeTransitF, system);
  if (rows.every((r) => r.outside === null)) return null;
  const axis = { fromMs: rows[0]!.atMs, toMs: rows.at(-1)!.atMs };
  const segments = bandSegments(report.exposures ?? [], axis);
  return (
    <figure className="flex flex-col gap-2">
      <div className="h-72 w-full" aria-hidden>
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart data={rows} margin={MARGIN} accessibilityLayer={false}>
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
              domain={[axis.fromMs, axis.toMs]}
              ticks={hourTicks(axis)}
              allowDataOverflow
              tickFormatter={(ms: number) => formatAxisHour(ms)}
              minTickGap={24}
            />
            <YAxis unit={unit} width={Y_AXIS_WIDTH} domain={["auto", "auto"]} />
            <Tooltip
              labelFormatter={(ms) => formatInstant(Number(ms))}
              formatter={(value, name) => [`${String(value)} ${unit}`, SERIES_WORDS[String(name)] ?? String(name)]}
            />
            <Legend formatter={(name) => SERIES_WORDS[String(name)] ?? String(name)} />
            <Line
              type="monotone"
              dataKey="outside"
              stroke={COLOURS.outside}
              strokeWidth={2}
              dot={false}
              isAnimationActive={false}
            />
            <Line
              type="linear"
              dataKey="around"
              stroke={COLOURS.around}
              strokeWidth={1.5}
              strokeDasharray="2 2"
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
            {points.length > 0 ? (
              <Scatter
                data={points}
                dataKey="reading"
                name="reading"
                fill={COLOURS.reading}
                isAnimationActive={false}
              />
            ) : null}
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <ExposureBand segments={segments} plotInset={{ left: Y_AXIS_WIDTH + MARGIN.left, right: MARGIN.right }} />
      <figcaption className="text-sm text-ink-soft">
        Shaded: the safe range in transit for {report.profile.label.toLowerCase()}, {band.low}–{band.high} {unit}. The
        band under the time axis shows where the box is; the air around it is the outside air passed through that place.
        {points.length > 0 ? " Dots: box temperatures read at handoffs and the check-in." : ""}
      </figcaption>
      <HoursTable rows={rows} unit={unit} />
    </figure>
  );
}
