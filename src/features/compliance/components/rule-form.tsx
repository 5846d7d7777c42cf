import { parseOptions } from "@/lib/form-resolver";
import { GOVERNS_WORDS } from "@shared/words";
import { Controller, useForm, type FieldErrors, type Resolver } from "react-hook-form";
import { GOVERNS, type Rule } from "@shared/compliance/rule";
import { JURISDICTIONS, jurisdictionName } from "@shared/compliance/jurisdiction";
import { ruleVersionInputSchema, type RuleVersionInput } from "@shared/schemas/compliance";
import { Button } from "@/components/ui/button";
import { SelectField, TextAreaField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/feedback";
import { ApiError } from "@/lib/api-client";
import { useCreateRule, useSaveRuleVersion } from "../api/rules";
import { ConditionFields, EffectFields, Fieldset } from "./rule-form-fields";
import { fieldOf, ruleOf, valuesOf, type RuleFormValues } from "./rule-form-values";
import { TaxaPicker } from "./taxa-picker";

const today = () => new Date().toISOString().slice(0, 10);

/** Builds the version from the form and checks it with the shared schema, issue by issue. */
function resolverFor(version: number): Resolver<RuleFormValues, unknown, RuleVersionInput> {
  return async (values) => {
    const parsed = ruleVersionInputSchema.safeParse(ruleOf(values, version), parseOptions());
    if (parsed.success) return { values: parsed.data, errors: {} };
    const errors: FieldErrors<RuleFormValues> = {};
    for (const issue of parsed.error.issues)
      errors[fieldOf(issue.path)] ??= { type: issue.code, message: issue.message };
    return { values: {}, errors };
  };
}

/**
 * Writes a rule with fields, never JSON: where it applies and what it governs, the taxa from the
 * species catalogue, each condition and effect, the citation, the dates in force and the review.
 * With `base` null it creates a new rule (version 1); otherwise it saves the next version of it.
 */
export function RuleForm({
  base,
  reviewer,
  onDone,
}: {
  base: { rule: Rule; retired: boolean } | { blank: Rule };
  reviewer: string;
  onDone: () => void;
}) {
  const creating = "blank" in base;
  const rule = creating ? base.blank : base.rule;
  const version = creating ? 1 : rule.version + 1;
  const save = useSaveRuleVersion();
  const create = useCreateRule();
  const mutation = creating ? create : save;
  const form = useForm<RuleFormValues, unknown, RuleVersionInput>({
    resolver: resolverFor(version),
    defaultValues: valuesOf(rule, creating ? false : base.retired, reviewer, today()),
  });
  const { control, register, watch } = form;
  const errors = form.formState.errors;
  const submit = form.handleSubmit((input) => mutation.mutate(input, { onSuccess: onDone }));
  const parts = { control, register, watch, errors };
  return (
    <form
      className="grid gap-4 sm:grid-cols-2"
      onSubmit={submit}
      noValidate
      aria-label={creating ? "New rule" : "Edit rule"}
    >
      {mutation.error ? (
        <div className="sm:col-span-2">
          <Notice tone="block" role="alert">
            {mutation.error instanceof ApiError ? mutation.error.message : "Not saved."}
          </Notice>
        </div>
      ) : null}
      <Fieldset legend="Where and what">
        {creating ? (
          <TextField
            label="Reference"
            hint="Lower-case letters, digits, dots and dashes, e.g. or-oar635-056-prohibited. It never changes."
            error={errors.id?.message}
            {...register("id")}
          />
        ) : null}
        <SelectField
          label="Jurisdiction"
          options={JURISDICTIONS.map((j) => ({
            value: j,
            label: j === "US" ? "Federal (US)" : `${jurisdictionName(j)} (${j})`,
          }))}
          error={errors.jurisdiction?.message}
          {...register("jurisdiction")}
        />
        <SelectField
          label="Governs"
          options={GOVERNS.map((g) => ({ value: g, label: GOVERNS_WORDS[g] }))}
          error={errors.governs?.message}
          {...register("governs")}
        />
        <div className="sm:col-span-2">
          <TextAreaField
            label="What the rule says, in plain words"
            error={errors.summary?.message}
            {...register("summary")}
          />
        </div>
      </Fieldset>
      <Fieldset legend="Which animals">
        <label className="flex min-h-11 items-center gap-2 text-sm sm:col-span-2">
          <input type="checkbox" className="h-5 w-5" {...register("everyAnimal")} />
          Every animal (all wildlife, e.g. the Lacey Act)
        </label>
        {watch("everyAnimal") ? null : (
          <Controller
            control={control}
            name="taxa"
            render={({ field }) => (
              <TaxaPicker
                label="Taxa covered"
                hint="Any rank from the species list; descendants and older names are covered."
                value={field.value}
                onChange={field.onChange}
                error={errors.taxa?.message}
              />
            )}
          />
        )}
        <Controller
          control={control}
          name="exceptTaxa"
          render={({ field }) => (
            <TaxaPicker
              label="Except these taxa"
              value={field.value}
              onChange={field.onChange}
              error={errors.exceptTaxa?.message}
            />
          )}
        />
      </Fieldset>
      <ConditionFields {...parts} />
      <EffectFields {...parts} />
      <Fieldset legend="Source and review">
        <TextField
          label="Citation"
          error={errors.citationText?.message}
          hint={watch("demo") ? "A demo rule's citation must say it is not a statement of the state's law." : undefined}
          {...register("citationText")}
        />
        <TextField
          label="Link to the official text (https)"
          type="url"
          error={errors.citationUrl?.message}
          {...register("citationUrl")}
        />
        <TextField
          label="In force from"
          type="date"
          error={errors.effectiveFrom?.message}
          {...register("effectiveFrom")}
        />
        <TextField
          label="In force until (last day)"
          type="date"
          error={errors.effectiveTo?.message}
          {...register("effectiveTo")}
        />
        <TextField label="Reviewed on" type="date" error={errors.reviewedOn?.message} {...register("reviewedOn")} />
        <TextField label="Reviewed by" error={errors.reviewedBy?.message} {...register("reviewedBy")} />
      </Fieldset>
      {creating ? null : (
        <label className="flex min-h-11 items-center gap-2 text-sm sm:col-span-2">
          <input type="checkbox" className="h-5 w-5" {...register("retired")} />
          Retire this rule (kept in the history, no longer applied)
        </label>
      )}
      <div className="flex gap-2 sm:col-span-2">
        <Button type="submit" busy={mutation.isPending}>
          {creating ? "Add the rule" : `Save as version ${version}`}
        </Button>
        <Button type="button" variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
