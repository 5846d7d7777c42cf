import type { PackKind } from "../constants";
import { PACK_IN_SENTENCE } from "../words/packing";
import type { AdviceBandsF } from "./profiles";

/** What the guideline says for one ambient temperature. */
export type AmbientBand = "do_not_ship_cold" | "heat_pack" | "none" | "cold_pack" | "hold" | "do_not_ship_hot";

/** Verdict vocabulary of the temperature check. "forecast_unavailable" is never a kind of "ship". */
export const VERDICTS = ["ship", "pack", "hold", "do_not_ship", "forecast_unavailable"] as const;
export type Verdict = (typeof VERDICTS)[number];

export const ADVICE_CODES = [
  "ship_as_planned",
  "add_heat_pack",
  "add_cold_pack",
  "remove_pack",
  "hold_at_staffed_facility",
  "postpone",
  "retry_when_forecast_available",
] as const;
export type AdviceCode = (typeof ADVICE_CODES)[number];

/** The advice and the pack it refers to (the one to use, or null when the box should not go). */
export type Advice = { code: AdviceCode; pack: PackKind | null; message: string };

/** Guideline band of an ambient temperature in °F (SOURCES.md temperature table). */
export function classifyAmbientF(tempF: number, bands: AdviceBandsF): AmbientBand {
  if (tempF < bands.doNotShipBelow) return "do_not_ship_cold";
  if (tempF < bands.heatPackBelow) return "heat_pack";
  if (tempF > bands.doNotShipAbove) return "do_not_ship_hot";
  if (tempF >= bands.holdFrom) return "hold";
  if (bands.coldPackFrom !== null && tempF >= bands.coldPackFrom) return "cold_pack";
  return "none";
}

/** What the guideline calls for on a route: a gate that stops shipping as is, or the pack to use. */
export type GuidelineCall =
  { gate: "do_not_ship" } | { gate: "hold" } | { gate: "pack"; pack: "heat" | "cold" | "none" | "either" };

/**
 * Combines the bands of the coldest and the hottest daytime high on the route: a do-not-ship
 * band anywhere wins, then a hold band; a heat pack for the cold end and a cold pack for the hot
 * end at once is left to the box model ("either").
 */
export function guidelineCall(coldestHighF: number, hottestHighF: number, bands: AdviceBandsF): GuidelineCall {
  const found = new Set([classifyAmbientF(coldestHighF, bands), classifyAmbientF(hottestHighF, bands)]);
  if (found.has("do_not_ship_cold") || found.has("do_not_ship_hot")) return { gate: "do_not_ship" };
  if (found.has("hold")) return { gate: "hold" };
  const heat = found.has("heat_pack");
  const cold = found.has("cold_pack");
  return { gate: "pack", pack: heat && cold ? "either" : heat ? "heat" : cold ? "cold" : "none" };
}

const VERDICT_OF: Readonly<Record<AdviceCode, Verdict>> = {
  ship_as_planned: "ship",
  add_heat_pack: "pack",
  add_cold_pack: "pack",
  remove_pack: "pack",
  hold_at_staffed_facility: "hold",
  postpone: "do_not_ship",
  retry_when_forecast_available: "forecast_unavailable",
};

/** The verdict an advice code belongs to. */
export function verdictOf(code: AdviceCode): Verdict {
  return VERDICT_OF[code];
}

/** One sentence for people: the advice and, where it matters, the pack. */
export function adviceMessage(code: AdviceCode, pack: PackKind | null): string {
  const packName = pack ? PACK_IN_SENTENCE[pack] : "";
  switch (code) {
    case "ship_as_planned":
      return `Ship as planned (${packName}): the box is expected to stay in the safe range.`;
    case "add_heat_pack":
      return `Add ${packName}, kept away from the animals' containers.`;
    case "add_cold_pack":
      return "Add a cold pack, wrapped and kept away from the animals' containers.";
    case "remove_pack":
      return "Ship without the pack: the box is expected to stay in the safe range without it, and a pack it does not need can overheat or chill it.";
    case "hold_at_staffed_facility":
      return "Ship only for pickup at a staffed, climate-controlled facility; never to a doorstep.";
    case "postpone":
      return "Postpone: no packing keeps the box in the safe range on this date.";
    case "retry_when_forecast_available":
      return "Forecast unavailable: the temperature check cannot say the box is safe. Try again later.";
  }
}
