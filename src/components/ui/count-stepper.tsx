import { useId } from "react";

type Props = {
  label: string;
  value: number;
  onChange: (value: number) => void;
  min?: number;
  max?: number;
  /** Shown under the control, e.g. "Expected: 3". */
  hint?: string;
  id?: string;
};

/** A whole-number stepper with 48 px buttons: easy with a thumb or in gloves. */
export function CountStepper({ label, value, onChange, min = 0, max = 10_000, hint, id }: Props) {
  const auto = useId();
  const fieldId = id ?? auto;
  const clamp = (n: number) => Math.min(max, Math.max(min, n));
  const button =
    "flex h-12 w-12 shrink-0 items-center justify-center rounded-md border border-rule bg-paper-card text-2xl font-bold text-fern hover:bg-fern-light disabled:opacity-40";
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={fieldId} className="text-sm font-semibold text-ink">
        {label}
      </label>
      <div className="flex items-center gap-2">
        <button
          type="button"
          className={button}
          aria-label={`One fewer: ${label}`}
          onClick={() => onChange(clamp(value - 1))}
          disabled={value <= min}
        >
          −
        </button>
        <input
          id={fieldId}
          type="number"
          inputMode="numeric"
          min={min}
          max={max}
          step={1}
          value={value}
          aria-describedby={hint ? `${fieldId}-hint` : undefined}
          onChange={(e) => {
            const n = Number.parseInt(e.target.value, 10);
            onChange(Number.isNaN(n) ? min : clamp(n));
          }}
          className="h-12 w-20 rounded-md border border-rule bg-paper-card px-2 text-center text-xl font-semibold text-ink focus:border-fern focus-visible:outline-hidden focus-visible:ring-3 focus-visible:ring-fern-ring"
        />
        <button
          type="button"
          className={button}
          aria-label={`One more: ${label}`}
          onClick={() => onChange(clamp(value + 1))}
          disabled={value >= max}
        >
          +
        </button>
      </div>
      {hint ? (
        <p id={`${fieldId}-hint`} className="text-sm text-ink-soft">
          {hint}
        </p>
      ) : null}
    </div>
  );
}
