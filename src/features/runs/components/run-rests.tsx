import type { RunDto } from "@shared/schemas/run";
import { formatTimeSpan } from "@shared/dates";
import { RUN_REST_WORDS } from "@shared/words";
import { Notice } from "@/components/ui/feedback";

/** The rests the plan puts on the road, as guidance: the hours-of-service rule binds only heavier vehicles. */
export function RunRests({ run }: { run: RunDto }) {
  return (
    <div className="grid gap-3">
      {run.rests.length === 0 ? (
        <p className="text-sm text-ink-soft">No rest is needed on this run by the hours-of-service limits.</p>
      ) : (
        <ul className="grid gap-2 text-sm">
          {run.rests.map((rest) => (
            <li key={rest.startAt} className="rounded-md border border-rule bg-paper-card p-3">
              <p className="font-semibold">{RUN_REST_WORDS[rest.reason]}</p>
              <p className="text-ink-soft">
                {formatTimeSpan(rest.startAt, rest.endAt, rest.timeZone)}
                {rest.near ? `, near ${rest.near}` : ""}, on the road after stop {rest.afterStop + 1}
              </p>
            </li>
          ))}
        </ul>
      )}
      <Notice tone="info" title="Planning guidance, not a rule Hatchway enforces">
        {run.guidance}
      </Notice>
    </div>
  );
}
