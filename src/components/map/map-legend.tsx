import { AIR_BANDS, airBandBounds } from "@shared/temperature/air-band";
import { AIR_BAND_WORDS } from "@shared/words";
import { formatTemp, type UnitSystem } from "@shared/units";
import { AIR_BAND_MARKS, markPath } from "./map-marks";

function boundsText(fromF: number | null, toF: number | null, system: UnitSystem): string {
  if (fromF === null) return `below ${formatTemp(toF, system)}`;
  if (toF === null) return `above ${formatTemp(fromF, system)}`;
  return `${formatTemp(fromF, system)} to ${formatTemp(toF, system)}`;
}

/** The key to the hour marks: colour, shape and the temperatures each band covers, in the person's units. */
export function MapLegend({ safeF, system }: { safeF: { min: number; max: number }; system: UnitSystem }) {
  const bounds = airBandBounds(safeF);
  return (
    <div className="text-sm">
      <p className="font-semibold">Air around the box, each hour</p>
      <ul className="mt-1 grid gap-x-4 gap-y-1 sm:grid-cols-2">
        {AIR_BANDS.map((band) => (
          <li key={band} className="flex items-center gap-2">
            <svg viewBox="0 0 20 20" className="h-5 w-5 shrink-0" aria-hidden>
              <path d={markPath(band, 10, 10, 6)} fill={AIR_BAND_MARKS[band].fill} stroke="#1f2a30" strokeWidth={1} />
            </svg>
            <span>
              {AIR_BAND_WORDS[band]}
              {band === "unknown" ? "" : `: ${boundsText(bounds[band].fromF, bounds[band].toF, system)}`}
            </span>
          </li>
        ))}
      </ul>
    </div>
  );
}
