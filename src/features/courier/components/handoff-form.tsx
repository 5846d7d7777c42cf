import { HANDOFF_KIND_WORDS, OFFLINE_HANDOFF_STATE_WORDS } from "@shared/words";
import { useEffect, useMemo, useRef, useState } from "react";
import { Controller, FormProvider, useForm, type FieldPath } from "react-hook-form";
import type { z } from "zod";
import { reviewHandoff, type HandoffReview } from "@shared/custody/handoff-review";
import { handoffInputSchema, type HandoffInput, type TransferDto } from "@shared/schemas/transfer";
import { handoffKind } from "@shared/transfer/lifecycle";
import { Button } from "@/components/ui/button";
import { CountStepper } from "@/components/ui/count-stepper";
import { Notice } from "@/components/ui/feedback";
import { TextAreaField, TextField } from "@/components/ui/field";
import { MeasureField } from "@/components/ui/measure-field";
import { PhotoPicker } from "@/components/ui/photo-picker";
import { ApiError } from "@/lib/api-client";
import { keeperResolver } from "@/lib/form-resolver";
import { useIdempotencyKey } from "@/lib/idempotency";
import type { ChosenPhoto } from "@/lib/photos";
import { useRecordHandoff } from "../api/record-handoff";
import { handoffContextOf } from "./handoff-context";
import { handoffParties } from "./handoff-parties";
import { HandoffReviewStep, type Finding } from "./handoff-review-step";
import { PlaceFields } from "./place-fields";
import { SealFields } from "./seal-fields";

type Parsed = z.output<typeof handoffInputSchema>;

/** Fields checked before the review; the confirmation and the reasons belong to the review. */
const ENTRY_FIELDS: FieldPath<HandoffInput>[] = [
  "boxesCounted",
  "seals",
  "boxTempF",
  "place",
  "releasedByName",
  "receivedByName",
  "notes",
];

function defaults(t: TransferDto, index: number): HandoffInput {
  const parties = handoffParties(t, index);
  return {
    handoffIndex: index,
    // Counted from zero on purpose: the number is what the person counted, not what was expected.
    boxesCounted: 0,
    // Seal numbers start empty: the person types what they read (issue 12), the record is shown beside.
    seals: [...t.containers]
      .sort((a, b) => a.position - b.position)
      .map((c) => ({ containerId: c.id, sealNumber: "", intact: false })),
    boxTempF: null,
    place: { text: "", lat: null, lon: null, accuracyM: null },
    releasedByName: parties?.releasedBy ?? "",
    receivedByName: parties?.receivedBy ?? "",
    notes: "",
    reasons: {},
    receiverCode: null,
    acknowledged: false as unknown as true,
  };
}

/** What the server said is missing, when it saw a finding the phone did not (its clock, a newer record). */
function serverFindings(error: unknown): Finding[] | null {
  if (!(error instanceof ApiError) || error.code !== "reason_needed") return null;
  const details = (error.body as { error?: { findings?: Finding[] } } | undefined)?.error;
  return details?.findings ?? null;
}

/**
 * The handoff on a phone, in two steps: what the person counted, read and saw (with photos), then a
 * review of everything that differs from the record — each becomes an alert — with the reasons a
 * failed plausibility check needs, and one confirmation.
 */
export function HandoffForm({
  transfer: t,
  index,
  viewer,
  onRecorded,
}: {
  transfer: TransferDto;
  index: number;
  viewer: { id: string; displayName: string };
  /** `kept`: no signal, the handoff waits on the phone (D40). */
  onRecorded: (message: string, problems: string[], kept?: boolean) => void;
}) {
  const viewerName = viewer.displayName;
  const record = useRecordHandoff(t, viewer.id);
  const { key, settle } = useIdempotencyKey();
  // When the person confirmed, fixed per key: a retry with the same key sends the same body.
  const confirmedAt = useRef<{ key: string; at: string } | null>(null);
  const confirmedAtFor = (k: string) => {
    if (confirmedAt.current?.key !== k) confirmedAt.current = { key: k, at: new Date().toISOString() };
    return confirmedAt.current.at;
  };
  const [review, setReview] = useState<HandoffReview | null>(null);
  const [photos, setPhotos] = useState<ChosenPhoto[]>([]);
  const form = useForm<HandoffInput, unknown, Parsed>({
    resolver: keeperResolver(handoffInputSchema),
    defaultValues: defaults(t, index),
  });
  const { control, watch } = form;
  const boxes = useMemo(() => [...t.containers].sort((a, b) => a.position - b.position), [t.containers]);
  const counted = watch("boxesCounted");
  const kind = handoffKind(index, t.legs.length);
  // The server's findings when it saw more than the phone (its clock, a newer record); kept while the reasons are typed.
  const [fromServer, setFromServer] = useState<Finding[] | null>(null);
  const findings: Finding[] = fromServer ?? review?.findings ?? [];

  // A stale refusal never stays on screen: any change to the entries clears it.
  const reset = useRef(record.reset);
  reset.current = record.reset;
  useEffect(() => {
    const subscription = watch(() => reset.current());
    return () => subscription.unsubscribe();
  }, [watch]);

  async function toReview() {
    const values = form.getValues();
    const unread = values.seals.findIndex(
      (s, i) => boxes[i]?.sealNumber && s.intact && !String(s.sealNumber ?? "").trim(),
    );
    if (unread >= 0) {
      form.setError(`seals.${unread}.sealNumber`, {
        message: `Type the seal number you read on ${boxes[unread]!.label}, or untick “The seal is there and unbroken”.`,
      });
      form.setFocus(`seals.${unread}.sealNumber`);
      return;
    }
    if (!(await form.trigger(ENTRY_FIELDS, { shouldFocus: true }))) return;
    setFromServer(null);
    setReview(
      reviewHandoff(handoffContextOf(t, viewerName), {
        handoffIndex: index,
        boxesCounted: values.boxesCounted,
        seals: values.seals,
        place: values.place,
        receivedByName: values.receivedByName,
        at: Date.now(),
        recorder: t.viewerRole,
      }),
    );
  }

  const confirm = form.handleSubmit(
    (input) =>
      record.mutate(
        {
          input: { ...input, receiverCode: input.receiverCode || null, confirmedAt: confirmedAtFor(key) },
          idempotencyKey: key,
          photos,
        },
        {
          onSuccess: (outcome) =>
            outcome.sent
              ? onRecorded(
                  `${HANDOFF_KIND_WORDS[kind]} recorded.${findings.length ? ` ${findings.length === 1 ? "An alert went" : `${findings.length} alerts went`} to the sender and the receiver.` : ""}`,
                  outcome.failed.map((f) => `A photo was not sent (${f.message}). Add it again below.`),
                )
              : onRecorded(
                  `${HANDOFF_KIND_WORDS[kind]}: ${OFFLINE_HANDOFF_STATE_WORDS.waiting.toLowerCase()}.`,
                  [],
                  true,
                ),
          onError: (error) => {
            const more = serverFindings(error);
            if (more) setFromServer(more);
            // A refusal about one entry: back to it, with the server's words on the field.
            if (
              error instanceof ApiError &&
              error.field &&
              !error.field.startsWith("reasons") &&
              error.field !== "receiverCode"
            ) {
              setReview(null);
              setFromServer(null);
              form.setError(error.field as FieldPath<HandoffInput>, { message: error.message });
            } else if (error instanceof ApiError && error.field && error.field !== "body") {
              form.setError(error.field as FieldPath<HandoffInput>, { message: error.message });
            }
          },
          onSettled: (_data, error) => settle(error ?? undefined),
        },
      ),
    // An entry the review hides is wrong: back to the entries, where its message shows.
    (errors) => {
      if (ENTRY_FIELDS.some((field) => field in errors)) setReview(null);
    },
  );

  return (
    <FormProvider {...form}>
      <form
        onSubmit={review ? confirm : (e) => (e.preventDefault(), void toReview())}
        noValidate
        className="grid gap-6"
      >
        <h2 className="text-2xl font-semibold">
          {HANDOFF_KIND_WORDS[kind]}{" "}
          <span className="text-ink-soft">
            ({index + 1} of {t.handoffsPlanned})
          </span>
        </h2>

        <div className={review ? "hidden" : "grid gap-6"}>
          <Controller
            control={control}
            name="boxesCounted"
            render={({ field }) => (
              <CountStepper
                label="Boxes you counted"
                value={field.value}
                onChange={field.onChange}
                max={200}
                hint={`The transfer lists ${boxes.length} ${boxes.length === 1 ? "box" : "boxes"}.`}
              />
            )}
          />
          {counted !== boxes.length ? (
            <Notice tone="caution" role="status">
              You counted {counted} of {boxes.length}. If a box is missing or extra, say what happened in the notes.
            </Notice>
          ) : null}
          <SealFields boxes={boxes} />
          <Controller
            control={control}
            name="boxTempF"
            render={({ field, fieldState }) => (
              <MeasureField
                kind="temperature"
                label="Temperature in or at the box"
                hint="Leave empty if you have no thermometer."
                value={field.value}
                onChange={field.onChange}
                onBlur={field.onBlur}
                error={fieldState.error?.message}
              />
            )}
          />
          <PlaceFields />
          <div className="grid gap-3 sm:grid-cols-2">
            <TextField
              label="Released by"
              error={form.formState.errors.releasedByName?.message}
              {...form.register("releasedByName")}
            />
            <TextField
              label="Received by"
              error={form.formState.errors.receivedByName?.message}
              {...form.register("receivedByName")}
            />
          </div>
          <TextAreaField
            label="Notes (optional)"
            error={form.formState.errors.notes?.message}
            {...form.register("notes")}
          />
          <fieldset className="grid gap-3">
            <legend className="mb-2 font-display text-lg font-semibold">Photos (optional)</legend>
            <PhotoPicker
              slots={[
                { subject: "box_outside", label: "Photo of the boxes" },
                ...boxes
                  .filter((b) => b.sealNumber)
                  .map((b) => ({ subject: "seal" as const, label: `Seal of ${b.label}`, containerId: b.id })),
                { subject: "animal", label: "Photo of an animal" },
              ]}
              value={photos}
              onChange={setPhotos}
            />
          </fieldset>
        </div>

        {review ? (
          <HandoffReviewStep
            review={review}
            findings={findings}
            askCode={kind === "delivery" && t.viewerRole !== "receiver"}
          />
        ) : null}

        {record.error && !serverFindings(record.error) ? (
          <Notice tone="block" role="alert" title="Not recorded">
            {record.error instanceof ApiError
              ? record.error.status === 409
                ? "This handoff is already recorded. Reload the page to see it."
                : record.error.status === 0
                  ? "No connection. Your entries are kept: press the button again when you have signal; it will count once."
                  : record.error.message
              : "Something went wrong. Press the button again."}
          </Notice>
        ) : null}

        {review ? (
          <div className="grid gap-3">
            <Button type="submit" size="lg" className="min-h-16 w-full text-xl" busy={record.isPending}>
              Confirm the {kind === "pickup" ? "pickup" : kind === "delivery" ? "delivery" : "handoff"}
            </Button>
            <Button
              type="button"
              variant="secondary"
              size="lg"
              onClick={() => setReview(null)}
              disabled={record.isPending}
            >
              Back to my entries
            </Button>
          </div>
        ) : (
          <Button type="submit" size="lg" className="min-h-16 w-full text-xl">
            Review before confirming
          </Button>
        )}
      </form>
    </FormProvider>
  );
}
