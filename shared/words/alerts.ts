import type { AlertKind } from "../constants";

/** An alert's kind as its heading says it, on the page and in the e-mail's subject. */
export const ALERT_KIND_WORDS: Readonly<Record<AlertKind, string>> = {
  seal_mismatch: "Seal number does not match",
  seal_broken: "Seal broken or missing",
  count_mismatch: "Box count differs",
  early_pickup: "Pickup long before the planned departure",
  implausible_speed: "Handoff too far from the last one for the time between",
  unexpected_party: "Handed to someone not assigned",
  temperature_out_of_range: "Box temperature outside the safe range",
};
