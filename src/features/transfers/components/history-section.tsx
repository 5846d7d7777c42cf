import { describeChange } from "@shared/words";
import type { TransferDto } from "@shared/schemas/transfer";
import { Loading, Notice } from "@/components/ui/feedback";
import { formatInstant } from "@shared/dates";
import { useUnitSystem } from "@/lib/units-preference";
import { useChanges } from "../api/changes";
import { Section } from "./section";

/** A long note stays readable in a table cell. */
const short = (text: string) => (text.length > 160 ? `${text.slice(0, 157)}…` : text);

/** Every edit: who, when, and the old and new value. */
export function HistorySection({ transfer: t }: { transfer: TransferDto }) {
  const changes = useChanges(t.id);
  const [system] = useUnitSystem();
  return (
    <Section id="history" title="Change history">
      {changes.isPending ? (
        <Loading label="Loading the history…" />
      ) : changes.error ? (
        <Notice tone="block" role="alert">
          {(changes.error as Error).message}
        </Notice>
      ) : changes.data.length === 0 ? (
        <p className="text-ink-soft">No edits since the transfer was created.</p>
      ) : (
        <div className="relative overflow-x-auto">
          <table className="w-full border-collapse text-left text-sm">
            <caption className="sr-only">Edits to this transfer</caption>
            <thead className="text-xs uppercase tracking-wide text-ink-soft">
              <tr>
                <th scope="col" className="px-2 py-2">
                  When
                </th>
                <th scope="col" className="px-2 py-2">
                  Who
                </th>
                <th scope="col" className="px-2 py-2">
                  What
                </th>
                <th scope="col" className="px-2 py-2">
                  Was
                </th>
                <th scope="col" className="px-2 py-2">
                  Now
                </th>
              </tr>
            </thead>
            <tbody className="divide-y divide-rule">
              {changes.data.map((c, i) => {
                const change = describeChange(c, system);
                return (
                  <tr key={`${c.at}-${c.field}-${i}`}>
                    <td className="whitespace-nowrap px-2 py-2 align-top">{formatInstant(c.at)}</td>
                    <td className="px-2 py-2 align-top">{c.actor.displayName}</td>
                    <td className="px-2 py-2 align-top">{change.what}</td>
                    <td className="break-words px-2 py-2 align-top text-ink-soft line-through decoration-brick/50">
                      {short(change.was)}
                    </td>
                    <td className="break-words px-2 py-2 align-top">{short(change.now)}</td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      )}
    </Section>
  );
}
