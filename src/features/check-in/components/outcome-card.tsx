import { CHECK_IN_OUTCOME_WORDS, SEX_WORDS } from "@shared/words";
import { CHECK_IN_OUTCOMES } from "@shared/constants";
import { CHECK_IN_OUTCOME_KEYS, type AnimalDto, type CheckInItemInput } from "@shared/schemas/transfer";
import { Button } from "@/components/ui/button";
import { CountStepper } from "@/components/ui/count-stepper";
import { Notice } from "@/components/ui/feedback";
import { TextAreaField, TextField } from "@/components/ui/field";
import { TaxonName } from "@/components/ui/taxon-name";
import { outcomeMismatch } from "./outcome-sum";

type Props = {
  animal: AnimalDto;
  boxLabel: string | null;
  value: CheckInItemInput;
  onChange: (value: CheckInItemInput) => void;
  errors?: { problem?: string; weightG?: string; notes?: string };
};

const weightText = (g: number | null | undefined) => (g == null || Number.isNaN(g) ? "" : String(g));

/** One manifest line at arrival: how many arrived well, hurt, dead or not at all, live-checked against its count. */
export function OutcomeCard({ animal: a, boxLabel, value, onChange, errors }: Props) {
  const mismatch = outcomeMismatch(a.count, value);
  const set = (patch: Partial<CheckInItemInput>) => onChange({ ...value, ...patch });
  const titleId = `outcome-${a.id}`;
  return (
    <article
      aria-labelledby={titleId}
      className={`grid gap-4 rounded-card border bg-paper-card p-4 shadow-card ${mismatch ? "border-amber-line" : "border-fern-ring"}`}
    >
      <header>
        <h3 id={titleId} className="text-lg font-semibold">
          {a.count} × <TaxonName taxon={a.taxon} />
        </h3>
        <p className="text-sm text-ink-soft">
          {[SEX_WORDS[a.sex], a.identifier ? `ID ${a.identifier}` : null, boxLabel ? `in ${boxLabel}` : "not in a box"]
            .filter(Boolean)
            .join(" · ")}
        </p>
      </header>
      <div className="grid gap-4 sm:grid-cols-2">
        {CHECK_IN_OUTCOMES.map((outcome) => {
          const field = CHECK_IN_OUTCOME_KEYS[outcome];
          return (
            <CountStepper
              key={outcome}
              label={CHECK_IN_OUTCOME_WORDS[outcome]}
              value={value[field]}
              max={a.count}
              onChange={(n) => set({ [field]: n })}
            />
          );
        })}
      </div>
      {mismatch ? (
        <Notice tone="caution" role="status">
          {mismatch}
        </Notice>
      ) : (
        <p role="status" className="text-sm font-semibold text-fern">
          All {a.count} accounted for.
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        <Button
          type="button"
          variant="secondary"
          onClick={() => set({ arrivedWell: a.count, arrivedProblem: 0, deadOnArrival: 0, missing: 0 })}
        >
          All {a.count} arrived well
        </Button>
      </div>
      {value.arrivedProblem > 0 ? (
        <TextAreaField
          label="What was wrong?"
          hint="e.g. shell damage, retained shed, weak, dehydrated"
          value={value.problem ?? ""}
          onChange={(e) => set({ problem: e.target.value })}
          error={errors?.problem}
        />
      ) : null}
      <div className="grid gap-3 sm:grid-cols-3">
        <TextField
          label="Weight on arrival (g, optional)"
          type="number"
          inputMode="decimal"
          min={0}
          step="any"
          value={weightText(value.weightG)}
          onChange={(e) => set({ weightG: e.target.value === "" ? null : Number(e.target.value) })}
          error={errors?.weightG}
        />
        <div className="sm:col-span-2">
          <TextField
            label="Notes (optional)"
            value={value.notes ?? ""}
            onChange={(e) => set({ notes: e.target.value })}
            error={errors?.notes}
          />
        </div>
      </div>
    </article>
  );
}
