import { PARKED_WORDS } from "@shared/words";
import { PARKED_KINDS, type ParkedKind } from "@shared/constants";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { instantToLocalInput, localInputToInstant } from "@/lib/datetime";

/** A planned stop as the form holds it: the browser's wall clock, minutes as typed. */
export type StopRow = { key: string; atLocal: string; durationMin: string; parked: ParkedKind };

let nextKey = 0;
const newKey = () => `stop-${++nextKey}`;

/** Form rows from stored stops. */
export function stopRowsOf(stops: readonly { at: string; durationMin: number; parked: ParkedKind }[]): StopRow[] {
  return stops.map((s) => ({
    key: newKey(),
    atLocal: instantToLocalInput(s.at),
    durationMin: String(s.durationMin),
    parked: s.parked,
  }));
}

/** The rows as the API takes them; what cannot be read is left for the schema to name. */
export function stopsOf(rows: readonly StopRow[]) {
  return rows.map((r) => ({
    at: localInputToInstant(r.atLocal),
    durationMin: r.durationMin.trim() === "" ? Number.NaN : Number(r.durationMin),
    parked: r.parked,
  }));
}

/**
 * The driver's planned stops: when, for how long, and where the vehicle waits. A parked car warms
 * fast in the sun; the model shows it, and animals are never left in one.
 */
export function StopsEditor({
  rows,
  onChange,
  errorFor,
  startAt,
}: {
  rows: StopRow[];
  onChange: (rows: StopRow[]) => void;
  /** The message for a field path such as "stops.0.at". */
  errorFor: (path: string) => string | undefined;
  /** A new stop starts here (the browser's wall clock), an hour later than the last. */
  startAt: string;
}) {
  const update = (index: number, patch: Partial<StopRow>) =>
    onChange(rows.map((row, i) => (i === index ? { ...row, ...patch } : row)));
  const add = () => {
    const last = rows.at(-1)?.atLocal ?? startAt;
    const base = localInputToInstant(last);
    const at = base ? instantToLocalInput(new Date(Date.parse(base) + 3_600_000).toISOString()) : startAt;
    onChange([...rows, { key: newKey(), atLocal: at, durationMin: "30", parked: "shade" }]);
  };
  return (
    <fieldset className="grid gap-3">
      <legend className="text-sm font-semibold">Planned stops</legend>
      {rows.length === 0 ? (
        <p className="text-sm text-ink-soft">No stops planned: the model adds its own breaks.</p>
      ) : null}
      {rows.map((row, i) => (
        <div key={row.key} className="grid grid-cols-2 gap-3 rounded-md border border-rule p-3">
          <div className="col-span-2">
            <TextField
              label={`Stop ${i + 1}: from`}
              type="datetime-local"
              value={row.atLocal}
              onChange={(e) => update(i, { atLocal: e.target.value })}
              error={errorFor(`stops.${i}.at`)}
            />
          </div>
          <TextField
            label="Minutes"
            inputMode="numeric"
            value={row.durationMin}
            onChange={(e) => update(i, { durationMin: e.target.value })}
            error={errorFor(`stops.${i}.durationMin`)}
          />
          <SelectField
            label="The vehicle waits"
            options={PARKED_KINDS.map((p) => ({ value: p, label: PARKED_WORDS[p] }))}
            value={row.parked}
            onChange={(e) => update(i, { parked: e.target.value as ParkedKind })}
            error={errorFor(`stops.${i}.parked`)}
          />
          <div className="col-span-2">
            <Button type="button" variant="ghost" onClick={() => onChange(rows.filter((_, j) => j !== i))}>
              Remove stop {i + 1}
            </Button>
          </div>
        </div>
      ))}
      <div>
        <Button type="button" variant="secondary" onClick={add}>
          Add a stop
        </Button>
      </div>
    </fieldset>
  );
}
