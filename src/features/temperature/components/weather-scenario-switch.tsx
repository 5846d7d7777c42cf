import { WEATHER_SCENARIOS, type WeatherScenario } from "@shared/constants";
import { WEATHER_SCENARIO_WORDS } from "@shared/words";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/feedback";
import { ApiError } from "@/lib/api-client";
import { useSwitchWeatherScenario, useWeatherScenario } from "../api/weather-scenario";

const scenarioWords = (scenario: string): string =>
  (WEATHER_SCENARIOS as readonly string[]).includes(scenario)
    ? WEATHER_SCENARIO_WORDS[scenario as WeatherScenario]
    : "Another answer";

/**
 * Demo only: lets an administrator choose what the local weather fake answers. Shown only when
 * the server says there is a fake and the caller may switch it.
 */
export function WeatherScenarioSwitch() {
  const scenario = useWeatherScenario();
  const change = useSwitchWeatherScenario();
  if (!scenario.data) return null;
  return (
    <Notice tone="info" title="Demo weather">
      <p>The forecast comes from a local stand-in for the weather service (invented data). Choose what it answers:</p>
      <div className="mt-2 flex flex-wrap gap-2" role="group" aria-label="Demo weather scenario">
        {scenario.data.scenarios.map((s) => (
          <Button
            key={s}
            variant={s === scenario.data.scenario ? "primary" : "secondary"}
            aria-pressed={s === scenario.data.scenario}
            busy={change.isPending && change.variables === s}
            onClick={() => change.mutate(s)}
          >
            {scenarioWords(s)}
          </Button>
        ))}
      </div>
      {change.error ? (
        <p role="alert" className="mt-2 text-brick">
          {change.error instanceof ApiError ? change.error.message : "Not switched."}
        </p>
      ) : null}
    </Notice>
  );
}
