import type {
  CheckMark,
  Exposure,
  ForecastUnavailableReason,
  ParkedKind,
  ReadingSource,
  VehicleConditioning,
  WeatherScenario,
} from "../constants";
import type { AdviceCode, Verdict } from "../temperature/advice";
import type { AirBand } from "../temperature/air-band";
import type { RouteStopKind } from "../temperature/route";

/** Temperature verdicts in plain words. "Forecast unavailable" is never a kind of "ship". */
export const TEMPERATURE_VERDICT_WORDS: Readonly<Record<Verdict, string>> = {
  ship: "Fine to ship",
  pack: "Ship with the packing advised",
  hold: "Ship only to a staffed facility",
  do_not_ship: "Do not ship",
  forecast_unavailable: "Forecast unavailable",
};

/** The advice's name, short; the advice's own message says the details. */
export const ADVICE_WORDS: Readonly<Record<AdviceCode, string>> = {
  ship_as_planned: "Ship as planned",
  add_heat_pack: "Add a heat pack",
  add_cold_pack: "Add a cold pack",
  remove_pack: "Ship without the pack",
  hold_at_staffed_facility: "Hold at a staffed facility",
  postpone: "Postpone",
  retry_when_forecast_available: "Check again when the forecast is back",
};

/** When a stored check was made, as it reads after a date ("…, 24 hours before departure"). */
export const CHECK_MARK_WORDS: Readonly<Record<CheckMark, string>> = {
  "24h": "24 hours before departure",
  "4h": "4 hours before departure",
  manual: "on request",
  gate: "when the transfer was cleared to ship",
};

/** Why there is no forecast, as it reads after "Forecast unavailable: ". */
export function forecastUnavailableWords(
  reason: ForecastUnavailableReason,
  detail: string,
  horizonDays: number,
): string {
  const why: Record<ForecastUnavailableReason, string> = {
    timeout: "the weather service did not answer in time",
    network: "the weather service could not be reached",
    redirect: "the weather service redirected the request, which is not followed",
    upstream_error: `the weather service answered with an error (${detail})`,
    invalid_response: `the weather service's answer failed the checks (${detail})`,
    beyond_horizon: `the trip ends more than ${horizonDays} days ahead, beyond the forecast; check again closer to departure`,
  };
  return why[reason];
}

/** The demo weather stand-in's answers, for the admin's switch. */
export const WEATHER_SCENARIO_WORDS: Readonly<Record<WeatherScenario, string>> = {
  normal: "Ordinary weather",
  heat_wave: "Heat wave",
  cold_snap: "Cold snap",
  outage: "Weather service down",
  garbage: "Garbled answers",
  slow: "Too slow to answer",
  reset: "Connection dropped",
  redirect: "Redirected",
};

/** Where the box is, as a label (the chart's band, the hour-by-hour table). */
export const EXPOSURE_WORDS: Readonly<Record<Exposure, string>> = {
  outdoors: "Outdoors",
  vehicle_climate_controlled: "Climate-controlled vehicle",
  vehicle_unconditioned: "Unconditioned vehicle, moving",
  parked_sun: "Parked vehicle, sun",
  parked_shade: "Parked vehicle, shade",
  carrier_building: "Carrier's building",
  indoors: "Home or facility",
};

/** Where the box is, as it reads inside a sentence ("12:30–13:30 parked in the sun near Macon, GA"). */
export const EXPOSURE_IN_SENTENCE: Readonly<Record<Exposure, string>> = {
  outdoors: "outdoors",
  vehicle_climate_controlled: "in the climate-controlled vehicle",
  vehicle_unconditioned: "in the unconditioned vehicle",
  parked_sun: "parked in the sun",
  parked_shade: "parked in the shade",
  carrier_building: "in the carrier's building",
  indoors: "indoors",
};

/** How the vehicle's air is held. */
export const VEHICLE_CONDITIONING_WORDS: Readonly<Record<VehicleConditioning, string>> = {
  climate_controlled: "Climate-controlled",
  unconditioned: "Not climate-controlled",
};

/** Where the vehicle waits during a stop. */
export const PARKED_WORDS: Readonly<Record<ParkedKind, string>> = {
  sun: "Parked in the sun",
  shade: "Parked in the shade",
  indoors: "Box taken indoors",
};

/** Where a box temperature was read, as the reading's place says it when the courier gave none. */
export const READING_SOURCE_WORDS: Readonly<Record<ReadingSource, string>> = {
  pickup: "Pickup from the sender",
  handoff: "Handoff between couriers",
  delivery: "Delivery to the receiver",
  check_in: "Check-in at the receiver",
};

/** The stops a map of the trip marks. */
export const ROUTE_STOP_WORDS: Readonly<Record<RouteStopKind, string>> = {
  origin: "Start",
  hub: "Carrier's hub",
  planned_stop: "Planned stop",
  rest_stop: "Break",
  overnight_rest: "Night's rest",
  destination: "Arrival",
};

/** The map's bands of the air around the box, against the animals' safe range in transit. */
export const AIR_BAND_WORDS: Readonly<Record<AirBand, string>> = {
  well_below: "Far colder than safe",
  below: "Colder than safe",
  within: "In the safe range",
  above: "Warmer than safe",
  well_above: "Far warmer than safe",
  unknown: "Not known (no forecast)",
};
