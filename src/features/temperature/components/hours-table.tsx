import { EXPOSURE_WORDS } from "@shared/words";
import { formatInstant } from "@shared/dates";
import type { ChartRow } from "./chart-rows";

/** The chart in words, hour by hour, for screen readers and keyboards. */
export function HoursTable({ rows, unit }: { rows: ChartRow[]; unit: string }) {
  return (
    <details className="text-sm">
      <summary className="inline-flex min-h-11 cursor-pointer items-center text-fern">Hour by hour</summary>
      <div className="max-h-72 overflow-auto">
        <table className="w-full text-left">
          <thead>
            <tr className="border-b border-rule text-ink-soft">
              {[
                "Hour",
                "Where",
                "Where the box is",
                `Outside (${unit})`,
                `Around the box (${unit})`,
                `Inside (${unit})`,
              ].map((heading) => (
                <th key={heading} scope="col" className="py-1 pr-3 font-semibold">
                  {heading}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => (
              <tr key={r.atMs} className="border-b border-rule/60 last:border-0">
                <td className="py-1 pr-3">{formatInstant(r.atMs)}</td>
                <td className="py-1 pr-3">{r.place}</td>
                <td className="py-1 pr-3">{EXPOSURE_WORDS[r.exposure]}</td>
                <td className="py-1 pr-3">{r.outside ?? "—"}</td>
                <td className="py-1 pr-3">{r.around ?? "—"}</td>
                <td className="py-1">{r.inside ?? "—"}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </details>
  );
}
