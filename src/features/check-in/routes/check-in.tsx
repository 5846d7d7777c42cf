import { SEX_WORDS } from "@shared/words";
import { useEffect, useRef, useState } from "react";
import { Controller, FormProvider, useForm } from "react-hook-form";
import { keeperResolver } from "@/lib/form-resolver";
import { Link, useParams } from "react-router";
import type { z } from "zod";
import { outcomeTotal } from "@shared/checkin/discrepancy";
import { checkInInputSchema, type CheckInInput, type TaxonBriefDto, type TransferDto } from "@shared/schemas/transfer";
import { Button } from "@/components/ui/button";
import { Loading, Notice } from "@/components/ui/feedback";
import { TextAreaField, TextField } from "@/components/ui/field";
import { MeasureField } from "@/components/ui/measure-field";
import { PageHeader } from "@/components/ui/page";
import { StatusBadge } from "@/components/ui/status-badge";
import { TaxonName } from "@/components/ui/taxon-name";
import { paths } from "@/config/paths";
import { ApiError } from "@/lib/api-client";
import { formatInstant } from "@shared/dates";
import { useIdempotencyKey } from "@/lib/idempotency";
import { searchTaxa } from "@/lib/taxa-search";
import { useTransfer } from "@/lib/transfer-queries";
import { useViewer } from "@/lib/viewer";
import { PhotoPicker } from "@/components/ui/photo-picker";
import type { ChosenPhoto } from "@/lib/photos";
import { useCheckIn } from "../api/check-in";
import { ArrivalRecord } from "../components/arrival-record";
import { DiscrepancyTable } from "../components/discrepancy-table";
import { ExtrasEditor } from "../components/extras-editor";
import { OutcomeCard } from "../components/outcome-card";

type Parsed = z.output<typeof checkInInputSchema>;

function CheckInForm({
  transfer: t,
  signer,
  onPhotoProblems,
}: {
  transfer: TransferDto;
  signer: string;
  onPhotoProblems: (messages: string[]) => void;
}) {
  const animals = [...t.animals].sort((a, b) => a.position - b.position);
  const boxLabel = new Map(t.containers.map((c) => [c.id, c.label]));
  const submitCheckIn = useCheckIn(t.id);
  const { key, settle } = useIdempotencyKey();
  const [taxa, setTaxa] = useState<Record<string, TaxonBriefDto>>({});
  const [sumError, setSumError] = useState<string | null>(null);
  const [photos, setPhotos] = useState<ChosenPhoto[]>([]);
  const form = useForm<CheckInInput, unknown, Parsed>({
    resolver: keeperResolver(checkInInputSchema),
    defaultValues: {
      // Every count starts at zero: the receiver says what they found, line by line.
      items: animals.map((a) => ({
        animalId: a.id,
        arrivedWell: 0,
        arrivedProblem: 0,
        deadOnArrival: 0,
        missing: 0,
        problem: "",
        weightG: null,
        notes: "",
      })),
      extras: [],
      notes: "",
      boxTempF: null,
      signedName: signer,
      acknowledged: false as unknown as true,
    },
  });
  const e = form.formState.errors;

  // A stale refusal never stays on screen: any change to the entries clears it.
  const reset = useRef(submitCheckIn.reset);
  reset.current = submitCheckIn.reset;
  useEffect(() => {
    const subscription = form.watch(() => {
      setSumError(null);
      reset.current();
    });
    return () => subscription.unsubscribe();
  }, [form]);

  const submit = form.handleSubmit((input) => {
    const off = input.items.filter((item, i) => outcomeTotal(item) !== animals[i]!.count).length;
    if (off > 0) {
      setSumError(
        `${off === 1 ? "One line does not" : `${off} lines do not`} add up to the number listed. Fix the counts marked in amber.`,
      );
      return;
    }
    setSumError(null);
    submitCheckIn.mutate(
      { input, idempotencyKey: key, photos },
      {
        onSuccess: ({ failed }) => onPhotoProblems(failed.map((m) => `A photo was not sent (${m}).`)),
        onSettled: (_d, error) => settle(error ?? undefined),
      },
    );
  });

  return (
    <FormProvider {...form}>
      <form onSubmit={submit} noValidate className="grid gap-6">
        <Notice tone="info">
          Open every container and check each animal against its line: species, sex, markings, condition, shell or skin.
        </Notice>
        <section aria-labelledby="lines-title" className="grid gap-4">
          <h2 id="lines-title" className="text-xl font-semibold">
            Listed animals
          </h2>
          {animals.map((a, i) => (
            <div key={a.id} className="grid gap-2">
              <Controller
                control={form.control}
                name={`items.${i}`}
                render={({ field }) => (
                  <OutcomeCard
                    animal={a}
                    boxLabel={a.containerId ? (boxLabel.get(a.containerId) ?? null) : null}
                    value={field.value}
                    onChange={field.onChange}
                    errors={{
                      problem: e.items?.[i]?.problem?.message,
                      weightG: e.items?.[i]?.weightG?.message,
                      notes: e.items?.[i]?.notes?.message,
                    }}
                  />
                )}
              />
              <PhotoPicker
                slots={[{ subject: "animal", label: `Photo of ${a.taxon.scientificName}`, animalId: a.id }]}
                value={photos.filter((p) => p.animalId === a.id)}
                onChange={(mine) => setPhotos([...photos.filter((p) => p.animalId !== a.id), ...mine])}
              />
            </div>
          ))}
        </section>

        <ExtrasEditor taxa={taxa} rememberTaxon={(tx) => setTaxa((m) => ({ ...m, [tx.id]: tx }))} search={searchTaxa} />

        <section
          aria-labelledby="sign-title"
          className="grid gap-3 rounded-card border border-rule bg-paper-card p-4 shadow-card"
        >
          <h2 id="sign-title" className="text-xl font-semibold">
            Sign
          </h2>
          <Controller
            control={form.control}
            name="boxTempF"
            render={({ field }) => (
              <MeasureField
                kind="temperature"
                label="Box temperature on opening (optional)"
                value={field.value}
                onChange={field.onChange}
                onBlur={field.onBlur}
                error={e.boxTempF?.message}
                hint="Read it inside the box before taking the animals out; it is set beside the model's prediction."
              />
            )}
          />
          <TextAreaField label="Notes on the arrival (optional)" error={e.notes?.message} {...form.register("notes")} />
          <PhotoPicker
            slots={[{ subject: "box_outside", label: "Photo of the boxes as they arrived" }]}
            value={photos.filter((p) => !p.animalId)}
            onChange={(mine) => setPhotos([...photos.filter((p) => p.animalId), ...mine])}
          />
          <TextField
            label="Your name, as a signature"
            autoComplete="name"
            error={e.signedName?.message}
            {...form.register("signedName")}
          />
          <label className="flex min-h-12 cursor-pointer items-start gap-3">
            <input
              type="checkbox"
              className="mt-1 h-6 w-6 shrink-0 accent-fern"
              aria-describedby={e.acknowledged ? "ack-error" : undefined}
              {...form.register("acknowledged")}
            />
            <span>I opened every container and checked every animal, and what I recorded here is what I found.</span>
          </label>
          {e.acknowledged ? (
            <p id="ack-error" role="alert" className="font-medium text-brick">
              {e.acknowledged.message}
            </p>
          ) : null}
          {sumError ? (
            <Notice tone="block" role="alert">
              {sumError}
            </Notice>
          ) : null}
          {submitCheckIn.error ? (
            <Notice tone="block" role="alert" title="Not signed">
              {submitCheckIn.error instanceof ApiError
                ? submitCheckIn.error.message
                : "Check your connection and press the button again; it will count once."}
            </Notice>
          ) : null}
          <div>
            <Button type="submit" size="lg" busy={submitCheckIn.isPending}>
              Sign the check-in
            </Button>
          </div>
        </section>
      </form>
    </FormProvider>
  );
}

function Results({ transfer: t, photoProblems }: { transfer: TransferDto; photoProblems: string[] }) {
  const c = t.checkIn!;
  return (
    <div className="grid grid-cols-1 gap-5">
      <Notice tone="ok" title="Checked in">
        Signed by {c.signedName} on {formatInstant(c.signedAt)}.{" "}
        <Link to={paths.register} className="font-medium text-fern underline">
          Open the collection register
        </Link>
      </Notice>
      {photoProblems.length ? (
        <Notice tone="block" role="alert" title="Some photos were not sent">
          {photoProblems.join(" ")}
        </Notice>
      ) : null}
      <DiscrepancyTable checkIn={c} />
      <ArrivalRecord transfer={t} />
      {c.extras.length ? (
        <section aria-labelledby="extras-done" className="grid gap-2">
          <h2 id="extras-done" className="text-lg font-semibold">
            Arrived but not listed
          </h2>
          <ul className="list-disc pl-5">
            {c.extras.map((x, i) => (
              <li key={i}>
                {x.count} × <TaxonName taxon={x.taxon} />, {SEX_WORDS[x.sex].toLowerCase()}
                {x.notes ? ` — ${x.notes}` : ""}
              </li>
            ))}
          </ul>
        </section>
      ) : null}
    </div>
  );
}

/** Arrival check-in: a card per animal line, extras, a signature; then the differences from the manifest. */
export function CheckInRoute() {
  const { transferId = "" } = useParams();
  const viewer = useViewer();
  const transfer = useTransfer(transferId);
  const [photoProblems, setPhotoProblems] = useState<string[]>([]);
  if (transfer.isPending) return <Loading label="Loading the transfer…" />;
  if (transfer.error)
    return (
      <Notice tone="block" role="alert" title="This transfer did not load">
        {(transfer.error as Error).message}
      </Notice>
    );
  const t = transfer.data;
  return (
    <div className="grid grid-cols-1 gap-5">
      <PageHeader
        title={`Check-in for ${t.number}`}
        eyebrow={`From ${t.sender.organization.name}`}
        actions={
          <>
            <StatusBadge status={t.status} />
            <Link
              to={paths.transfers.detail.href(t.id)}
              className="inline-flex min-h-11 items-center px-2 font-medium text-fern underline"
            >
              Back to the transfer
            </Link>
          </>
        }
      />
      {t.checkIn ? (
        <Results transfer={t} photoProblems={photoProblems} />
      ) : t.abilities.checkIn ? (
        <CheckInForm transfer={t} signer={viewer.user.displayName} onPhotoProblems={setPhotoProblems} />
      ) : (
        <Notice tone="info" title="Not ready for check-in">
          {t.delivery?.state === "awaiting_receiver"
            ? "The courier recorded the delivery: confirm on the transfer page that you have the boxes, then check the animals in."
            : "The receiver checks the animals in once the delivery is recorded and acknowledged."}
        </Notice>
      )}
    </div>
  );
}
