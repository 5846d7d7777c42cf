/**
 * A handoff confirmed on a phone without signal, kept on the phone until Hatchway has it
 * (DEVELOPERS.md D40): where it stands, in the courier's words.
 */
import type { OfflineHandoffState } from "../constants";

export const OFFLINE_HANDOFF_STATE_WORDS: Record<OfflineHandoffState, string> = {
  waiting: "Saved on this phone, not yet sent",
  refused: "Refused by Hatchway: not recorded",
};

/** Longer sentences about a kept handoff (not an enum's words). */
export const OFFLINE_HANDOFF_TEXT = {
  waitingDetail:
    "It goes by itself when the phone has signal again, with its photos, and counts once however often it is tried. Closing the page or restarting the phone does not lose it.",
  refusedDetail:
    "Hatchway answered that it cannot record this handoff. Read why below; it stays on this phone until you discard it.",
  sent: "sent: it is on the record now.",
  signOutQuestion: "Sign out with handoffs not yet sent?",
  signOutDetail:
    "Handoffs saved on this phone that are not yet sent are removed when you sign out, so the next person on this phone cannot read them. Wait for signal to send them first, or sign out anyway.",
} as const;
