/**
 * When a handoff was confirmed on the phone, against when it reached the server (issue 16, §3). The
 * server's time stays the entry's time (an audit trail is computer-generated and time-stamped:
 * 21 CFR 11.10(e)); the phone's is kept beside it as the person's statement. Our own limits: a
 * phone clock up to 10 minutes fast is tolerated, and a handoff kept on a phone longer than 14 days
 * is not taken on its word.
 */
export const PHONE_CLOCK_AHEAD_MAX_MIN = 10;
export const KEPT_ON_PHONE_MAX_DAYS = 14;
/** Below this the handoff simply went at once; from it on the record says it waited on the phone. */
export const SENT_LATE_MIN = 2;

const MS_PER_MIN = 60_000;

export type PhoneConfirmation = { ok: true; confirmedAt: string; waitedMin: number } | { ok: false; message: string };

/** Checks the phone's confirmation time against the server's clock when it arrived. */
export function phoneConfirmation(confirmedAt: string, serverMs: number): PhoneConfirmation {
  const phoneMs = Date.parse(confirmedAt);
  if (Number.isNaN(phoneMs)) return { ok: false, message: "give the time the handoff was confirmed" };
  const waitedMin = (serverMs - phoneMs) / MS_PER_MIN;
  if (waitedMin < -PHONE_CLOCK_AHEAD_MAX_MIN)
    return {
      ok: false,
      message: `the phone's clock is more than ${PHONE_CLOCK_AHEAD_MAX_MIN} minutes ahead of Hatchway's: set the phone's time and confirm again`,
    };
  if (waitedMin > KEPT_ON_PHONE_MAX_DAYS * 24 * 60)
    return {
      ok: false,
      message: `it was confirmed more than ${KEPT_ON_PHONE_MAX_DAYS} days ago on the phone: record the handoff again with today's facts`,
    };
  return { ok: true, confirmedAt: new Date(phoneMs).toISOString(), waitedMin: Math.max(0, Math.round(waitedMin)) };
}
