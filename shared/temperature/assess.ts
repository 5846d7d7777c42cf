import type { PackKind } from "../constants";
import { adviceMessage, guidelineCall, verdictOf, type AdviceCode, type GuidelineCall } from "./advice";
import { isPlausibleAmbientF, type AmbientByHour } from "./ambient";
import {
  PACK_SPECS,
  boxThermal,
  simulateInterior,
  type BoxSpec,
  type BoxThermal,
  type PackSpec,
  type SimulationResult,
} from "./box-model";
import { SAFER_DEPARTURE_SEARCH_DAYS } from "./limits";
import { GUIDELINE_SOURCE, type TemperatureProfile } from "./profiles";
import type { TransitAssessment } from "./schemas";
import { hasCalendarWarning, sameLocalTimeLater, type TransitTimeline } from "./timeline";
import { cToF, fToC, round1 } from "../units";

/** Packing-room temperature when the sender gives none, °F [practice]. */
export const DEFAULT_PACKED_AT_F = 72;

const S_PER_H = 3600;

/** How the search for a later departure gets its timelines and their outside temperatures. */
export type DepartureSearch = {
  timelineFor: (departMs: number) => TransitTimeline;
  ambientFor: (timeline: TransitTimeline) => AmbientByHour;
  days?: number;
};

export type AssessmentInput = {
  timeline: TransitTimeline;
  ambientByHour: AmbientByHour;
  box: BoxSpec;
  profile: TemperatureProfile;
  /** Whether `ambientByHour` is a forecast or a what-if's own values (for `sources`). */
  ambientSource?: "forecast" | "override";
  /** Temperature the box is packed at, °F; clamped into the profile's safe range. */
  packedAtF?: number;
  packs?: Readonly<Record<PackKind, PackSpec>>;
  /** Given, a hold or postpone verdict (or a weekend or holiday in transit) comes with the next safer departure. */
  search?: DepartureSearch;
};

/**
 * Temperature verdict for a trip: outside temperatures hour by hour, the modelled inside
 * temperature of the box as packed (°F), the hours it spends outside the profile's safe range,
 * and advice. The guideline bands gate the trip (do not ship, hold) and name the pack; the box
 * model checks that the pack keeps the interior in range and picks another when it does not.
 * A missing or implausible hourly value gives "forecast_unavailable", never a kind of "ship".
 */
export function assessTransit(input: AssessmentInput): TransitAssessment {
  const { timeline, profile } = input;
  const ambientF = timeline.points.map((p) => input.ambientByHour.get(p.at));
  const sources = sourcesFor(input);
  if (timeline.points.length === 0 || !ambientF.every(isPlausibleAmbientF))
    return unavailable(timeline, ambientF, sources);

  const runs = new PackRuns(input, ambientF);
  const planned = runs.get(input.box.pack);
  const call = guidelineCall(...routeHighsF(timeline, ambientF), profile.bandsF);
  const choice = chooseAdvice(call, input.box.pack, runs, timeline.durationH);
  const verdict = verdictOf(choice.code);
  const wantsSearch = verdict === "hold" || verdict === "do_not_ship" || hasCalendarWarning(timeline);
  return {
    verdict,
    advice: { ...choice, message: adviceMessage(choice.code, choice.pack) },
    ambientF: { min: round1(Math.min(...ambientF)), max: round1(Math.max(...ambientF)) },
    // Rounded outward: a box that dips 0.04 °F below the range must not read as inside it.
    insideF: { min: Math.floor(cToF(planned.minC) * 10) / 10, max: Math.ceil(cToF(planned.maxC) * 10) / 10 },
    hoursOutsideRange: Math.ceil((planned.secondsOutsideRange / S_PER_H) * 10) / 10,
    hours: timeline.points.map((p, i) => ({
      at: p.at,
      place: p.place,
      ambientF: round1(ambientF[i]!),
      insideF: round1(cToF(planned.insideC[i]!)),
    })),
    suggestedDeparture: wantsSearch && input.search ? findSaferDeparture({ ...input, search: input.search }) : null,
    sources,
  };
}

/**
 * The first departure in the coming days (same local clock time at the origin) whose verdict
 * is "ship" or "pack" and whose transit avoids weekends and federal holidays; departures that
 * only lack a day's margin are taken when nothing better exists. ISO UTC, or null.
 */
export function findSaferDeparture(input: AssessmentInput & { search: DepartureSearch }): string | null {
  const { search } = input;
  const days = search.days ?? SAFER_DEPARTURE_SEARCH_DAYS;
  let fallback: string | null = null;
  for (let day = 1; day <= days; day++) {
    const timeline = search.timelineFor(sameLocalTimeLater(input.timeline, day));
    if (hasCalendarWarning(timeline)) continue;
    const { verdict } = assessTransit({
      ...input,
      timeline,
      ambientByHour: search.ambientFor(timeline),
      search: undefined,
    });
    if (verdict !== "ship" && verdict !== "pack") continue;
    if (timeline.warnings.length === 0) return timeline.departAt;
    fallback ??= timeline.departAt;
  }
  return fallback;
}

/** Simulations of the box with each pack, run on demand and kept. */
class PackRuns {
  private readonly cache = new Map<PackKind, SimulationResult>();
  private readonly ambientC: number[];
  private readonly thermal: BoxThermal;

  constructor(
    private readonly input: AssessmentInput,
    ambientF: readonly number[],
  ) {
    this.ambientC = ambientF.map(fToC);
    this.thermal = boxThermal(input.box);
  }

  get(kind: PackKind): SimulationResult {
    let run = this.cache.get(kind);
    if (!run) {
      run = this.simulate(kind);
      this.cache.set(kind, run);
    }
    return run;
  }

  inRange(kind: PackKind): boolean {
    return this.get(kind).secondsOutsideRange === 0;
  }

  private simulate(kind: PackKind): SimulationResult {
    const { profile } = this.input;
    const safe = profile.safeTransitF;
    const packedAtF = Math.min(safe.max, Math.max(safe.min, this.input.packedAtF ?? DEFAULT_PACKED_AT_F));
    const hourly = this.ambientC;
    const last = hourly.length - 1;
    return simulateInterior({
      ...this.thermal,
      initialInsideC: fToC(packedAtF),
      ambientC: (elapsedS) => {
        const at = Math.min(last, elapsedS / S_PER_H);
        const i = Math.min(last, Math.floor(at));
        const next = hourly[Math.min(last, i + 1)]!;
        return hourly[i]! + (next - hourly[i]!) * (at - i);
      },
      durationS: last * S_PER_H,
      pack: (this.input.packs ?? PACK_SPECS)[kind],
      safeRangeC: { min: fToC(safe.min), max: fToC(safe.max) },
    });
  }
}

/**
 * The guideline compares daytime highs at each place: the highest reading at each waypoint,
 * then the coldest and the hottest of those highs (°F).
 */
function routeHighsF(timeline: TransitTimeline, ambientF: readonly number[]): [number, number] {
  const highs = new Map<number, number>();
  timeline.points.forEach((p, i) => highs.set(p.waypoint, Math.max(highs.get(p.waypoint) ?? -Infinity, ambientF[i]!)));
  const values = [...highs.values()];
  return [Math.min(...values), Math.max(...values)];
}

const isHeat = (kind: PackKind) => kind === "heat_40h" || kind === "heat_72h";

function adviceFor(kind: PackKind, planned: PackKind): AdviceCode {
  if (kind === planned) return "ship_as_planned";
  if (kind === "none") return "remove_pack";
  return isHeat(kind) ? "add_heat_pack" : "add_cold_pack";
}

/**
 * Guideline first, model as the check: keep the planned pack when it is the guideline's kind
 * and keeps the box in range; else the guideline's pack if the model agrees; else the planned
 * pack if the model says it is safe; else any pack that is; else postpone.
 */
function chooseAdvice(
  call: GuidelineCall,
  planned: PackKind,
  runs: PackRuns,
  durationH: number,
): { code: AdviceCode; pack: PackKind | null } {
  if (call.gate === "do_not_ship") return { code: "postpone", pack: null };
  // A 40 h pack is spent before a longer trip ends.
  const heatPacks: PackKind[] = durationH <= 40 ? ["heat_40h", "heat_72h"] : ["heat_72h"];
  const guided: PackKind[] =
    call.gate === "hold"
      ? []
      : { heat: heatPacks, cold: ["cold" as const], none: ["none" as const], either: [] }[call.pack];
  const plannedConforms = guided.includes(planned) || (call.gate === "pack" && call.pack === "heat" && isHeat(planned));
  const candidates = [...new Set<PackKind>([...guided, planned, "none", ...heatPacks, "cold"])];
  const chosen = plannedConforms && runs.inRange(planned) ? planned : candidates.find((kind) => runs.inRange(kind));
  if (call.gate === "hold") return { code: "hold_at_staffed_facility", pack: chosen ?? planned };
  if (!chosen) return { code: "postpone", pack: null };
  return { code: adviceFor(chosen, planned), pack: chosen };
}

function sourcesFor(input: AssessmentInput): TransitAssessment["sources"] {
  const { min, max } = input.profile.safeTransitF;
  return [
    { id: "guideline", title: GUIDELINE_SOURCE },
    { id: "profile", title: `${input.profile.label}: safe in transit ${min}–${max} °F (guideline default, editable)` },
    input.ambientSource === "override"
      ? { id: "ambient-override", title: "Outside temperatures entered for this what-if" }
      : { id: "forecast", title: "Hourly temperature_2m forecast, Open-Meteo (open-meteo.com)" },
    { id: "box-model", title: "Lumped-capacitance model of the box interior: a planning aid, not a guarantee" },
  ];
}

function unavailable(
  timeline: TransitTimeline,
  ambientF: readonly (number | undefined)[],
  sources: TransitAssessment["sources"],
): TransitAssessment {
  const code: AdviceCode = "retry_when_forecast_available";
  return {
    verdict: verdictOf(code),
    advice: { code, pack: null, message: adviceMessage(code, null) },
    ambientF: null,
    insideF: null,
    hoursOutsideRange: null,
    hours: timeline.points.map((p, i) => {
      const value = ambientF[i];
      return { at: p.at, place: p.place, ambientF: isPlausibleAmbientF(value) ? round1(value) : null, insideF: null };
    }),
    suggestedDeparture: null,
    sources,
  };
}
