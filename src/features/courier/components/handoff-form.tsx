import { HANDOFF_KIND_WORDS } from "@shared/words";
import { useState } from "react";
import { Controller, useForm } from "react-hook-form";
import { keeperResolver } from "@/lib/form-resolver";
import type { z } from "zod";
import { handoffInputSchema, type HandoffInput, type TransferDto } from "@shared/schemas/transfer";
import { handoffKind } from "@shared/transfer/lifecycle";
import { Button } from "@/components/ui/button";
import { CountStepper } from "@/components/ui/count-stepper";
import { Notice } from "@/components/ui/feedback";
import { TextAreaField, TextField } from "@/components/ui/field";
import { MeasureField } from "@/components/ui/measure-field";
import { ApiError } from "@/lib/api-client";
import { useIdempotencyKey } from "@/lib/idempotency";
import { useRecordHandoff } from "../api/record-handoff";
import { handoffParties } from "./handoff-parties";

type Parsed = z.output<typeof handoffInputSchema>;
type Located =
  | { state: "idle" }
  | { state: "locating" }
  | { state: "found"; accuracyM: number }
  | { state: "failed"; message: string };

const big = "text-lg";

function defaults(t: TransferDto, index: number): HandoffInput {
  const parties = handoffParties(t, index);
  return {
    handoffIndex: index,
    // Counted from zero on purpose: the number is what the person counted, not what was expected.
    boxesCounted: 0,
    seals: [...t.containers]
      .sort((a, b) => a.position - b.position)
      .map((c) => ({ containerId: c.id, sealNumber: c.sealNumber ?? "", intact: false })),
    boxTempF: null,
    place: { text: "", lat: null, lon: null, accuracyM: null },
    releasedByName: parties?.releasedBy ?? "",
    receivedByName: parties?.receivedBy ?? "",
    notes: "",
    acknowledged: false as unknown as true,
  };
}

/** The handoff on a phone: count, seals, temperature, place, names, and one confirmation. */
export function HandoffForm({
  transfer: t,
  index,
  onRecorded,
}: {
  transfer: TransferDto;
  index: number;
  onRecorded: (message: string) => void;
}) {
  const record = useRecordHandoff(t.id);
  const { key, settle } = useIdempotencyKey();
  const [located, setLocated] = useState<Located>({ state: "idle" });
  const form = useForm<HandoffInput, unknown, Parsed>({
    resolver: keeperResolver(handoffInputSchema),
    defaultValues: defaults(t, index),
  });
  const { register, control, formState, setValue, watch } = form;
  const e = formState.errors;
  const boxes = [...t.containers].sort((a, b) => a.position - b.position);
  const counted = watch("boxesCounted");
  const kind = handoffKind(index, t.legs.length);

  function locate() {
    setLocated({ state: "locating" });
    navigator.geolocation.getCurrentPosition(
      (position) => {
        setValue("place.lat", position.coords.latitude);
        setValue("place.lon", position.coords.longitude);
        setValue("place.accuracyM", Math.round(position.coords.accuracy));
        setLocated({ state: "found", accuracyM: Math.round(position.coords.accuracy) });
      },
      (error) =>
        setLocated({
          state: "failed",
          message:
            error.code === error.PERMISSION_DENIED
              ? "Location is not allowed for this site. Type the place instead."
              : "No location fix. Type the place instead.",
        }),
      { enableHighAccuracy: true, timeout: 15_000, maximumAge: 60_000 },
    );
  }

  const submit = form.handleSubmit((input) =>
    record.mutate(
      { input, idempotencyKey: key },
      {
        onSuccess: () => onRecorded(`${HANDOFF_KIND_WORDS[kind]} recorded.`),
        onSettled: (_data, error) => settle(error ?? undefined),
      },
    ),
  );

  return (
    <form onSubmit={submit} noValidate className="grid gap-6">
      <h2 className="text-2xl font-semibold">
        {HANDOFF_KIND_WORDS[kind]}{" "}
        <span className="text-ink-soft">
          ({index + 1} of {t.handoffsPlanned})
        </span>
      </h2>

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

      <fieldset className="grid gap-3">
        <legend className={`mb-2 font-display font-semibold ${big}`}>Seals</legend>
        {boxes.map((box, i) => (
          <div key={box.id} className="grid gap-2 rounded-card border border-rule bg-paper-card p-3">
            <label className="flex min-h-14 cursor-pointer items-center gap-4">
              <input type="checkbox" className="h-8 w-8 shrink-0 accent-fern" {...register(`seals.${i}.intact`)} />
              <span className={big}>
                <span className="font-semibold">{box.label}</span>:{" "}
                {box.sealNumber ? (
                  <>
                    seal <span className="font-mono font-semibold">{box.sealNumber}</span> is there and unbroken
                  </>
                ) : (
                  "closed and undamaged (no seal number on record)"
                )}
              </span>
            </label>
            {box.sealNumber ? (
              <TextField
                label={`Seal number you see on ${box.label}`}
                autoComplete="off"
                {...register(`seals.${i}.sealNumber`)}
              />
            ) : null}
          </div>
        ))}
      </fieldset>

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

      <fieldset className="grid gap-3">
        <legend className={`mb-2 font-display font-semibold ${big}`}>Where</legend>
        <TextField
          label="Place"
          placeholder="e.g. carrier hub, Memphis"
          error={e.place?.text?.message}
          {...register("place.text")}
        />
        {typeof navigator !== "undefined" && "geolocation" in navigator ? (
          <div className="flex flex-wrap items-center gap-3">
            <Button type="button" variant="secondary" size="lg" onClick={locate} busy={located.state === "locating"}>
              Use my location
            </Button>
            <p role="status" className="text-ink-soft">
              {located.state === "found"
                ? `Location recorded (within ${located.accuracyM} m).`
                : located.state === "failed"
                  ? located.message
                  : ""}
            </p>
          </div>
        ) : null}
      </fieldset>

      <div className="grid gap-3 sm:grid-cols-2">
        <TextField label="Released by" error={e.releasedByName?.message} {...register("releasedByName")} />
        <TextField label="Received by" error={e.receivedByName?.message} {...register("receivedByName")} />
      </div>

      <TextAreaField label="Notes (optional)" error={e.notes?.message} {...register("notes")} />

      <label className="flex min-h-14 cursor-pointer items-start gap-4 rounded-card border-2 border-fern-ring bg-fern-light p-4">
        <input
          type="checkbox"
          className="mt-1 h-8 w-8 shrink-0 accent-fern"
          aria-describedby={e.acknowledged ? "ack-error" : undefined}
          {...register("acknowledged")}
        />
        <span className={big}>
          I have counted the boxes and checked the seals, and custody passes from the person releasing to the person
          receiving now.
        </span>
      </label>
      {e.acknowledged ? (
        <p id="ack-error" role="alert" className="-mt-4 font-medium text-brick">
          {e.acknowledged.message}
        </p>
      ) : null}

      {record.error ? (
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

      <Button type="submit" size="lg" className="min-h-16 w-full text-xl" busy={record.isPending}>
        Confirm the {kind === "pickup" ? "pickup" : kind === "delivery" ? "delivery" : "handoff"}
      </Button>
    </form>
  );
}
