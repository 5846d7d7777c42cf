import type { Verdict } from "./advice";
import type { CheckMark } from "./report";

/** Verdicts in plain words, for screens and e-mail. */
export const VERDICT_WORDS: Readonly<Record<Verdict, string>> = {
  ship: "Fine to ship",
  pack: "Ship with the packing advised",
  hold: "Ship only to a staffed facility",
  do_not_ship: "Do not ship",
  forecast_unavailable: "Forecast unavailable",
};

/** When a stored check was made, in plain words. */
export const CHECK_MARK_WORDS: Readonly<Record<CheckMark, string>> = {
  "24h": "24 hours before departure",
  "4h": "4 hours before departure",
  manual: "on request",
  gate: "when the transfer was cleared to ship",
};
