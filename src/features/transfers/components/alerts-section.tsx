import { useState } from "react";
import type { AlertDto, TransferDto } from "@shared/schemas/transfer";
import { ALERT_KIND_WORDS } from "@shared/words";
import { formatInstant } from "@shared/dates";
import { Button } from "@/components/ui/button";
import { TextAreaField } from "@/components/ui/field";
import { ApiError } from "@/lib/api-client";
import { useAcknowledgeAlert } from "../api/acknowledge-alert";

/** One alert: what happened in words, and who acknowledged it with what note (it never goes away). */
function AlertItem({ transfer, alert }: { transfer: TransferDto; alert: AlertDto }) {
  const acknowledge = useAcknowledgeAlert(transfer.id);
  const [note, setNote] = useState("");
  const [open, setOpen] = useState(false);
  const unacknowledged = alert.acknowledgedAt === null;
  return (
    <li
      className={`rounded-card border border-l-4 px-4 py-3 ${
        unacknowledged ? "border-brick-line border-l-brick bg-brick-bg" : "border-rule border-l-ink-soft bg-paper"
      }`}
    >
      <p className="font-semibold">
        {ALERT_KIND_WORDS[alert.kind]}
        <span className="font-normal text-ink-soft"> · {formatInstant(alert.at, transfer.origin.timeZone)}</span>
      </p>
      <p className="mt-1 text-sm">{alert.message}</p>
      {alert.acknowledgedAt ? (
        <p className="mt-2 text-sm text-ink-soft">
          Acknowledged by {alert.acknowledgedBy?.displayName ?? "someone"} on{" "}
          {formatInstant(alert.acknowledgedAt, transfer.origin.timeZone)}: “{alert.acknowledgementNote}”
        </p>
      ) : transfer.abilities.acknowledgeAlerts ? (
        open ? (
          <form
            className="mt-3 grid gap-2"
            onSubmit={(e) => {
              e.preventDefault();
              if (note.trim()) acknowledge.mutate({ alertId: alert.id, note: note.trim() });
            }}
          >
            <TextAreaField
              label="What did you do about it?"
              hint="Your note stays on the record with the alert; the other party sees it."
              value={note}
              maxLength={1000}
              onChange={(e) => {
                setNote(e.target.value);
                // A refusal about the old note goes as soon as the note changes.
                if (acknowledge.error) acknowledge.reset();
              }}
              error={acknowledge.error instanceof ApiError ? acknowledge.error.message : undefined}
            />
            <div className="flex flex-wrap gap-2">
              <Button type="submit" busy={acknowledge.isPending} disabled={!note.trim()}>
                Acknowledge
              </Button>
              <Button type="button" variant="secondary" onClick={() => setOpen(false)}>
                Not now
              </Button>
            </div>
          </form>
        ) : (
          <div className="mt-2">
            <Button type="button" variant="secondary" onClick={() => setOpen(true)}>
              Acknowledge with a note
            </Button>
          </div>
        )
      ) : (
        <p className="mt-2 text-sm text-ink-soft">Not acknowledged yet.</p>
      )}
    </li>
  );
}

/**
 * Alerts raised on the transfer (a seal that does not match, a count that differs …), open ones
 * first. Shown above everything else: a keeper must not miss them.
 */
export function AlertsSection({ transfer }: { transfer: TransferDto }) {
  if (transfer.alerts.length === 0) return null;
  const open = transfer.alerts.filter((a) => a.acknowledgedAt === null);
  const done = transfer.alerts.filter((a) => a.acknowledgedAt !== null);
  return (
    <section id="alerts" aria-labelledby="alerts-heading" className="scroll-mt-4">
      <h2 id="alerts-heading" className="mb-2 text-lg font-semibold">
        {open.length > 0
          ? `${open.length} ${open.length === 1 ? "alert needs" : "alerts need"} your attention`
          : "Alerts (all acknowledged)"}
      </h2>
      {/* The live region wraps the list: role="alert" on the list itself would take its list semantics away. */}
      <div role={open.length > 0 ? "alert" : undefined}>
        <ul className="grid gap-2">
          {[...open, ...done].map((a) => (
            <AlertItem key={a.id} transfer={transfer} alert={a} />
          ))}
        </ul>
      </div>
    </section>
  );
}
