import { SEX_WORDS } from "@shared/words";
import type { CheckInDto } from "@shared/schemas/transfer";
import { Badge } from "@/components/ui/feedback";
import { ScrollRegion } from "@/components/ui/table";

const columns = [
  ["expected", "Listed"],
  ["arrivedWell", "Well"],
  ["arrivedProblem", "With a problem"],
  ["deadOnArrival", "Dead"],
  ["missing", "Missing"],
  ["extra", "Not listed"],
] as const;

/** What arrived against the manifest, by species and sex, as the server computed it. */
export function DiscrepancyTable({ checkIn }: { checkIn: CheckInDto }) {
  return (
    <div className="grid gap-3">
      <p>
        {checkIn.allAccountedFor ? (
          <Badge tone="ok">Everything arrived well, as listed</Badge>
        ) : (
          <Badge tone="caution">What arrived differs from the manifest</Badge>
        )}
      </p>
      <ScrollRegion
        label="Arrivals compared with the manifest"
        className="rounded-card border border-rule bg-paper-card shadow-card"
      >
        <table className="w-full border-collapse text-left text-sm">
          <caption className="sr-only">Arrivals compared with the manifest</caption>
          <thead className="bg-paper-deep text-xs uppercase tracking-wide text-ink-soft">
            <tr>
              <th scope="col" className="px-3 py-2.5">
                Species
              </th>
              <th scope="col" className="px-3 py-2.5">
                Sex
              </th>
              {columns.map(([key, label]) => (
                <th key={key} scope="col" className="px-3 py-2.5 text-right">
                  {label}
                </th>
              ))}
            </tr>
          </thead>
          <tbody className="divide-y divide-rule">
            {checkIn.discrepancies.map((r) => {
              const off = r.arrivedWell !== r.expected || r.extra > 0;
              return (
                <tr key={`${r.taxonId}-${r.sex}`} className={off ? "bg-amber-bg/60" : undefined}>
                  <th scope="row" className="px-3 py-2.5 text-left font-normal">
                    <i>{r.scientificName}</i>
                  </th>
                  <td className="px-3 py-2.5">{SEX_WORDS[r.sex]}</td>
                  {columns.map(([key]) => (
                    <td
                      key={key}
                      className={`px-3 py-2.5 text-right tabular-nums ${key !== "expected" && key !== "arrivedWell" && r[key] > 0 ? "font-bold text-brick" : ""}`}
                    >
                      {r[key]}
                    </td>
                  ))}
                </tr>
              );
            })}
          </tbody>
        </table>
      </ScrollRegion>
    </div>
  );
}
