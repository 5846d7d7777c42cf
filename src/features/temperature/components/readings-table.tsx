import { formatInstant } from "@shared/dates";
import type { BoxReadingDto } from "@shared/temperature/report";
import { formatTemp, tempUnit } from "@shared/units";
import { useUnitSystem } from "@/lib/units-preference";
import { ScrollRegion } from "@/components/ui/table";

/** A difference of temperatures in the chosen unit, signed: "+4.2 °F", "−2.3 °C". */
function differenceText(differenceF: number, system: "imperial" | "metric"): string {
  const value = system === "imperial" ? differenceF : differenceF / 1.8;
  const sign = value > 0 ? "+" : value < 0 ? "−" : "±";
  return `${sign}${Math.abs(value).toFixed(1)} ${tempUnit(system)}`;
}

/**
 * The box temperatures read on the way beside the model's inside temperature for the same moment.
 * The verdict is never adjusted by a reading; the difference is shown for people to judge.
 */
export function ReadingsTable({ readings }: { readings: BoxReadingDto[] }) {
  const [system] = useUnitSystem();
  if (readings.length === 0) return null;
  return (
    <div className="flex flex-col gap-1 text-sm">
      <ScrollRegion label="Box temperatures read on the way">
        <table className="w-full text-left">
          <caption className="mb-1 text-left font-semibold">
            Box temperatures read on the way, against the model
          </caption>
          <thead>
            <tr className="border-b border-rule text-ink-soft">
              {["When", "Where", "The box read", "The model said", "Difference"].map((heading) => (
                <th key={heading} scope="col" className="py-1 pr-3 font-semibold">
                  {heading}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {readings.map((r) => (
              <tr key={`${r.at}-${r.source}`} className="border-b border-rule/60 align-top last:border-0">
                <td className="py-1 pr-3">{formatInstant(r.at)}</td>
                <td className="py-1 pr-3">{r.place}</td>
                <td className={`py-1 pr-3 ${r.outsideSafeRange ? "font-semibold text-brick" : ""}`}>
                  {formatTemp(r.tempF, system)}
                  {r.outsideSafeRange ? " — outside the safe range" : ""}
                </td>
                <td className="py-1 pr-3">{r.modelF === null ? "no model then" : formatTemp(r.modelF, system)}</td>
                <td className="py-1">{r.differenceF === null ? "—" : differenceText(r.differenceF, system)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </ScrollRegion>
      <p className="text-ink-faint">
        A reading outside the safe range raises an alert and e-mails both parties and the couriers. Readings never
        change the verdict: where the model and the box disagree, judge for yourselves.
      </p>
    </div>
  );
}
