import { ROUTE_ROLE_WORDS, UNCOVERED_REASON_WORDS } from "@shared/words";
import type { CoverageEntry } from "@shared/compliance/coverage";
import { formatDate } from "@shared/dates";
import { Tag } from "./tag";

/**
 * Every jurisdiction on the route, in travel order: whether the library's rules for it were
 * reviewed (and when), and the wildlife agency and state veterinarian to confirm with.
 */
export function CoverageList({
  coverage,
  transitFrom = "line",
}: {
  coverage: readonly CoverageEntry[];
  /** "line": the server laid the route out (a stored transfer); "listed": the user named the states. */
  transitFrom?: "line" | "listed";
}) {
  const transit = coverage.some((entry) => entry.role === "transit");
  return (
    <div className="flex flex-col gap-2">
      <h3 className="font-semibold">Whose rules apply on this route</h3>
      <ul className="flex flex-col divide-y divide-rule rounded-card border border-rule bg-paper px-4">
        {coverage.map((entry) => (
          <li key={entry.jurisdiction} className="flex flex-col gap-1 py-3 text-sm">
            <div className="flex flex-wrap items-center gap-2">
              <span className="font-semibold">{entry.name}</span>
              <span className="text-ink-soft">{ROUTE_ROLE_WORDS[entry.role]}</span>
              <Tag tone={entry.covered ? "ok" : "caution"}>
                {entry.covered && entry.reviewedOn ? `Rules reviewed ${formatDate(entry.reviewedOn)}` : "Unverified"}
              </Tag>
            </div>
            {entry.uncoveredBecause ? <p>{UNCOVERED_REASON_WORDS[entry.uncoveredBecause]}</p> : null}
            <p className="text-ink-soft">
              Confirm with{" "}
              {entry.agency.url ? (
                <a
                  href={entry.agency.url}
                  target="_blank"
                  rel="noopener noreferrer"
                  className="text-fern underline underline-offset-2"
                >
                  {entry.agency.name}
                </a>
              ) : (
                entry.agency.name
              )}
              {entry.veterinarian ? (
                <>
                  {" "}
                  and{" "}
                  <a
                    href={entry.veterinarian.url}
                    target="_blank"
                    rel="noopener noreferrer"
                    className="text-fern underline underline-offset-2"
                  >
                    {entry.veterinarian.name}
                  </a>
                </>
              ) : null}
              .
            </p>
          </li>
        ))}
      </ul>
      <p className="text-xs text-ink-soft">
        {transitFrom === "listed"
          ? "States passed through are the ones you listed."
          : transit
            ? "States passed through are those a straight line from the origin to the destination crosses; the roads your courier takes may cross others."
            : "No state on the way is named: by air the box flies over them."}
      </p>
    </div>
  );
}
