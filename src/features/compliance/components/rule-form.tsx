import { parseOptions } from "@/lib/form-resolver";
import { GOVERNS_WORDS } from "@shared/words";
import { Controller, useForm, type FieldErrors, type Resolver } from "react-hook-form";
import { GOVERNS, type Rule } from "@shared/compliance/rule";
import { JURISDICTIONS, jurisdictionName } from "@shared/compliance/jurisdiction";
import { ruleVersionInputSchema, type RuleVersionDto, type RuleVersionInput } from "@shared/schemas/compliance";
import { Button } from "@/components/ui/button";
import { SelectField, TextAreaField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/feedback";
import { ApiError } from "@/lib/api-client";
import { useSaveRuleVersion } from "../api/rules";
import { LinesField } from "./lines-field";

type Values = {
  jurisdiction: Rule["jurisdiction"];
  governs: Rule["governs"];
  summary: string;
  citationText: string;
  citationUrl: string;
  effectiveFrom: string;
  effectiveTo: string;
  reviewedOn: string;
  reviewedBy: string;
  taxa: string[];
  exceptTaxa: string[];
  conditionsJson: string;
  effectJson: string;
  retired: boolean;
};

function valuesOf(rule: Rule, retired: boolean, reviewer: string): Values {
  return {
    jurisdiction: rule.jurisdiction,
    governs: rule.governs,
    summary: rule.summary,
    citationText: rule.citation.text,
    citationUrl: rule.citation.url ?? "",
    effectiveFrom: rule.effectiveFrom ?? "",
    effectiveTo: rule.effectiveTo ?? "",
    reviewedOn: new Date().toISOString().slice(0, 10),
    reviewedBy: reviewer,
    taxa: rule.selector.taxa,
    exceptTaxa: rule.selector.exceptTaxa ?? [],
    conditionsJson: JSON.stringify(rule.conditions, null, 2),
    effectJson: JSON.stringify(rule.effect, null, 2),
    retired,
  };
}

/** Where an issue of the rule schema is shown on this form. */
const FIELD_OF: Record<string, keyof Values> = {
  jurisdiction: "jurisdiction",
  governs: "governs",
  summary: "summary",
  citation: "citationText",
  "citation.text": "citationText",
  "citation.url": "citationUrl",
  effectiveFrom: "effectiveFrom",
  effectiveTo: "effectiveTo",
  reviewedOn: "reviewedOn",
  reviewedBy: "reviewedBy",
  selector: "taxa",
  "selector.taxa": "taxa",
  "selector.exceptTaxa": "exceptTaxa",
  conditions: "conditionsJson",
  effect: "effectJson",
};

function fieldOf(path: readonly PropertyKey[]): keyof Values {
  const inRule = path[0] === "rule" ? path.slice(1).map(String) : path.map(String);
  return FIELD_OF[inRule.slice(0, 2).join(".")] ?? FIELD_OF[inRule[0] ?? ""] ?? "summary";
}

function parseJson(text: string): { ok: true; value: unknown } | { ok: false } {
  try {
    return { ok: true, value: JSON.parse(text) };
  } catch {
    return { ok: false };
  }
}

/** Builds the next version from the form and checks it with the shared schema, issue by issue. */
function resolverFor(base: Rule): Resolver<Values, unknown, RuleVersionInput> {
  return async (values) => {
    const errors: FieldErrors<Values> = {};
    const conditions = parseJson(values.conditionsJson);
    const effect = parseJson(values.effectJson);
    if (!conditions.ok)
      errors.conditionsJson = { type: "json", message: 'Write the conditions as JSON, e.g. {"sale": true}' };
    if (!effect.ok)
      errors.effectJson = { type: "json", message: 'Write the effect as JSON, e.g. {"kind": "advisory"}' };
    if (!conditions.ok || !effect.ok) return { values: {}, errors };
    const candidate = {
      retired: values.retired,
      rule: {
        ...base,
        version: base.version + 1,
        jurisdiction: values.jurisdiction,
        governs: values.governs,
        summary: values.summary,
        citation: {
          text: values.citationText,
          url: values.citationUrl.trim() === "" ? null : values.citationUrl.trim(),
        },
        effectiveFrom: values.effectiveFrom || null,
        effectiveTo: values.effectiveTo || null,
        reviewedOn: values.reviewedOn,
        reviewedBy: values.reviewedBy,
        selector: values.exceptTaxa.length
          ? { taxa: values.taxa, exceptTaxa: values.exceptTaxa }
          : { taxa: values.taxa },
        conditions: conditions.value,
        effect: effect.value,
      },
    };
    const parsed = ruleVersionInputSchema.safeParse(candidate, parseOptions());
    if (parsed.success) return { values: parsed.data, errors: {} };
    for (const issue of parsed.error.issues) {
      const field = fieldOf(issue.path);
      errors[field] ??= { type: issue.code, message: issue.message };
    }
    return { values: {}, errors };
  };
}

/** Edits a rule as its next version: citation, review date and reviewer, dates, scope and effect. */
export function RuleForm({
  current,
  reviewer,
  onDone,
}: {
  current: RuleVersionDto;
  reviewer: string;
  onDone: () => void;
}) {
  const save = useSaveRuleVersion();
  const form = useForm<Values, unknown, RuleVersionInput>({
    resolver: resolverFor(current.rule),
    defaultValues: valuesOf(current.rule, current.retired, reviewer),
  });
  const e = form.formState.errors;
  const submit = form.handleSubmit((input) => save.mutate(input, { onSuccess: onDone }));
  return (
    <form className="grid gap-4 sm:grid-cols-2" onSubmit={submit} noValidate>
      {save.error ? (
        <div className="sm:col-span-2">
          <Notice tone="block" role="alert">
            {save.error instanceof ApiError ? save.error.message : "Not saved."}
          </Notice>
        </div>
      ) : null}
      <SelectField
        label="Jurisdiction"
        options={JURISDICTIONS.map((j) => ({
          value: j,
          label: j === "US" ? "Federal (US)" : `${jurisdictionName(j)} (${j})`,
        }))}
        error={e.jurisdiction?.message}
        {...form.register("jurisdiction")}
      />
      <SelectField
        label="Governs"
        options={GOVERNS.map((g) => ({ value: g, label: GOVERNS_WORDS[g] }))}
        error={e.governs?.message}
        {...form.register("governs")}
      />
      <div className="sm:col-span-2">
        <TextAreaField
          label="What the rule says, in plain words"
          error={e.summary?.message}
          {...form.register("summary")}
        />
      </div>
      <TextField
        label="Citation"
        error={e.citationText?.message}
        hint={
          current.rule.demo ? "A demo rule's citation must say it is not a statement of the state's law." : undefined
        }
        {...form.register("citationText")}
      />
      <TextField
        label="Link to the official text (https)"
        type="url"
        error={e.citationUrl?.message}
        {...form.register("citationUrl")}
      />
      <TextField
        label="In force from"
        type="date"
        error={e.effectiveFrom?.message}
        {...form.register("effectiveFrom")}
      />
      <TextField
        label="In force until (last day)"
        type="date"
        error={e.effectiveTo?.message}
        {...form.register("effectiveTo")}
      />
      <TextField label="Reviewed on" type="date" error={e.reviewedOn?.message} {...form.register("reviewedOn")} />
      <TextField label="Reviewed by" error={e.reviewedBy?.message} {...form.register("reviewedBy")} />
      <Controller
        control={form.control}
        name="taxa"
        render={({ field }) => (
          <LinesField
            label="Taxa covered, one per line"
            hint="Any rank; descendants and synonyms are covered. * covers every animal."
            value={field.value}
            onChange={field.onChange}
            error={e.taxa?.message}
          />
        )}
      />
      <Controller
        control={form.control}
        name="exceptTaxa"
        render={({ field }) => (
          <LinesField
            label="Except these taxa, one per line"
            value={field.value}
            onChange={field.onChange}
            error={e.exceptTaxa?.message}
          />
        )}
      />
      <TextAreaField
        label="Conditions (JSON)"
        className="font-mono text-sm"
        error={e.conditionsJson?.message}
        {...form.register("conditionsJson")}
      />
      <TextAreaField
        label="Effect (JSON)"
        className="font-mono text-sm"
        error={e.effectJson?.message}
        {...form.register("effectJson")}
      />
      <label className="flex min-h-11 items-center gap-2 text-sm sm:col-span-2">
        <input type="checkbox" className="h-5 w-5" {...form.register("retired")} />
        Retire this rule (kept in the history, no longer applied)
      </label>
      <div className="flex gap-2 sm:col-span-2">
        <Button type="submit" busy={save.isPending}>
          Save as version {current.rule.version + 1}
        </Button>
        <Button type="button" variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
