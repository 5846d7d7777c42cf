import type { UnitSystem } from "@shared/units";
import { useUnitSystem } from "@/lib/units-preference";

const choices: { value: UnitSystem; label: string; spoken: string }[] = [
  { value: "imperial", label: "°F · in", spoken: "Degrees Fahrenheit and inches" },
  { value: "metric", label: "°C · mm", spoken: "Degrees Celsius and millimetres" },
];

/** One tap between °F and inches and °C and mm; stored values never change, only the display. */
export function UnitsSwitch() {
  const [system, setSystem] = useUnitSystem();
  return (
    <div role="group" aria-label="Units" className="inline-flex rounded-md border border-rule bg-paper-card p-0.5">
      {choices.map((choice) => (
        <button
          key={choice.value}
          type="button"
          aria-pressed={system === choice.value}
          aria-label={choice.spoken}
          onClick={() => setSystem(choice.value)}
          className={`min-h-11 min-w-16 whitespace-nowrap rounded px-2 text-sm font-semibold ${system === choice.value ? "bg-fern text-paper-card" : "text-ink-soft hover:bg-paper-deep"}`}
        >
          {choice.label}
        </button>
      ))}
    </div>
  );
}
