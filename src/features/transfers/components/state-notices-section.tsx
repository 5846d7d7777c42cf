import { useState } from "react";
import type { TransferDto } from "@shared/schemas/transfer";
import type { StateNoticeDto } from "@shared/schemas/register";
import { formatInstant } from "@shared/dates";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/feedback";
import { TextField } from "@/components/ui/field";
import { useMarkStateNoticeDone, useStateNotices } from "../api/state-notices";
import { Section } from "./section";

/** The keeper's own record that a notice went to the agency: the reference it gave and a note. Kept as written. */
function MarkDoneForm({ transferId, notice }: { transferId: string; notice: StateNoticeDto }) {
  const mark = useMarkStateNoticeDone(transferId);
  const [reference, setReference] = useState("");
  const [note, setNote] = useState("");
  return (
    <form
      className="mt-3 grid gap-3 sm:grid-cols-2"
      aria-label={`Mark done: ${notice.duty}`}
      onSubmit={(e) => {
        e.preventDefault();
        mark.mutate({ key: notice.key, reference: reference || null, note: note || null });
      }}
    >
      <TextField
        label="Reference number (optional)"
        value={reference}
        onChange={(e) => setReference(e.target.value)}
        hint="What the agency gave you back, if anything"
      />
      <TextField label="Note (optional)" value={note} onChange={(e) => setNote(e.target.value)} />
      {mark.error ? (
        <div className="sm:col-span-2">
          <Notice tone="block" role="alert">
            {mark.error.message}
          </Notice>
        </div>
      ) : null}
      <div className="sm:col-span-2">
        <Button type="submit" variant="secondary" busy={mark.isPending}>
          Mark as done
        </Button>
        <p className="mt-1 text-sm text-ink-soft">A mark is kept as written; it cannot be taken back.</p>
      </div>
    </form>
  );
}

/** Dated to-dos from state rules after arrival (Texas 31 TAC 65.327, Maryland COMAR 15.11.01.09), with their citations. */
export function StateNoticesSection({ transfer: t }: { transfer: TransferDto }) {
  const arrived = t.status === "checked_in" || t.status === "closed";
  const party = t.viewerRole === "sender" || t.viewerRole === "receiver";
  const notices = useStateNotices(t.id, arrived && party);
  if (!arrived || !notices.data?.notices.length) return null;
  return (
    <Section id="state-notices" title="Notices the states ask for">
      <ul className="grid gap-2">
        {notices.data.notices.map((notice) => (
          <li key={notice.key}>
            {notice.done ? (
              <Notice tone="info" title={`Done: ${notice.duty}`}>
                Marked done by {notice.done.byName} on {formatInstant(notice.done.at)} (due by{" "}
                {formatInstant(notice.dueAt)}, {notice.citation})
                {notice.done.reference ? `. Reference ${notice.done.reference}` : ""}
                {notice.done.note ? `. ${notice.done.note}` : ""}.
              </Notice>
            ) : (
              <Notice tone="caution" title={`${notice.duty} by ${formatInstant(notice.dueAt)}`}>
                Within {notice.withinHours} hours ({notice.citation})
                {notice.appliesTo ? `; applies to ${notice.appliesTo}` : ""}. Confirm with the state wildlife agency
                what it needs and how to send it.
                <MarkDoneForm transferId={t.id} notice={notice} />
              </Notice>
            )}
          </li>
        ))}
      </ul>
    </Section>
  );
}
