/**
 * One trip, one or more boxes: the timeline, the outside temperatures (forecast or a what-if's
 * own) and each box's verdict under its own profile. The trip's answer is its worst box's.
 */
import { ambientFromOverride, weatherFromForecasts, type HourlyTempF } from "@shared/temperature/ambient";
import { assessTransit, type ExposureInput, type TripAssessment } from "@shared/temperature/assess";
import type { TripWeather } from "@shared/temperature/exposure";
import type { BoxSpec } from "@shared/temperature/box-model";
import type { TemperatureProfile } from "@shared/temperature/profiles";
import { tripRoute } from "@shared/temperature/route";
import {
  VERDICT_SEVERITY,
  type BoxTemperature,
  type ProfileSummary,
  type TemperatureReport,
} from "@shared/temperature/report";
import {
  buildTransitTimeline,
  plannedArrivalWarning,
  type TimelineRequest,
  type TransitTimeline,
} from "@shared/temperature/timeline";
import { forecastIndexFor, unavailableText, type WeatherSource } from "./forecasts";

export type BoxToAssess = { containerId: string | null; label: string; box: BoxSpec; profile: TemperatureProfile };

/** Where the outside temperatures come from: the forecast (through the cache), or the what-if's samples. */
export type AmbientPlan =
  | { kind: "forecast"; source: WeatherSource | null; nowMs: number }
  | { kind: "override"; samples: readonly HourlyTempF[] };

type Source = TripAssessment["sources"][number];
type WeatherLookup = { weatherFor: (timeline: TransitTimeline) => TripWeather; extraSources: Source[] };

const NO_WEATHER: TripWeather = { ambient: new Map() };

const summary = (p: TemperatureProfile): ProfileSummary => ({
  group: p.group,
  label: p.label,
  safeTransitF: { ...p.safeTransitF },
});

async function weatherLookup(plan: AmbientPlan, timeline: TransitTimeline): Promise<WeatherLookup> {
  if (plan.kind === "override")
    return { weatherFor: (t) => ({ ambient: ambientFromOverride(t, plan.samples) }), extraSources: [] };
  if (!plan.source) {
    return {
      weatherFor: () => NO_WEATHER,
      extraSources: [
        {
          id: "forecast-unavailable",
          title: "Forecast unavailable: no weather service is configured. The check cannot say the box is safe.",
        },
      ],
    };
  }
  const outcome = await forecastIndexFor(plan.source, timeline, plan.nowMs);
  if (!outcome.ok) {
    return {
      weatherFor: () => NO_WEATHER,
      extraSources: [{ id: "forecast-unavailable", title: unavailableText(outcome.reason, outcome.detail) }],
    };
  }
  return { weatherFor: (t) => weatherFromForecasts(t, outcome.index), extraSources: [] };
}

// Only reached with no outside temperatures, where the box plays no part in the answer.
const PLACEHOLDER_BOX: BoxSpec = {
  wall: "eps",
  wallThicknessMm: 25,
  lengthMm: 300,
  widthMm: 300,
  heightMm: 300,
  contentsG: 500,
  pack: "none",
};

function boxSummary(b: BoxToAssess, result: TripAssessment): BoxTemperature {
  return {
    containerId: b.containerId,
    label: b.label,
    plannedPack: b.box.pack,
    contentsG: b.box.contentsG,
    profile: summary(b.profile),
    verdict: result.verdict,
    advice: result.advice,
    insideF: result.insideF,
    hoursOutsideRange: result.hoursOutsideRange,
  };
}

/**
 * The answer when a trip cannot be assessed at all (a place that cannot be located, no box with
 * animals): "forecast unavailable" with the reason in `sources`, never a kind of "ship".
 */
export function unassessable(
  trip: Pick<TimelineRequest, "mode" | "departAt">,
  boxes: readonly BoxToAssess[],
  fallback: TemperatureProfile,
  why: Source,
  exposure?: ExposureInput,
): TemperatureReport {
  const at = new Date(trip.departAt).toISOString();
  const timeline: TransitTimeline = {
    mode: trip.mode,
    departAt: at,
    arriveAt: at,
    durationH: 0,
    greatCircleKm: 0,
    roadKm: null,
    waypoints: [],
    points: [],
    stays: [],
    skippedStops: [],
    warnings: [],
  };
  const assess = (b: Pick<BoxToAssess, "box" | "profile">) =>
    assessTransit({ timeline, ambientByHour: NO_WEATHER.ambient, box: b.box, profile: b.profile, exposure });
  const shown = boxes[0] ?? { box: PLACEHOLDER_BOX, profile: fallback };
  const result = assess(shown);
  return {
    ...result,
    sources: [...result.sources, why],
    profile: summary(shown.profile),
    warnings: [],
    boxes: boxes.map((b) => boxSummary(b, assess(b))),
    route: tripRoute(timeline),
  };
}

/**
 * Verdict of every box of a trip (°F throughout) and the trip's answer: the worst box's
 * assessment, a later departure only when it suits every box, and each box's own verdict.
 * Throws RangeError when the trip cannot be laid out (see buildTransitTimeline).
 */
export async function assessBoxes(
  request: TimelineRequest,
  boxes: readonly BoxToAssess[],
  plan: AmbientPlan,
  fallback: TemperatureProfile,
  plannedArrivalMs?: number,
  exposure?: ExposureInput,
): Promise<TemperatureReport> {
  if (boxes.length === 0)
    return unassessable(
      request,
      boxes,
      fallback,
      { id: "no-boxes", title: "No box holds animals yet: there is nothing to assess." },
      exposure,
    );
  const timeline = buildTransitTimeline(request);
  const lookup = await weatherLookup(plan, timeline);

  const ambientSource = plan.kind === "override" ? ("override" as const) : ("forecast" as const);
  const timelineFor = (departMs: number) => buildTransitTimeline({ ...request, departAt: departMs });
  const search = { timelineFor, weatherFor: lookup.weatherFor };
  const weather = lookup.weatherFor(timeline);
  const common = { ambientByHour: weather.ambient, radiationByHour: weather.radiation, ambientSource, exposure };
  const assessed = boxes.map((b) => ({
    ...b,
    result: assessTransit({ timeline, ...common, box: b.box, profile: b.profile, search }),
  }));
  const worst = assessed.reduce((w, b) =>
    VERDICT_SEVERITY.indexOf(b.result.verdict) < VERDICT_SEVERITY.indexOf(w.result.verdict) ? b : w,
  );

  const suggested = worst.result.suggestedDeparture;
  const suitsEveryBox = (departAt: string) => {
    const later = timelineFor(Date.parse(departAt));
    const laterWeather = lookup.weatherFor(later);
    return assessed.every((b) =>
      ["ship", "pack"].includes(
        assessTransit({
          timeline: later,
          ambientByHour: laterWeather.ambient,
          radiationByHour: laterWeather.radiation,
          box: b.box,
          profile: b.profile,
          ambientSource,
          exposure,
          brief: true,
        }).verdict,
      ),
    );
  };

  const arrival = plannedArrivalMs === undefined ? null : plannedArrivalWarning(timeline, plannedArrivalMs);
  return {
    ...worst.result,
    suggestedDeparture: suggested && suitsEveryBox(suggested) ? suggested : null,
    sources: [...worst.result.sources, ...lookup.extraSources],
    profile: summary(worst.profile),
    warnings: arrival ? [...timeline.warnings, arrival] : timeline.warnings,
    boxes: assessed.map((b) => boxSummary(b, b.result)),
    route: tripRoute(timeline),
  };
}
