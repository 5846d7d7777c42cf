import type { ReactNode } from "react";
import { Controller, type Control, type FieldErrors, type UseFormRegister, type UseFormWatch } from "react-hook-form";
import {
  ANIMAL_ORIGINS,
  DOCUMENT_KINDS,
  PURPOSES,
  SEXES,
  type AnimalOrigin,
  type Purpose,
  type Sex,
} from "@shared/constants";
import { ANIMAL_ORIGIN_WORDS, DOCUMENT_KIND_WORDS, PURPOSE_WORDS, RULE_EFFECT_WORDS, SEX_WORDS } from "@shared/words";
import { ruleEffectSchema } from "@shared/compliance/rule";
import { MeasureField } from "@/components/ui/measure-field";
import { SelectField, TextField } from "@/components/ui/field";
import { LinesField } from "./lines-field";
import type { Either, RuleFormValues } from "./rule-form-values";

type FormParts = {
  // The form's output type differs from its fields (the resolver builds the rule); the fields need only these.
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  control: Control<RuleFormValues, any, any>;
  register: UseFormRegister<RuleFormValues>;
  watch: UseFormWatch<RuleFormValues>;
  errors: FieldErrors<RuleFormValues>;
};

export function Fieldset({ legend, children }: { legend: string; children: ReactNode }) {
  return (
    <fieldset className="grid gap-4 rounded-card border border-rule p-4 sm:col-span-2 sm:grid-cols-2">
      <legend className="px-1 font-semibold">{legend}</legend>
      {children}
    </fieldset>
  );
}

/** Tick boxes for a list of codes, each with its words; none ticked leaves the condition out. */
function CheckboxGroup<T extends string>({
  legend,
  hint,
  codes,
  words,
  value,
  onChange,
  error,
}: {
  legend: string;
  hint: string;
  codes: readonly T[];
  words: Readonly<Record<T, string>>;
  value: readonly T[];
  onChange: (next: T[]) => void;
  error?: string;
}) {
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="text-sm font-semibold">{legend}</legend>
      <p className="text-sm text-ink-soft">{hint}</p>
      {codes.map((code) => (
        <label key={code} className="flex min-h-11 items-center gap-2 text-sm">
          <input
            type="checkbox"
            className="h-5 w-5"
            checked={value.includes(code)}
            onChange={(e) => onChange(e.target.checked ? [...value, code] : value.filter((c) => c !== code))}
          />
          {words[code]}
        </label>
      ))}
      {error ? (
        <p role="alert" className="text-sm font-medium text-brick">
          {error}
        </p>
      ) : null}
    </fieldset>
  );
}

const either = (yes: string, no: string): { value: Either; label: string }[] => [
  { value: "either", label: "Either (no condition)" },
  { value: "yes", label: yes },
  { value: "no", label: no },
];

/** Every condition of the rule as its own field, lengths in the unit the person chose. */
export function ConditionFields({ control, register, errors }: FormParts) {
  const group = (name: "origins" | "purposes" | "exceptPurposes" | "sexes", legend: string, hint: string) => (
    <Controller
      control={control}
      name={name}
      render={({ field }) => {
        const props = { legend, hint, error: errors[name]?.message, onChange: field.onChange };
        if (name === "origins")
          return (
            <CheckboxGroup
              {...props}
              codes={ANIMAL_ORIGINS}
              words={ANIMAL_ORIGIN_WORDS}
              value={field.value as AnimalOrigin[]}
            />
          );
        if (name === "sexes")
          return <CheckboxGroup {...props} codes={SEXES} words={SEX_WORDS} value={field.value as Sex[]} />;
        return <CheckboxGroup {...props} codes={PURPOSES} words={PURPOSE_WORDS} value={field.value as Purpose[]} />;
      }}
    />
  );
  return (
    <Fieldset legend="When it applies (every condition given must hold)">
      {group("origins", "Origin of the animal", "Only animals of these origins; none ticked: any origin.")}
      {group("sexes", "Sex", "Only these sexes; an animal of unknown sex is taken to be caught.")}
      {group("purposes", "Purpose of the transfer", "Only for these purposes; none ticked: any purpose.")}
      {group("exceptPurposes", "Purposes the rule exempts", "E.g. bona fide scientific or educational use.")}
      <SelectField
        label="Sale"
        options={either("Only a sale or commercial distribution", "Only a move that is no sale")}
        {...register("sale")}
      />
      <SelectField
        label="Venomous"
        options={either("Only venomous animals", "Only animals that are not venomous")}
        {...register("venomous")}
      />
      <SelectField
        label="Route"
        options={either(
          "Only a move to or from Hawaii, DC, Puerto Rico or a territory",
          "Only a move within the continental US",
        )}
        {...register("leavesContinental")}
      />
      <TextField
        label="Applies above this many animals in a line"
        inputMode="numeric"
        hint="Leave empty for any number."
        error={errors.countAbove?.message}
        {...register("countAbove")}
      />
      <Controller
        control={control}
        name="lengthBelowMm"
        render={({ field }) => (
          <MeasureField
            kind="length"
            label="Applies below this length"
            hint="Carapace length for turtles, total length otherwise; empty: any length."
            value={field.value}
            onChange={field.onChange}
            error={errors.lengthBelowMm?.message}
          />
        )}
      />
      <Controller
        control={control}
        name="lengthAboveMm"
        render={({ field }) => (
          <MeasureField
            kind="length"
            label="Applies above this length"
            value={field.value}
            onChange={field.onChange}
            error={errors.lengthAboveMm?.message}
          />
        )}
      />
    </Fieldset>
  );
}

const EFFECT_KINDS = ruleEffectSchema.options.map((option) => option.shape.kind.value);
const PERMIT_KINDS = DOCUMENT_KINDS.filter((kind) => kind !== "cvi");

/** What the rule does, with the fields of the permit or certificate it asks for. */
export function EffectFields({ control, register, watch, errors }: FormParts) {
  const kind = watch("effectKind");
  const asksPermit = kind === "permit_required" || (kind === "prohibited" && watch("liftedByPermit"));
  return (
    <Fieldset legend="What it does">
      <SelectField
        label="Effect"
        options={EFFECT_KINDS.map((k) => ({ value: k, label: RULE_EFFECT_WORDS[k] }))}
        error={errors.effectKind?.message}
        {...register("effectKind")}
      />
      {kind === "prohibited" ? (
        <label className="flex min-h-11 items-center gap-2 text-sm">
          <input type="checkbox" className="h-5 w-5" {...register("liftedByPermit")} />A permit lifts the ban
        </label>
      ) : null}
      {asksPermit ? (
        <>
          <Controller
            control={control}
            name="permitKinds"
            render={({ field }) => (
              <CheckboxGroup
                legend="Permits that satisfy it"
                hint="Any one of these, issued by the rule's jurisdiction."
                codes={PERMIT_KINDS}
                words={DOCUMENT_KIND_WORDS}
                value={field.value}
                onChange={field.onChange}
                error={errors.permitKinds?.message}
              />
            )}
          />
          <div className="flex flex-col gap-3">
            <SelectField
              label="Held by"
              options={[
                { value: "receiver", label: "The receiver" },
                { value: "sender", label: "The sender" },
                { value: "either", label: "Either party" },
              ]}
              {...register("permitHolder")}
            />
            <label className="flex min-h-11 items-center gap-2 text-sm">
              <input type="checkbox" className="h-5 w-5" {...register("permitNamesSpecies")} />
              The permit must name the species
            </label>
          </div>
        </>
      ) : null}
      {kind === "certificate_required" ? (
        <>
          <TextField
            label="Issued at most this many days before the ship date"
            inputMode="numeric"
            error={errors.withinDays?.message}
            {...register("withinDays")}
          />
          <div className="flex flex-col gap-1">
            <label className="flex min-h-11 items-center gap-2 text-sm">
              <input type="checkbox" className="h-5 w-5" {...register("accreditedVeterinarian")} />
              Signed by an accredited veterinarian
            </label>
            <label className="flex min-h-11 items-center gap-2 text-sm">
              <input type="checkbox" className="h-5 w-5" {...register("certificateNamesSpecies")} />
              The certificate must name the species
            </label>
          </div>
          <div className="sm:col-span-2">
            <Controller
              control={control}
              name="statements"
              render={({ field }) => (
                <LinesField
                  label="Statements the certificate must carry, one per line"
                  value={field.value}
                  onChange={field.onChange}
                  error={errors.statements?.message}
                />
              )}
            />
          </div>
        </>
      ) : null}
    </Fieldset>
  );
}
