/**
 * Notices a state asks for after animals move (issue 15 §3), encoded as rules with their
 * citations. Only rules read in a stored copy are here (SOURCES.md, "Records and reports"); the
 * screens tell keepers to confirm with the state wildlife agency.
 */
export type NoticeSide = "sender" | "receiver";

export type StateNoticeRule = {
  key: string;
  /** Two-letter state whose rule it is. */
  state: string;
  /** Whose duty it is: the party in that state sending out of it, or receiving from outside it. */
  side: NoticeSide;
  /** Hours after the moment that starts it (the shipment leaving, the animals arriving). */
  withinHours: number;
  citation: string;
  /** What to do, in words. */
  duty: string;
  /** Who the rule binds, when not every keeper. */
  appliesTo: string | null;
};

export const STATE_NOTICE_RULES: readonly StateNoticeRule[] = [
  {
    key: "tx-out-of-state-receipt",
    state: "TX",
    side: "receiver",
    withinHours: 24,
    citation: "31 TAC 65.327",
    duty: "Notify Texas Parks and Wildlife of this out-of-state receipt",
    appliesTo: "Texas nongame dealer permit holders",
  },
  {
    key: "tx-out-of-state-shipment",
    state: "TX",
    side: "sender",
    withinHours: 24,
    citation: "31 TAC 65.327",
    duty: "Notify Texas Parks and Wildlife of this out-of-state shipment",
    appliesTo: "Texas nongame dealer permit holders",
  },
  {
    key: "md-import-report",
    state: "MD",
    side: "receiver",
    withinHours: 72,
    citation: "COMAR 15.11.01.09",
    duty: "Report the imported wild animals to the Maryland Department of Natural Resources",
    appliesTo: null,
  },
];

export type StateNoticeTodo = StateNoticeRule & { dueAt: string; startedAt: string };

/**
 * The notices a move between two states calls for, each due `withinHours` after it starts: the
 * receiver's from the arrival, the sender's from the departure (or the arrival when the departure
 * is not on record). Nothing within one state.
 */
export function noticesForMove(move: {
  fromState: string;
  toState: string;
  departedAt: string | null;
  arrivedAt: string;
}): StateNoticeTodo[] {
  if (move.fromState === move.toState) return [];
  return STATE_NOTICE_RULES.filter((rule) =>
    rule.side === "receiver" ? rule.state === move.toState : rule.state === move.fromState,
  ).map((rule) => {
    const startedAt = rule.side === "sender" ? (move.departedAt ?? move.arrivedAt) : move.arrivedAt;
    return { ...rule, startedAt, dueAt: new Date(Date.parse(startedAt) + rule.withinHours * 3_600_000).toISOString() };
  });
}
