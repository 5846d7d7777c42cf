import type { RegisterEventDto } from "@shared/schemas/register";
import { formatDate, formatInstant } from "@shared/dates";
import { ACQUISITION_WAY_WORDS, REGISTER_EVENT_KIND_WORDS } from "@shared/words";
import { formatWeight } from "@shared/units";
import { useUnitSystem } from "@/lib/units-preference";

/** An entry's life in order; a corrected event stays, struck through, with what replaced it. */
export function Timeline({ events, onCorrect }: { events: RegisterEventDto[]; onCorrect?: (eventId: string) => void }) {
  const [system] = useUnitSystem();
  return (
    <ol className="flex flex-col gap-3 border-l-2 border-rule pl-4">
      {events.map((event) => {
        const replaced = event.replacedById !== null;
        const party = event.counterparty;
        return (
          <li key={event.id} className={replaced ? "text-ink-soft" : ""}>
            <p className="font-semibold">
              <span className={replaced ? "line-through" : ""}>
                {formatDate(event.on)}: {REGISTER_EVENT_KIND_WORDS[event.kind]}
                {event.count ? ` (${event.count})` : ""}
              </span>
              {replaced ? <span className="ml-2 text-sm font-normal">corrected later</span> : null}
              {event.correctsEventId ? <span className="ml-2 text-sm font-normal">a correction</span> : null}
            </p>
            <p className="text-sm">
              {[
                event.acquiredHow ? ACQUISITION_WAY_WORDS[event.acquiredHow] : null,
                party
                  ? [party.name, party.address, party.permitNumber && `permit ${party.permitNumber}`]
                      .filter(Boolean)
                      .join(", ")
                  : null,
                event.cause ? `Cause: ${event.cause}` : null,
                event.weightG != null ? `Weight ${formatWeight(event.weightG, system)}` : null,
                event.note,
              ]
                .filter(Boolean)
                .join(" · ")}
            </p>
            <p className="text-xs text-ink-soft">
              Recorded by {event.recordedBy}, {formatInstant(event.recordedAt)}
              {onCorrect && !replaced && event.kind !== "voided" ? (
                <button type="button" className="ml-2 min-h-11 text-fern underline" onClick={() => onCorrect(event.id)}>
                  Correct this
                </button>
              ) : null}
            </p>
          </li>
        );
      })}
    </ol>
  );
}
