import { airBand } from "@shared/temperature/air-band";
import { formatInstant } from "@shared/dates";
import { AIR_BAND_WORDS } from "@shared/words";
import { formatTemp, type UnitSystem } from "@shared/units";
import type { RouteMapProps } from "./map-types";
import { ScrollRegion } from "@/components/ui/table";

const th = "py-1 pr-3 font-semibold";
const td = "py-1 pr-3 align-top";

/** The map's facts as tables: the stops in order, then where the box is each hour and the air around it. */
export function RouteMapTables({
  title,
  stops,
  hours = [],
  safeF,
  system,
}: Pick<RouteMapProps, "title" | "stops" | "hours" | "safeF"> & { system: UnitSystem }) {
  return (
    <div className="flex flex-col gap-4 text-sm">
      <ScrollRegion label="Stops">
        <table className="w-full text-left">
          <caption className="mb-1 text-left font-semibold">Stops of {title}</caption>
          <thead>
            <tr className="border-b border-rule text-ink-soft">
              <th scope="col" className={th}>
                No.
              </th>
              <th scope="col" className={th}>
                Stop
              </th>
              <th scope="col" className={th}>
                Place
              </th>
              <th scope="col" className={th}>
                When
              </th>
            </tr>
          </thead>
          <tbody>
            {stops.map((stop, i) => (
              <tr key={`${i}-${stop.when}`} className="border-b border-rule/60 last:border-0">
                <td className={td}>{i + 1}</td>
                <td className={td}>{stop.name}</td>
                <td className={td}>{stop.place}</td>
                <td className={td}>{stop.when}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollRegion>
      {hours.length > 0 ? (
        // A scrolling region a keyboard can reach (WCAG 2.1.1): it takes focus and is named.
        <div className="max-h-80 overflow-auto" tabIndex={0} role="region" aria-label="Hour by hour, scrolls">
          <table className="w-full text-left">
            <caption className="mb-1 text-left font-semibold">Where the box is, hour by hour</caption>
            <thead>
              <tr className="border-b border-rule text-ink-soft">
                {["Hour", "Place", "Where the box is", "Air around the box", "Against the safe range"].map(
                  (heading) => (
                    <th key={heading} scope="col" className={th}>
                      {heading}
                    </th>
                  ),
                )}
              </tr>
            </thead>
            <tbody>
              {hours.map((hour) => (
                <tr key={hour.atMs} className="border-b border-rule/60 last:border-0">
                  <td className={td}>{formatInstant(hour.atMs)}</td>
                  <td className={td}>{hour.place}</td>
                  <td className={td}>{hour.exposure}</td>
                  <td className={td}>{formatTemp(hour.aroundF, system)}</td>
                  <td className={td}>{safeF ? AIR_BAND_WORDS[airBand(hour.aroundF, safeF)] : "—"}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}
    </div>
  );
}
