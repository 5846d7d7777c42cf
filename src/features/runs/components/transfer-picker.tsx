import { useId } from "react";
import type { TransferSummaryDto } from "@shared/schemas/transfer";
import { formatInstant } from "@shared/dates";
import { Loading, Notice } from "@/components/ui/feedback";
import { useTransfers } from "@/lib/transfer-queries";

/** Transfers a run can carry: sent, not yet picked up, by road (the API says the same). */
export function plannable(transfer: TransferSummaryDto): boolean {
  return (transfer.status === "awaiting_receiver" || transfer.status === "ready") && transfer.mode !== "overnight_air";
}

/** Check boxes of the service's transfers a run can carry, less those in `exclude`. */
export function TransferPicker({
  legend,
  chosen,
  onChange,
  exclude = [],
  error,
}: {
  legend: string;
  chosen: readonly string[];
  onChange: (ids: string[]) => void;
  exclude?: readonly string[];
  error?: string;
}) {
  const errorId = useId();
  const list = useTransfers({ sort: "departure", dir: "asc", limit: 100 });
  const rows = (list.data?.pages.flatMap((p) => p.transfers) ?? []).filter(
    (t) => plannable(t) && !exclude.includes(t.id),
  );
  const toggle = (id: string, on: boolean) => onChange(on ? [...chosen, id] : chosen.filter((x) => x !== id));
  return (
    <fieldset className="grid gap-2" aria-describedby={error ? errorId : undefined}>
      <legend className="text-sm font-semibold">{legend}</legend>
      {list.isPending ? (
        <Loading label="Loading your service's transfers…" />
      ) : list.error ? (
        <Notice tone="block" role="alert">
          {(list.error as Error).message}
        </Notice>
      ) : rows.length === 0 ? (
        <p className="text-sm text-ink-soft">
          No transfer waits for a run: a run carries transfers sent to your service, by road, not yet picked up.
        </p>
      ) : (
        <ul className="grid gap-2">
          {rows.map((t) => (
            <li key={t.id}>
              <label className="flex min-h-11 items-start gap-3 rounded-md border border-rule bg-paper-card p-3">
                <input
                  type="checkbox"
                  className="mt-1 h-5 w-5 shrink-0 accent-fern"
                  checked={chosen.includes(t.id)}
                  onChange={(event) => toggle(t.id, event.target.checked)}
                />
                <span className="text-sm">
                  <strong>{t.number}</strong>: {t.origin.city}, {t.origin.state} → {t.destination.city},{" "}
                  {t.destination.state}
                  <span className="block text-ink-soft">
                    {t.sender.name} to {t.receiver.name}; planned to leave{" "}
                    {formatInstant(t.plannedDepartureAt, t.origin.timeZone)}
                  </span>
                </span>
              </label>
            </li>
          ))}
        </ul>
      )}
      {error ? (
        <p id={errorId} role="alert" className="text-sm font-medium text-brick">
          {error}
        </p>
      ) : null}
    </fieldset>
  );
}
