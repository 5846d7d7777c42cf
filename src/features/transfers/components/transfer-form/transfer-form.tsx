import { useEffect, useRef, useState } from "react";
import {
  FormProvider,
  useForm,
  type FieldErrors,
  type FieldPath,
  type Resolver,
  type UseFormReturn,
} from "react-hook-form";
import { keeperResolver } from "@/lib/form-resolver";
import {
  createTransferSchema,
  transferInputSchema,
  type DirectoryOrganizationDto,
  type TaxonBriefDto,
  type TransferInput,
  type TransferInputParsed,
} from "@shared/schemas/transfer";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/feedback";
import { ApiError } from "@/lib/api-client";
import { searchTaxa, type TaxonSearch } from "@/lib/taxa-search";
import { AnimalsStep } from "./step-animals";
import { BoxesStep } from "./step-boxes";
import { ReviewStep } from "./step-review";
import { RouteStep } from "./step-route";

const STEPS = [
  {
    title: "Route and parties",
    fields: [
      "receiverOrganizationId",
      "receiverContactId",
      "origin",
      "destination",
      "mode",
      "plannedDepartureAt",
      "expectedArrivalAt",
      "purpose",
      "sale",
      "salePriceUsd",
      "handlingNotes",
      "privateNotes",
    ],
  },
  { title: "Boxes", fields: ["containers"] },
  { title: "Animals", fields: ["animals"] },
  { title: "Check and save", fields: [] },
] as const satisfies readonly { title: string; fields: readonly FieldPath<TransferInput>[] }[];

/** The step that holds a field ("animals.2.count" is on the animals step); the last one if none. */
function stepOf(fieldPaths: string[]): number {
  const index = STEPS.findIndex((s) =>
    s.fields.some((f: string) => fieldPaths.some((p) => p === f || p.startsWith(`${f}.`))),
  );
  return index === -1 ? STEPS.length - 1 : index;
}

export type TransferFormApi = UseFormReturn<TransferInput, unknown, TransferInputParsed>;
export type TransferFormProgress = { values: TransferInput; step: number; taxa: Record<string, TaxonBriefDto> };

type Props = {
  mode: "create" | "edit";
  defaultValues: TransferInput;
  initialTaxa: Record<string, TaxonBriefDto>;
  organizations: DirectoryOrganizationDto[];
  senderOrganizationId: string | null;
  /** Saves; a rejected ApiError with a field is shown on that field. */
  onSave: (values: TransferInputParsed) => Promise<unknown>;
  submitLabel: string;
  /** The species search; the real one unless a test passes its own. */
  search?: TaxonSearch;
  /** The step shown, when the caller keeps it (e.g. in the address, so Back goes one step back). */
  step?: number;
  /** Asked to show another step; without it the form keeps its step itself. */
  onStepChange?: (next: number) => void;
  /**
   * After a step's fields pass, before the next step opens: keeps what is complete (the new
   * transfer's draft). A rejected ApiError is shown like a failed save, and the step stays open.
   */
  onStepDone?: (values: TransferInput, step: number, form: TransferFormApi) => Promise<unknown>;
  /** Every change of a value, of the step or of the species known by name (the browser's copy). */
  onProgress?: (progress: TransferFormProgress) => void;
};

/**
 * The transfer in four steps — route and parties, boxes, animals, check — validated with the
 * same schema the server uses. A new transfer may not leave in the past; an edit may keep its date.
 */
export function TransferForm({
  mode,
  defaultValues,
  initialTaxa,
  organizations,
  senderOrganizationId,
  onSave,
  submitLabel,
  search = searchTaxa,
  step: shownStep,
  onStepChange,
  onStepDone,
  onProgress,
}: Props) {
  const resolver: Resolver<TransferInput, unknown, TransferInputParsed> = (values, context, options) =>
    keeperResolver(mode === "create" ? createTransferSchema(new Date()) : transferInputSchema)(
      values,
      context,
      options,
    );
  const form = useForm<TransferInput, unknown, TransferInputParsed>({ resolver, defaultValues, mode: "onTouched" });
  const [ownStep, setOwnStep] = useState(0);
  const step = Math.min(Math.max(shownStep ?? ownStep, 0), STEPS.length - 1);
  const [taxa, setTaxa] = useState(initialTaxa);
  const [saveError, setSaveError] = useState<string | null>(null);
  const [advancing, setAdvancing] = useState(false);
  const heading = useRef<HTMLHeadingElement>(null);

  // Report every change to whoever keeps a copy; the latest step and species ride along.
  const reported = useRef({ onProgress, step, taxa });
  useEffect(() => {
    reported.current = { onProgress, step, taxa };
    onProgress?.({ values: form.getValues(), step, taxa });
  }, [onProgress, step, taxa, form]);
  useEffect(() => {
    const subscription = form.watch((values) => {
      // A refusal from the server goes as soon as the entries change: it may no longer apply.
      setSaveError(null);
      const { onProgress: report, step: at, taxa: known } = reported.current;
      report?.({ values: values as TransferInput, step: at, taxa: known });
    });
    return () => subscription.unsubscribe();
  }, [form]);

  function go(next: number) {
    if (onStepChange) onStepChange(next);
    else setOwnStep(next);
    // Move focus to the new step's heading so keyboard and screen-reader users start at its top.
    requestAnimationFrame(() => heading.current?.focus());
  }

  /** A refused or failed save: said above the step, and on the field the server named. */
  function showSaveError(err: unknown) {
    const message = err instanceof ApiError ? err.message : "Not saved. Check your connection and try again.";
    setSaveError(message);
    if (err instanceof ApiError && err.field && err.field !== "body") {
      form.setError(err.field as FieldPath<TransferInput>, { message });
      go(stepOf([err.field]));
    }
  }

  async function forward() {
    const current = STEPS[step];
    if (!current) return;
    if (current.fields.length > 0 && !(await form.trigger([...current.fields], { shouldFocus: true }))) return;
    if (onStepDone) {
      setSaveError(null);
      setAdvancing(true);
      try {
        await onStepDone(form.getValues(), step, form);
      } catch (err) {
        showSaveError(err);
        return;
      } finally {
        setAdvancing(false);
      }
    }
    go(step + 1);
  }

  const submit = form.handleSubmit(
    async (values) => {
      setSaveError(null);
      try {
        await onSave(values);
      } catch (err) {
        showSaveError(err);
      }
    },
    (errors: FieldErrors<TransferInput>) => go(stepOf(Object.keys(errors))),
  );

  const current = STEPS[step]!;
  const rememberTaxon = (t: TaxonBriefDto) => setTaxa((m) => (m[t.id] ? m : { ...m, [t.id]: t }));

  return (
    <FormProvider {...form}>
      <nav aria-label="Steps" className="mb-5">
        <ol className="flex flex-wrap gap-2">
          {STEPS.map((s, i) => (
            <li key={s.title}>
              <button
                type="button"
                aria-current={i === step ? "step" : undefined}
                disabled={mode === "create" && i > step}
                onClick={() => go(i)}
                className={`inline-flex min-h-11 items-center gap-2 rounded-full border px-3 text-sm font-semibold ${i === step ? "border-fern bg-fern text-paper-card" : i < step ? "border-fern-ring bg-fern-light text-fern-dark" : "border-rule bg-paper-card text-ink-faint"}`}
              >
                <span aria-hidden>{i + 1}</span> {s.title}
              </button>
            </li>
          ))}
        </ol>
      </nav>
      <form onSubmit={submit} noValidate className="grid gap-5">
        <h2 ref={heading} tabIndex={-1} className="text-xl font-semibold focus:outline-none">
          Step {step + 1} of {STEPS.length}: {current.title}
        </h2>
        {saveError ? (
          <Notice tone="block" role="alert" title="Not saved">
            {saveError}
          </Notice>
        ) : null}
        {step === 0 ? <RouteStep organizations={organizations} senderOrganizationId={senderOrganizationId} /> : null}
        {step === 1 ? <BoxesStep /> : null}
        {step === 2 ? <AnimalsStep taxa={taxa} rememberTaxon={rememberTaxon} search={search} /> : null}
        {step === 3 ? <ReviewStep organizations={organizations} taxa={taxa} /> : null}
        <div className="flex flex-wrap gap-2 border-t border-rule pt-4">
          {step > 0 ? (
            <Button type="button" variant="secondary" onClick={() => go(step - 1)}>
              Back
            </Button>
          ) : null}
          {/* Distinct keys: React must not reuse the "Next" button as the submit button, or the
              click that reaches the last step would also submit the form. */}
          {step < STEPS.length - 1 ? (
            <Button key="next" type="button" busy={advancing} onClick={() => void forward()}>
              Next: {STEPS[step + 1]!.title}
            </Button>
          ) : (
            <Button key="save" type="submit" busy={form.formState.isSubmitting}>
              {submitLabel}
            </Button>
          )}
          {mode === "edit" && step < STEPS.length - 1 ? (
            <Button type="submit" variant="ghost" busy={form.formState.isSubmitting}>
              {submitLabel}
            </Button>
          ) : null}
        </div>
      </form>
    </FormProvider>
  );
}
