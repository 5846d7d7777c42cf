import type { CheckMark, ForecastUnavailableReason, WeatherScenario } from "../constants";
import type { AdviceCode, Verdict } from "../temperature/advice";

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
