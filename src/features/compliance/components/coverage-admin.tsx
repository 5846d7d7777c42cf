import { useState, type FormEvent } from "react";
import type { JurisdictionCoverageDto } from "@shared/schemas/compliance";
import { formatDate, formatInstant } from "@shared/dates";
import { Button } from "@/components/ui/button";
import { TextAreaField, TextField } from "@/components/ui/field";
import { EmptyState, Loading, Notice } from "@/components/ui/feedback";
import { ApiError } from "@/lib/api-client";
import { useCoverage, useRecordReview } from "../api/coverage";
import { Tag } from "./tag";

const today = () => new Date().toISOString().slice(0, 10);

function Office({ label, office }: { label: string; office: JurisdictionCoverageDto["wildlifeAgency"] }) {
  return (
    <p>
      <span className="text-ink-soft">{label}: </span>
      <a href={office.url} target="_blank" rel="noopener noreferrer" className="text-fern underline underline-offset-2">
        {office.name}
      </a>
    </p>
  );
}

/** Records an administrator's review of one jurisdiction's rules, or withdraws it. */
function ReviewForm({
  entry,
  reviewer,
  onDone,
}: {
  entry: JurisdictionCoverageDto;
  reviewer: string;
  onDone: () => void;
}) {
  const save = useRecordReview(entry.jurisdiction);
  const [reviewedOn, setReviewedOn] = useState(entry.reviewedOn ?? today());
  const [reviewedBy, setReviewedBy] = useState(entry.reviewedBy ?? reviewer);
  const [notes, setNotes] = useState(entry.notes ?? "");
  const submit = (event: FormEvent) => {
    event.preventDefault();
    save.mutate({ reviewedOn, reviewedBy, notes }, { onSuccess: onDone });
  };
  return (
    <form
      onSubmit={submit}
      className="mt-2 grid gap-3 rounded-card border border-rule bg-paper-card p-3 sm:grid-cols-2"
    >
      {save.error ? (
        <div className="sm:col-span-2">
          <Notice tone="block" role="alert">
            {save.error instanceof ApiError ? save.error.message : "Not saved."}
          </Notice>
        </div>
      ) : null}
      <TextField
        label="Reviewed on"
        type="date"
        value={reviewedOn}
        max={today()}
        onChange={(e) => setReviewedOn(e.target.value)}
      />
      <TextField label="Reviewed by" value={reviewedBy} onChange={(e) => setReviewedBy(e.target.value)} />
      <div className="sm:col-span-2">
        <TextAreaField
          label="What was read, and what is missing"
          value={notes}
          maxLength={2000}
          onChange={(e) => setNotes(e.target.value)}
        />
      </div>
      <p className="text-sm text-ink-soft sm:col-span-2">
        A review says the library&apos;s rules for {entry.name} are complete and current. Verdicts on routes through it
        can then be “Clear to travel”.
      </p>
      <div className="flex flex-wrap gap-2 sm:col-span-2">
        <Button type="submit" busy={save.isPending}>
          Record the review
        </Button>
        {entry.reviewedOn ? (
          <Button
            type="button"
            variant="danger"
            onClick={() => save.mutate({ reviewedOn: null, reviewedBy: null, notes }, { onSuccess: onDone })}
          >
            Withdraw the review
          </Button>
        ) : null}
        <Button type="button" variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}

function CoverageRow({ entry, reviewer }: { entry: JurisdictionCoverageDto; reviewer: string }) {
  const [editing, setEditing] = useState(false);
  return (
    <li className="flex flex-col gap-1 py-3 text-sm" aria-label={entry.name}>
      <div className="flex flex-wrap items-center gap-2">
        <span className="font-semibold">
          {entry.name} ({entry.jurisdiction})
        </span>
        <Tag tone={entry.covered ? "ok" : "caution"}>
          {entry.covered && entry.reviewedOn ? `Reviewed ${formatDate(entry.reviewedOn)}` : "Not reviewed"}
        </Tag>
        {entry.rules.demo > 0 ? <Tag tone="neutral">{`${entry.rules.demo} demo rule(s)`}</Tag> : null}
        <span className="text-ink-soft">
          {entry.rules.published} published rule{entry.rules.published === 1 ? "" : "s"} in the library
        </span>
        {editing ? null : (
          <Button variant="secondary" onClick={() => setEditing(true)}>
            {entry.reviewedOn ? "Change the review" : "Record a review"}
          </Button>
        )}
      </div>
      {entry.reviewedOn ? (
        <p>
          Reviewed by {entry.reviewedBy} on {formatDate(entry.reviewedOn)}
          {entry.updatedBy ? `, recorded by ${entry.updatedBy.displayName} ${formatInstant(entry.updatedAt)}` : ""}.
        </p>
      ) : null}
      <Office label="Wildlife agency" office={entry.wildlifeAgency} />
      <Office label="State veterinarian" office={entry.stateVeterinarian} />
      {entry.notes ? <p>{entry.notes}</p> : null}
      <p className="text-xs text-ink-soft">Offices as read: {entry.source}</p>
      {editing ? <ReviewForm entry={entry} reviewer={reviewer} onDone={() => setEditing(false)} /> : null}
    </li>
  );
}

/**
 * Coverage of the rule library by jurisdiction, for admins: which were reviewed (when, by whom),
 * the agencies to confirm with, and the form to record a review.
 */
export function CoverageAdmin({ reviewer }: { reviewer: string }) {
  const coverage = useCoverage();
  if (coverage.isPending) return <Loading label="Loading the coverage…" />;
  if (coverage.error)
    return (
      <Notice tone="block" role="alert">
        {(coverage.error as Error).message}
      </Notice>
    );
  if (coverage.data.length === 0) return <EmptyState title="No coverage records">Run the reference seed.</EmptyState>;
  const reviewed = coverage.data.filter((entry) => entry.covered).length;
  return (
    <section aria-label="Coverage by jurisdiction" className="flex flex-col gap-3">
      <Notice tone={reviewed === coverage.data.length ? "ok" : "caution"} title="Coverage">
        {reviewed} of {coverage.data.length} jurisdictions reviewed. A transfer through a jurisdiction that is not
        reviewed is “Unverified”, never “Clear to travel”; demo rules never count as a review.
      </Notice>
      <ul className="flex flex-col divide-y divide-rule rounded-card border border-rule bg-paper px-4">
        {coverage.data.map((entry) => (
          <CoverageRow key={entry.jurisdiction} entry={entry} reviewer={reviewer} />
        ))}
      </ul>
    </section>
  );
}
