import { EXPOSURE_WORDS } from "@shared/words";
import type { Exposure } from "@shared/constants";
import { formatTimeSpan } from "@shared/dates";
import type { BandSegment } from "./chart-rows";

/** One colour per place the box can be, from the palette; the words beside them carry the meaning. */
export const EXPOSURE_COLOURS: Readonly<Record<Exposure, string>> = {
  outdoors: "#d9a441",
  vehicle_climate_controlled: "#6f9a76",
  vehicle_unconditioned: "#9aa9b3",
  parked_sun: "#a23b2a",
  parked_shade: "#dba69b",
  carrier_building: "#3d5566",
  indoors: "#b7cdb9",
};

/**
 * The band under the chart's time axis: where the box is, stretch by stretch, aligned with the
 * plotting area (the y axis's width on the left, the chart's margin on the right), then a key.
 */
export function ExposureBand({
  segments,
  plotInset,
}: {
  segments: BandSegment[];
  plotInset: { left: number; right: number };
}) {
  if (segments.length === 0) return null;
  const shown = [...new Set(segments.map((s) => s.exposure))];
  return (
    <div className="flex flex-col gap-2">
      <div style={{ paddingLeft: plotInset.left, paddingRight: plotInset.right }}>
        <div className="relative h-5 overflow-hidden rounded-sm border border-rule bg-paper-deep" aria-hidden>
          {segments.map((s) => (
            <div
              key={`${s.from}-${s.exposure}`}
              className="absolute inset-y-0"
              title={`${EXPOSURE_WORDS[s.exposure]}: ${formatTimeSpan(s.from, s.to)}, ${s.place}`}
              style={{
                left: `${s.fromShare * 100}%`,
                width: `max(2px, ${(s.toShare - s.fromShare) * 100}%)`,
                backgroundColor: EXPOSURE_COLOURS[s.exposure],
              }}
            />
          ))}
        </div>
      </div>
      <ul className="flex flex-wrap gap-x-4 gap-y-1 text-xs text-ink-soft" aria-label="Where the box is, by colour">
        {shown.map((exposure) => (
          <li key={exposure} className="inline-flex items-center gap-1.5">
            <span
              className="inline-block h-3 w-3 rounded-sm border border-rule"
              style={{ backgroundColor: EXPOSURE_COLOURS[exposure] }}
              aria-hidden
            />
            {EXPOSURE_WORDS[exposure]}
          </li>
        ))}
      </ul>
    </div>
  );
}
