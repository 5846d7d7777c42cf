import type { Exposure, PackKind, ParkedKind, TransportMode, VehicleConditioning } from "../constants";
import { formatInstant, formatTimeSpan } from "../dates";
import { EXPOSURE_IN_SENTENCE } from "../words/temperature";
import { adviceMessage, guidelineCall, verdictOf, type AdviceCode, type GuidelineCall, type Verdict } from "./advice";
import { isPlausibleAmbientF, type AmbientByHour, type RadiationByHour } from "./ambient";
import {
  PACK_SPECS,
  boxThermal,
  simulateInterior,
  type BoxSpec,
  type BoxThermal,
  type PackSpec,
  type SimulationResult,
} from "./box-model";
import {
  DEFAULT_VEHICLE_RANGE_F,
  aroundAtC,
  aroundBoxSeries,
  exposureSpans,
  type AroundSeries,
  type ExposurePlan,
  type ExposureSpan,
  type RangeF,
  type TripWeather,
} from "./exposure";
import { SAFER_DEPARTURE_SEARCH_DAYS } from "./limits";
import { GUIDELINE_SOURCE, type TemperatureProfile } from "./profiles";
import type { TransitAssessment } from "./schemas";
import { hasCalendarWarning, sameLocalTimeLater, type TransitTimeline } from "./timeline";
import { cToF, fToC, round1 } from "../units";

/** Packing-room temperature when the sender gives none, °F [practice]. */
export const DEFAULT_PACKED_AT_F = 72;

const S_PER_H = 3600;

/** How the search for a later departure gets its timelines and their weather. */
export type DepartureSearch = {
  timelineFor: (departMs: number) => TransitTimeline;
  /** Outside temperatures (and, from a forecast, radiation) for a timeline's hours. */
  weatherFor: (timeline: TransitTimeline) => TripWeather;
  days?: number;
};

/** How the box travels, as the sender, courier or driver said (ground courier and hand delivery). */
export type ExposureInput = {
  /** Null or absent: nobody said; the model takes an unconditioned vehicle and says so. */
  vehicle?: VehicleConditioning | null;
  /** A climate-controlled vehicle's set range, °F (default 65–80). */
  vehicleRangeF?: RangeF | null;
  /** Where each planned stop parks, by its index in the timeline's planned stops. */
  stopParking?: readonly ParkedKind[];
};

export type AssessmentInput = {
  timeline: TransitTimeline;
  ambientByHour: AmbientByHour;
  /** Solar radiation by hour from the forecast; hours without it take a clear sky. */
  radiationByHour?: RadiationByHour;
  box: BoxSpec;
  profile: TemperatureProfile;
  /** Whether `ambientByHour` is a forecast or a what-if's own values (for `sources`). */
  ambientSource?: "forecast" | "override";
  /** Temperature the box is packed at, °F; clamped into the profile's safe range. */
  packedAtF?: number;
  packs?: Readonly<Record<PackKind, PackSpec>>;
  exposure?: ExposureInput;
  /** Given, a hold or postpone verdict (or a weekend or holiday in transit) comes with the next safer departure. */
  search?: DepartureSearch;
  /** Skip the deciding stretch and the suggestions (the departure search and the other boxes' checks). */
  brief?: boolean;
};

/** A stretch of the trip in one exposure, for the chart's band. */
export type ExposureSpanDto = {
  from: string;
  to: string;
  exposure: Exposure;
  place: string;
  /** The air around the box in it, warmest and coldest, °F (null without weather). */
  aroundMaxF: number | null;
  aroundMinF: number | null;
};

/** How the vehicle was modelled and, where nobody said, what the verdict would be if it were climate-controlled. */
export type VehicleModelDto = {
  /** Null for the overnight carrier, whose vans are modelled as they are. */
  conditioning: VehicleConditioning | null;
  rangeF: RangeF | null;
  /** Whether the sender, courier or driver said how the vehicle is held. */
  declared: boolean;
  /** Said beside the verdict when the model assumed. */
  note: string | null;
  ifClimateControlled: {
    verdict: Verdict;
    advice: { code: AdviceCode; pack: PackKind | null; message: string };
  } | null;
};

/** The hour and place that decide the verdict, and the changes that were tried and help. */
export type DecidingStretchDto = {
  from: string;
  to: string;
  place: string;
  exposure: Exposure;
  direction: "hot" | "cold";
  /** The air around the box at its extreme in the stretch, °F. */
  aroundF: number;
  /** The box's inside at its extreme, °F. */
  insideF: number;
  sentence: string;
  suggestions: string[];
};

/** What the exposure model adds to the contract's assessment. */
export type TripAssessment = TransitAssessment & {
  exposures: ExposureSpanDto[];
  vehicle: VehicleModelDto;
  decidingStretch: DecidingStretchDto | null;
};

/** A run of the model under one exposure plan: what the verdict is built from. */
type Evaluation = {
  plan: ExposurePlan;
  spans: ExposureSpan[];
  series: AroundSeries;
  runs: PackRuns;
  planned: SimulationResult;
  choice: { code: AdviceCode; pack: PackKind | null };
  verdict: Verdict;
};

const VERDICT_ORDER: readonly Verdict[] = ["forecast_unavailable", "do_not_ship", "hold", "pack", "ship"];
const worse = (a: Verdict, b: Verdict) => VERDICT_ORDER.indexOf(a) < VERDICT_ORDER.indexOf(b);

/**
 * Temperature verdict for a trip: outside temperatures hour by hour, where the box is and the
 * air around it (exposure.ts), the modelled inside temperature of the box as packed (°F), the
 * hours it spends outside the profile's safe range, and advice naming the stretch that decides it.
 * The guideline bands gate the trip (do not ship, hold) and name the pack — on the outside air for
 * the overnight carrier, whose profile the guideline describes, and on the air around the box for
 * ground trips; the box model checks that the pack keeps the interior in range and picks another
 * when it does not. A ground trip whose vehicle nobody described is modelled unconditioned, says
 * so, and takes the worse of that and a climate-controlled vehicle: an assumption never turns a
 * verdict green. A missing or implausible hourly value gives "forecast_unavailable".
 */
export function assessTransit(input: AssessmentInput): TripAssessment {
  const { timeline } = input;
  const ambientF = timeline.points.map((p) => input.ambientByHour.get(p.at));
  const carrier = timeline.mode === "overnight_air";
  const declared = carrier ? null : (input.exposure?.vehicle ?? null);
  const plan: ExposurePlan = {
    vehicle: declared ?? "unconditioned",
    vehicleRangeF: input.exposure?.vehicleRangeF ?? DEFAULT_VEHICLE_RANGE_F,
    stopParking: input.exposure?.stopParking ?? [],
  };
  const sources = sourcesFor(input, plan, declared);
  if (timeline.points.length === 0 || !ambientF.every(isPlausibleAmbientF))
    return unavailable(input, ambientF, sources, plan, declared);

  const weather: TripWeather = { ambient: input.ambientByHour, radiation: input.radiationByHour };
  let shown = evaluate(input, plan, weather, ambientF);
  let other: Evaluation | null = null;
  // A brief check wants the verdict only: the worse of the two cannot be worse than "do not ship".
  if (!carrier && declared === null && !(input.brief && shown.verdict === "do_not_ship")) {
    other = evaluate(
      input,
      { ...plan, vehicle: "climate_controlled", vehicleRangeF: DEFAULT_VEHICLE_RANGE_F },
      weather,
      ambientF,
    );
    // The assumption is shown unless the vehicle being climate-controlled would make it worse.
    if (worse(other.verdict, shown.verdict)) [shown, other] = [other, shown];
  }
  if (shown.series.clearSkyAssumed)
    sources.push({
      id: "clear-sky",
      title: "No solar radiation was forecast for some hours: parked cars are modelled under a clear sky.",
    });

  const verdict = shown.verdict;
  const wantsSearch = verdict === "hold" || verdict === "do_not_ship" || hasCalendarWarning(timeline);
  const suggestedDeparture =
    wantsSearch && input.search ? findSaferDeparture({ ...input, search: input.search }) : null;
  const deciding = input.brief ? null : decidingStretch(input, shown, weather, ambientF, suggestedDeparture);
  const baseMessage = adviceMessage(shown.choice.code, shown.choice.pack);
  const message =
    deciding && verdict !== "ship" ? [baseMessage, deciding.sentence, ...deciding.suggestions].join(" ") : baseMessage;
  const { planned } = shown;
  return {
    verdict,
    advice: { ...shown.choice, message },
    ambientF: { min: round1(Math.min(...(ambientF as number[]))), max: round1(Math.max(...(ambientF as number[]))) },
    // Rounded outward: a box that dips 0.04 °F below the range must not read as inside it.
    insideF: { min: Math.floor(cToF(planned.minC) * 10) / 10, max: Math.ceil(cToF(planned.maxC) * 10) / 10 },
    hoursOutsideRange: Math.ceil((planned.secondsOutsideRange / S_PER_H) * 10) / 10,
    hours: timeline.points.map((p, i) => ({
      at: p.at,
      place: p.place,
      ambientF: round1(ambientF[i]!),
      insideF: round1(cToF(planned.insideC[i]!)),
      exposure: shown.series.hourExposure[i]!,
      aroundBoxF: round1(shown.series.hourAroundF[i]!),
    })),
    suggestedDeparture,
    sources,
    exposures: spanDtos(timeline, shown.spans, shown.series),
    vehicle: vehicleModel(carrier, declared, shown, other),
    decidingStretch: deciding,
  };
}

/** One run of the model: the exposures, the air around the box, each pack's box, the advice. */
function evaluate(
  input: AssessmentInput,
  plan: ExposurePlan,
  weather: TripWeather,
  ambientF: readonly (number | undefined)[],
): Evaluation {
  const { timeline, profile } = input;
  const spans = exposureSpans(timeline, plan);
  const series = aroundBoxSeries(timeline, spans, weather, plan.vehicleRangeF);
  const runs = new PackRuns(input, series);
  const planned = runs.get(input.box.pack);
  const gateF = timeline.mode === "overnight_air" ? (ambientF as number[]) : series.hourAroundF;
  const call = guidelineCall(...routeHighsF(timeline, gateF), profile.bandsF);
  const choice = chooseAdvice(call, input.box.pack, runs, timeline.durationH);
  return { plan, spans, series, runs, planned, choice, verdict: verdictOf(choice.code) };
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
    const weather = search.weatherFor(timeline);
    const { verdict } = assessTransit({
      ...input,
      timeline,
      ambientByHour: weather.ambient,
      radiationByHour: weather.radiation,
      search: undefined,
      brief: true,
    });
    if (verdict !== "ship" && verdict !== "pack") continue;
    if (timeline.warnings.length === 0) return timeline.departAt;
    fallback ??= timeline.departAt;
  }
  return fallback;
}

/** Simulations of the box with each pack in the air around it, run on demand and kept. */
class PackRuns {
  private readonly cache = new Map<PackKind, SimulationResult>();
  private readonly thermal: BoxThermal;

  constructor(
    private readonly input: AssessmentInput,
    private readonly series: AroundSeries,
  ) {
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
    const series = this.series;
    return simulateInterior({
      ...this.thermal,
      initialInsideC: fToC(packedAtF),
      ambientC: (elapsedS) => aroundAtC(series, elapsedS),
      durationS: (this.input.timeline.points.length - 1) * S_PER_H,
      pack: (this.input.packs ?? PACK_SPECS)[kind],
      safeRangeC: { min: fToC(safe.min), max: fToC(safe.max) },
    });
  }
}

/**
 * The guideline compares daytime highs at each place: the highest reading at each waypoint,
 * then the coldest and the hottest of those highs (°F).
 */
function routeHighsF(timeline: TransitTimeline, valuesF: readonly number[]): [number, number] {
  const highs = new Map<number, number>();
  timeline.points.forEach((p, i) => highs.set(p.waypoint, Math.max(highs.get(p.waypoint) ?? -Infinity, valuesF[i]!)));
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

const wholeF = (tempF: number) => `${Math.round(tempF)} °F`;

function placeOf(timeline: TransitTimeline, waypoint: number): string {
  const place = timeline.waypoints[waypoint];
  if (!place) return "on the way";
  if (place.near) return place.near;
  return waypoint === 0 || waypoint === timeline.waypoints.length - 1 ? `at ${place.label}` : place.label;
}

function spanDtos(timeline: TransitTimeline, spans: readonly ExposureSpan[], series: AroundSeries | null) {
  return spans.map((s, i): ExposureSpanDto => {
    const extremes = series?.spanExtremesF[i];
    const known = extremes && Number.isFinite(extremes.maxF);
    return {
      from: new Date(s.startMs).toISOString(),
      to: new Date(s.endMs).toISOString(),
      exposure: s.exposure,
      place: timeline.waypoints[s.waypoint]?.label ?? "",
      aroundMaxF: known ? round1(extremes.maxF) : null,
      aroundMinF: known ? round1(extremes.minF) : null,
    };
  });
}

/** "the car reaches about 130 °F" and its kin, for the air in the deciding stretch. */
function airWords(exposure: Exposure, direction: "hot" | "cold", aroundF: number, mode: TransportMode): string {
  const verb = direction === "hot" ? "reaches" : "falls to";
  switch (exposure) {
    case "parked_sun":
    case "parked_shade":
      return `${mode === "hand_delivery" ? "the car" : "the vehicle"} ${verb} about ${wholeF(aroundF)}`;
    case "vehicle_climate_controlled":
      return `the vehicle holds about ${wholeF(aroundF)}`;
    case "carrier_building":
      return `the building ${verb} about ${wholeF(aroundF)}`;
    default:
      return `the air around the box ${verb} about ${wholeF(aroundF)}`;
  }
}

/**
 * The stretch that decides: where the box, as packed, comes furthest past (or nearest to) an edge
 * of its safe range. The box follows its air with a lag (its time constant τ = R·C), so each
 * stretch before the box's extreme is weighed by how far its air lay beyond that extreme, minute
 * by minute, discounted by e^(−Δt/τ): the stretch that pushed the box there most. Then the changes
 * that were tried and help.
 */
function decidingStretch(
  input: AssessmentInput,
  shown: Evaluation,
  weather: TripWeather,
  ambientF: readonly (number | undefined)[],
  suggestedDeparture: string | null,
): DecidingStretchDto | null {
  const { timeline, profile } = input;
  const { planned, spans, series } = shown;
  if (spans.length === 0) return null;
  const safe = profile.safeTransitF;
  const hotBy = cToF(planned.maxC) - safe.max;
  const coldBy = safe.min - cToF(planned.minC);
  const direction = hotBy >= coldBy ? "hot" : "cold";
  const peakS = direction === "hot" ? planned.maxAtS : planned.minAtS;
  const peakC = direction === "hot" ? planned.maxC : planned.minC;
  const peakMs = series.startMs + peakS * 1000;
  const insideF = cToF(peakC);
  const { resistanceKPerW, capacitanceJPerK } = boxThermal(input.box);
  const tauMin = (resistanceKPerW * capacitanceJPerK) / 60;
  const peakStep = Math.min(series.aroundC.length - 1, Math.round(peakS / series.stepS));
  const firstStep = Math.max(0, peakStep - Math.ceil(6 * tauMin));
  const scores = spans.map(() => 0);
  let k = 0;
  for (let i = firstStep; i <= peakStep; i++) {
    const atMs = series.startMs + i * series.stepS * 1000;
    while (k < spans.length - 1 && spans[k]!.endMs <= atMs) k++;
    const span = spans[k]!;
    if (atMs < span.startMs || atMs >= span.endMs) continue;
    const beyond = direction === "hot" ? series.aroundC[i]! - peakC : peakC - series.aroundC[i]!;
    if (beyond > 0) scores[k]! += beyond * Math.exp(-(peakStep - i) / tauMin);
  }
  let best = scores.reduce((b, score, i) => (score > 0 && (b < 0 || score > scores[b]!) ? i : b), -1);
  // A box that never went past its air (it only drifted from the packing room): the span it was in.
  if (best < 0) best = spans.findIndex((s) => peakMs >= s.startMs && peakMs < s.endMs);
  if (best < 0) return null;
  const stretch = spans[best]!;
  const extremes = series.spanExtremesF[best]!;
  const aroundF = direction === "hot" ? extremes.maxF : extremes.minF;
  const zone = timeline.waypoints[stretch.waypoint]?.timeZone;
  const when = formatTimeSpan(stretch.startMs, stretch.endMs, zone);
  const sentence = `${when} ${EXPOSURE_IN_SENTENCE[stretch.exposure]} ${placeOf(timeline, stretch.waypoint)}: ${airWords(stretch.exposure, direction, aroundF, timeline.mode)}; the box inside ${direction === "hot" ? "reaches" : "falls to"} ${wholeF(insideF)}.`;
  const suggestions =
    shown.verdict === "ship"
      ? []
      : helpfulChanges(input, shown, stretch, direction, weather, ambientF, suggestedDeparture);
  return {
    from: new Date(stretch.startMs).toISOString(),
    to: new Date(stretch.endMs).toISOString(),
    place: timeline.waypoints[stretch.waypoint]?.label ?? "",
    exposure: stretch.exposure,
    direction,
    aroundF: round1(aroundF),
    insideF: round1(insideF),
    sentence,
    suggestions,
  };
}

/**
 * Changes tried against the model, kept when they bring the verdict to "ship" or "pack": parking a
 * planned stop in the shade or taking the box inside, a climate-controlled vehicle, the pack the
 * advice names, another day.
 */
function helpfulChanges(
  input: AssessmentInput,
  shown: Evaluation,
  stretch: ExposureSpan,
  direction: "hot" | "cold",
  weather: TripWeather,
  ambientF: readonly (number | undefined)[],
  suggestedDeparture: string | null,
): string[] {
  const helps = (plan: ExposurePlan) => {
    const { verdict } = evaluate(input, plan, weather, ambientF);
    return verdict === "ship" || verdict === "pack";
  };
  const found: string[] = [];
  const stop = stretch.plannedStop;
  if (stop !== null && (stretch.exposure === "parked_sun" || stretch.exposure === "parked_shade")) {
    const parkAs = (parked: ParkedKind) => {
      const stopParking = [...shown.plan.stopParking];
      stopParking[stop] = parked;
      return helps({ ...shown.plan, stopParking });
    };
    if (stretch.exposure === "parked_sun" && direction === "hot" && parkAs("shade"))
      found.push("Parking that stop in the shade keeps the box in its safe range.");
    else if (parkAs("indoors")) found.push("Taking the box indoors for that stop keeps it in its safe range.");
  }
  if (input.timeline.mode !== "overnight_air" && shown.plan.vehicle !== "climate_controlled") {
    const range = DEFAULT_VEHICLE_RANGE_F;
    if (helps({ ...shown.plan, vehicle: "climate_controlled", vehicleRangeF: range }))
      found.push(`A climate-controlled vehicle (${range.min}–${range.max} °F) keeps the box in its safe range.`);
  }
  if (suggestedDeparture) {
    const zone = input.timeline.waypoints[0]?.timeZone;
    found.push(`Another day: leaving ${formatInstant(suggestedDeparture, zone)} looks better.`);
  }
  if (found.length === 0 && shown.verdict === "do_not_ship")
    found.push(
      "Nothing tried here (shade, a climate-controlled vehicle, a pack, the coming week) makes this trip safe.",
    );
  return found;
}

function vehicleModel(
  carrier: boolean,
  declared: VehicleConditioning | null,
  shown: Evaluation,
  other: Evaluation | null,
): VehicleModelDto {
  if (carrier) return { conditioning: null, rangeF: null, declared: false, note: null, ifClimateControlled: null };
  const cc = [shown, other].find((e) => e?.plan.vehicle === "climate_controlled") ?? null;
  const range = shown.plan.vehicleRangeF;
  const base = {
    conditioning: shown.plan.vehicle,
    rangeF: shown.plan.vehicle === "climate_controlled" ? { min: range.min, max: range.max } : null,
    declared: declared !== null,
  };
  if (declared !== null) return { ...base, note: null, ifClimateControlled: null };
  const ccVerdict = cc?.verdict ?? shown.verdict;
  const note =
    shown.plan.vehicle === "unconditioned"
      ? `Nobody has said how the vehicle is heated or cooled, so it is modelled as not climate-controlled. If it were climate-controlled (${DEFAULT_VEHICLE_RANGE_F.min}–${DEFAULT_VEHICLE_RANGE_F.max} °F), the verdict would be: ${ccVerdictWords(ccVerdict)}.`
      : `Nobody has said how the vehicle is heated or cooled. The verdict shown is for a climate-controlled vehicle (${DEFAULT_VEHICLE_RANGE_F.min}–${DEFAULT_VEHICLE_RANGE_F.max} °F), which comes out worse here than an unconditioned one.`;
  return {
    ...base,
    note,
    ifClimateControlled: cc
      ? { verdict: cc.verdict, advice: { ...cc.choice, message: adviceMessage(cc.choice.code, cc.choice.pack) } }
      : null,
  };
}

const VERDICT_IN_NOTE: Readonly<Record<Verdict, string>> = {
  ship: "fine to ship",
  pack: "ship with the packing advised",
  hold: "ship only to a staffed facility",
  do_not_ship: "do not ship",
  forecast_unavailable: "forecast unavailable",
};
const ccVerdictWords = (verdict: Verdict) => VERDICT_IN_NOTE[verdict];

function sourcesFor(
  input: AssessmentInput,
  plan: ExposurePlan,
  declared: VehicleConditioning | null,
): TransitAssessment["sources"] {
  const { min, max } = input.profile.safeTransitF;
  const timeline = input.timeline;
  const sources: TransitAssessment["sources"] = [
    { id: "guideline", title: GUIDELINE_SOURCE },
    { id: "profile", title: `${input.profile.label}: safe in transit ${min}–${max} °F (guideline default, editable)` },
    input.ambientSource === "override"
      ? { id: "ambient-override", title: "Outside temperatures entered for this what-if" }
      : {
          id: "forecast",
          title: "Hourly temperature_2m and shortwave_radiation forecast, Open-Meteo (open-meteo.com)",
        },
    { id: "box-model", title: "Lumped-capacitance model of the box interior: a planning aid, not a guarantee" },
    {
      id: "exposure",
      title:
        timeline.mode === "overnight_air"
          ? "Where the box is: the sender's place until the pickup, the carrier's van, stations and hub through the night, the delivery van through the morning, the doorstep (carrier's buildings drawn toward 50–80 °F; checked against the ISTA 7E parcel envelope)"
          : "Where the box is: loading and unloading outdoors, the vehicle while driving, parked cars warming as measured by McLaren, Null and Quinn (Pediatrics 2005) scaled by the forecast's solar radiation (after Horak et al., Theor. Appl. Climatol. 2016); the model's own breaks park a car in the sun. Never leave animals in a parked vehicle.",
    },
  ];
  if (timeline.mode !== "overnight_air") {
    sources.push(
      declared === null
        ? {
            id: "vehicle-assumed",
            title:
              "How the vehicle is heated or cooled was not given: modelled as not climate-controlled, and the verdict is never better than a climate-controlled vehicle's.",
          }
        : {
            id: "vehicle",
            title:
              plan.vehicle === "climate_controlled"
                ? `Climate-controlled vehicle held at ${plan.vehicleRangeF.min}–${plan.vehicleRangeF.max} °F, as declared`
                : "Vehicle not climate-controlled, as declared",
          },
    );
  }
  if (timeline.skippedStops.length > 0)
    sources.push({
      id: "stops-skipped",
      title: `${timeline.skippedStops.length === 1 ? "A planned stop comes" : `${timeline.skippedStops.length} planned stops come`} after the modelled arrival and ${timeline.skippedStops.length === 1 ? "is" : "are"} not in the check.`,
    });
  return sources;
}

function unavailable(
  input: AssessmentInput,
  ambientF: readonly (number | undefined)[],
  sources: TransitAssessment["sources"],
  plan: ExposurePlan,
  declared: VehicleConditioning | null,
): TripAssessment {
  const { timeline } = input;
  const code: AdviceCode = "retry_when_forecast_available";
  const spans = timeline.points.length > 0 ? exposureSpans(timeline, plan) : [];
  const exposureAt = (atMs: number): Exposure =>
    spans.find((s) => atMs >= s.startMs && atMs < s.endMs)?.exposure ?? "indoors";
  return {
    verdict: verdictOf(code),
    advice: { code, pack: null, message: adviceMessage(code, null) },
    ambientF: null,
    insideF: null,
    hoursOutsideRange: null,
    hours: timeline.points.map((p, i) => {
      const value = ambientF[i];
      return {
        at: p.at,
        place: p.place,
        ambientF: isPlausibleAmbientF(value) ? round1(value) : null,
        insideF: null,
        exposure: exposureAt(Date.parse(p.at)),
        aroundBoxF: null,
      };
    }),
    suggestedDeparture: null,
    sources,
    exposures: spanDtos(timeline, spans, null),
    vehicle:
      timeline.mode === "overnight_air"
        ? { conditioning: null, rangeF: null, declared: false, note: null, ifClimateControlled: null }
        : {
            conditioning: plan.vehicle,
            rangeF: plan.vehicle === "climate_controlled" ? { ...plan.vehicleRangeF } : null,
            declared: declared !== null,
            note: null,
            ifClimateControlled: null,
          },
    decidingStretch: null,
  };
}
