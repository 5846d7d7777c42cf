import { changeSentence } from "@shared/words";
import type { TransferDto } from "@shared/schemas/transfer";
import { Loading, Notice } from "@/components/ui/feedback";
import { formatInstant } from "@shared/dates";
import { useUnitSystem } from "@/lib/units-preference";
import { useChanges } from "../api/changes";
import { Section } from "./section";

/** A long note stays readable in the list. */
const short = (text: string) => (text.length > 240 ? `${text.slice(0, 237)}…` : text);

/** Every edit as a sentence in the reader's units: "Box Turtles D: seal SEAL-0004 → SEAL-0044", who and when. */
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
        <ol className="grid gap-2 text-sm" aria-label="Edits to this transfer, newest first">
          {changes.data.map((c, i) => (
            <li key={`${c.at}-${c.field}-${i}`} className="grid gap-0.5 border-b border-rule pb-2 last:border-b-0">
              <span className="wrap-break-word">{short(changeSentence(c, system))}</span>
              <span className="text-xs text-ink-soft">
                {c.actor.displayName} · {formatInstant(c.at)}
              </span>
            </li>
          ))}
        </ol>
      )}
    </Section>
  );
}
