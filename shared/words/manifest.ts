import type { Verdict as ComplianceVerdict } from "../compliance/schemas";
import type { Verdict as TemperatureVerdict } from "../temperature/advice";

/**
 * The compliance verdict as the manifest and labels print it: what stops a reader is in capitals,
 * and nothing reads as clear that was not checked.
 */
export const COMPLIANCE_VERDICT_PRINTED: Readonly<Record<ComplianceVerdict, string>> = {
  clear: "Rules checked: clear to travel",
  unverified: "UNVERIFIED",
  needs_documents: "DO NOT SHIP: documents needed",
  blocked: "DO NOT SHIP",
};

/** The temperature verdict as the manifest and labels print it. */
export const TEMPERATURE_VERDICT_PRINTED: Readonly<Record<TemperatureVerdict, string>> = {
  ship: "Forecast checked: fine to ship",
  pack: "Forecast checked: ship with the packing advised",
  hold: "Ship only to a staffed facility",
  do_not_ship: "DO NOT SHIP",
  forecast_unavailable: "NOT CHECKED: forecast unavailable",
};

/** The compliance verdict in a word or two, for a box label. */
export const COMPLIANCE_VERDICT_ON_LABEL: Readonly<Record<ComplianceVerdict, string>> = {
  clear: "clear",
  unverified: "UNVERIFIED",
  needs_documents: "DO NOT SHIP",
  blocked: "DO NOT SHIP",
};

/** The temperature verdict in a word or two, for a box label. */
export const TEMPERATURE_VERDICT_ON_LABEL: Readonly<Record<TemperatureVerdict, string>> = {
  ship: "fine",
  pack: "pack as advised",
  hold: "staffed facility only",
  do_not_ship: "DO NOT SHIP",
  forecast_unavailable: "NOT CHECKED",
};

/** What each check is called on paper. */
export const MANIFEST_CHECK_WORDS: Readonly<Record<"compliance" | "temperature", string>> = {
  compliance: "Rules and permits",
  temperature: "Temperature on the way",
};

/** What each check is called on a box label, where room is short. */
export const LABEL_CHECK_WORDS: Readonly<Record<"compliance" | "temperature", string>> = {
  compliance: "Rules",
  temperature: "Temperature",
};
