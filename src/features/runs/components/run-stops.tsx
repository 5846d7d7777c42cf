import { useState } from "react";
import { Link } from "react-router";
import type { RunDto, RunPatch } from "@shared/schemas/run";
import { formatInstant } from "@shared/dates";
import { formatDistance } from "@shared/units";
import { RUN_STOP_KIND_WORDS } from "@shared/words";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { paths } from "@/config/paths";
import { useUnitSystem } from "@/lib/units-preference";
import { movedStops } from "./run-order";

/** A change waiting for the person's yes: what it does, in words, and the PATCH that does it. */
export type PendingChange = { question: string; patch: RunPatch };

const ARRIVALS_MOVE =
  "The stops after it are timed again. Where a drop-off moves by more than 2 hours, Hatchway e-mails the sender and the receiver of that transfer.";

/** The stops in order with their times and places; the manager moves them up or down or takes a transfer off. */
export function RunStops({
  run,
  busy,
  onChange,
  transferHref = paths.transfers.detail.href,
}: {
  run: RunDto;
  busy: boolean;
  onChange: (patch: RunPatch) => Promise<unknown>;
  /** Where a stop's transfer number leads: the courier's handoff page for a courier, the record otherwise. */
  transferHref?: (transferId: string) => string;
}) {
  const [system] = useUnitSystem();
  const [pending, setPending] = useState<PendingChange | null>(null);
  const ask = (question: string, patch: RunPatch) =>
    setPending({ question, patch: { ...patch, version: run.version } });
  return (
    <>
      <ol className="grid gap-3">
        {run.stops.map((stop, index) => {
          const up = movedStops(run.stops, index, -1);
          const down = movedStops(run.stops, index, 1);
          const what = `${RUN_STOP_KIND_WORDS[stop.kind].toLowerCase()} of ${stop.transferNumber}`;
          return (
            <li
              key={`${stop.kind}-${stop.transferId}`}
              className="grid gap-1 rounded-card border border-rule bg-paper-card p-3"
            >
              <p className="font-semibold">
                {index + 1}. {RUN_STOP_KIND_WORDS[stop.kind]}{" "}
                <Link to={transferHref(stop.transferId)} className="text-fern underline">
                  {stop.transferNumber}
                </Link>
                {` · ${stop.boxCount} ${stop.boxCount === 1 ? "box" : "boxes"}`}
              </p>
              <p className="text-sm">
                {stop.place.street}, {stop.place.city}, {stop.place.state} {stop.place.zip}
              </p>
              <p className="text-sm text-ink-soft">
                Arrive {formatInstant(stop.at, stop.place.timeZone)}, leave{" "}
                {formatInstant(stop.leaveAt, stop.place.timeZone)}
                {index > 0 ? ` · ${formatDistance(stop.legKm, system)} from the stop before` : ""}
              </p>
              <p className="text-sm text-ink-soft">
                {stop.party.organizationName}
                {stop.party.contactName ? `, ${stop.party.contactName}` : ""} · {stop.party.phone}
              </p>
              {run.abilities.edit ? (
                <div className="flex flex-wrap gap-2 pt-1">
                  <Button
                    variant="secondary"
                    disabled={!up || busy}
                    aria-label={`Move the ${what} up`}
                    onClick={() => up && ask(`Move the ${what} up?`, { stops: up })}
                  >
                    Move up
                  </Button>
                  <Button
                    variant="secondary"
                    disabled={!down || busy}
                    aria-label={`Move the ${what} down`}
                    onClick={() => down && ask(`Move the ${what} down?`, { stops: down })}
                  >
                    Move down
                  </Button>
                  <Button
                    variant="ghost"
                    disabled={busy}
                    aria-label={`Take ${stop.transferNumber} off the run`}
                    onClick={() =>
                      ask(`Take ${stop.transferNumber} off the run?`, { removeTransferIds: [stop.transferId] })
                    }
                  >
                    Take off the run
                  </Button>
                </div>
              ) : null}
            </li>
          );
        })}
      </ol>
      <ConfirmDialog
        open={pending !== null}
        title={pending?.question ?? ""}
        confirmLabel="Change the run"
        busy={busy}
        onCancel={() => setPending(null)}
        onConfirm={() => {
          if (pending) void onChange(pending.patch).finally(() => setPending(null));
        }}
      >
        <p>{ARRIVALS_MOVE}</p>
      </ConfirmDialog>
    </>
  );
}
