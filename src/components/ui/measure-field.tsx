import { forwardRef, useId, useState } from "react";
import {
  lengthInputText,
  lengthUnit,
  parseLengthMm,
  parseTempF,
  tempInputText,
  tempUnit,
  type UnitSystem,
} from "@shared/units";
import { useUnitSystem } from "@/lib/units-preference";

type Kind = "length" | "temperature";

const codec: Record<
  Kind,
  {
    unit: (s: UnitSystem) => string;
    text: (v: number | null | undefined, s: UnitSystem) => string;
    parse: (t: string, s: UnitSystem) => number | null;
  }
> = {
  length: { unit: lengthUnit, text: lengthInputText, parse: parseLengthMm },
  temperature: { unit: tempUnit, text: tempInputText, parse: parseTempF },
};

type Props = {
  kind: Kind;
  label: string;
  /** The stored value: mm for a length, °F for a temperature. */
  value: number | null | undefined;
  /** Called with the stored unit's value; null when emptied, NaN when not a number. */
  onChange: (value: number | null) => void;
  onBlur?: () => void;
  name?: string;
  error?: string;
  hint?: string;
  className?: string;
};

/**
 * A measurement typed in the unit the user chose (inches or mm, °F or °C) and kept in the
 * stored unit. Switching units re-shows the same stored value; it never rewrites it.
 */
export const MeasureField = forwardRef<HTMLInputElement, Props>(function MeasureField(
  { kind, label, value, onChange, onBlur, name, error, hint, className = "" },
  ref,
) {
  const [system] = useUnitSystem();
  const { unit, text: toText, parse } = codec[kind];
  const [text, setText] = useState(() => toText(value, system));
  const [seen, setSeen] = useState({ value, system });
  // A unit switch, or a new value from outside (a reset, a duplicated line), re-renders the
  // text; the echo of what was just typed does not, so "4." stays "4." while typing.
  if (!Object.is(seen.value, value) || seen.system !== system) {
    setSeen({ value, system });
    if (seen.system !== system || !Object.is(parse(text, system), value)) setText(toText(value, system));
  }
  const id = useId();
  const described = error ? `${id}-error` : hint ? `${id}-hint` : undefined;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="text-sm font-semibold text-ink">
        {label} ({unit(system)})
      </label>
      <input
        ref={ref}
        id={id}
        name={name}
        type="text"
        inputMode="decimal"
        autoComplete="off"
        value={text}
        aria-invalid={error ? true : undefined}
        aria-describedby={described}
        onBlur={onBlur}
        onChange={(e) => {
          const parsed = parse(e.target.value, system);
          setText(e.target.value);
          onChange(parsed);
        }}
        className={`min-h-11 w-full rounded-md border bg-paper-card px-3 py-2 text-base text-ink focus:border-fern focus-visible:outline-hidden focus-visible:ring-3 focus-visible:ring-fern-ring ${error ? "border-brick" : "border-rule"}`}
      />
      {hint && !error ? (
        <p id={`${id}-hint`} className="text-sm text-ink-soft">
          {hint}
        </p>
      ) : null}
      {error ? (
        <p id={`${id}-error`} role="alert" className="text-sm font-medium text-brick">
          {error}
        </p>
      ) : null}
    </div>
  );
});
