/** Words of a courier's run (issue 16), said the same on the screen, the sheet and in the API. */
import type { RunRest, RunStopKind } from "../schemas/run";

/** Why the rests are guidance, not a duty Hatchway enforces. */
export const RUN_GUIDANCE =
  "Rests are planning guidance after the federal hours-of-service limits for property carriers (49 CFR 395.3: no driving after 11 hours of driving or past the 14th hour on duty until 10 hours off; a 30-minute break after 8 hours of driving). The rule binds vehicles over 10,000 lb (49 CFR 390.5); the driver keeps their own log and decides when to stop. Times are estimates from straight-line distance × 1.2 at an average 55 mph.";

export const RUN_STOP_KIND_WORDS: Readonly<Record<RunStopKind, string>> = {
  pickup: "Pick up",
  dropoff: "Drop off",
};

export const RUN_REST_WORDS: Readonly<Record<RunRest["reason"], string>> = {
  driving_8h: "30-minute break: 8 hours of driving since the last break",
  driving_11h: "10 hours off duty: 11 hours of driving reached",
  window_14h: "10 hours off duty: the 14-hour window since coming on duty closed",
};
