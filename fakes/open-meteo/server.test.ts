import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { fetchWeatherApi } from "openmeteo";
import { Unit } from "@openmeteo/sdk/unit.js";
import { Variable } from "@openmeteo/sdk/variable.js";
import { startOpenMeteoFake, type OpenMeteoFake } from "./server";

let fake: OpenMeteoFake;
beforeAll(async () => {
  fake = await startOpenMeteoFake({ port: 0 });
});
afterAll(() => fake.close());
beforeEach(() => {
  fake.setScenario("normal");
  fake.clearRequests();
});

// Nashville and Phoenix (real coordinates); one July day, UTC.
const params = {
  latitude: [36.12, 33.45],
  longitude: [-86.67, -112.07],
  hourly: "temperature_2m",
  temperature_unit: "fahrenheit",
  timezone: "GMT",
  start_hour: "2026-07-15T00:00",
  end_hour: "2026-07-15T23:00",
};
const forecastUrl = () => `${fake.url}/v1/forecast`;

/** Reads what the real client decoded into plain numbers. */
async function decode(query: Record<string, unknown> = params) {
  const responses = await fetchWeatherApi(forecastUrl(), query, 1);
  return responses.map((r) => {
    const hourly = r.hourly()!;
    const variable = hourly.variables(0)!;
    return {
      lat: r.latitude(),
      lon: r.longitude(),
      timezone: r.timezone(),
      time: Number(hourly.time()),
      timeEnd: Number(hourly.timeEnd()),
      interval: hourly.interval(),
      variable: variable.variable(),
      unit: variable.unit(),
      altitude: variable.altitude(),
      values: Array.from(variable.valuesArray()!),
    };
  });
}

describe("the Open-Meteo fake, read by the real openmeteo client", () => {
  it("answers one size-prefixed WeatherApiResponse per location", async () => {
    const [nashville, phoenix] = await decode();
    expect(nashville).toMatchObject({
      time: Date.parse("2026-07-15T00:00:00Z") / 1000,
      timeEnd: Date.parse("2026-07-16T00:00:00Z") / 1000,
      interval: 3600,
      variable: Variable.temperature,
      unit: Unit.fahrenheit,
      altitude: 2,
      timezone: "GMT",
    });
    expect(nashville!.values).toHaveLength(24);
    // the answer names its grid cell, a few km from the asked point
    expect(Math.abs(nashville!.lat - 36.12)).toBeLessThan(0.05);
    expect(Math.abs(phoenix!.lon + 112.07)).toBeLessThan(0.05);
  });

  it("serves plausible July values with a daily cycle", async () => {
    // NOAA normals, Nashville July: high 89.5 °F, low 70.8 °F [memory]
    const [nashville] = await decode();
    const values = nashville!.values;
    expect(Math.min(...values)).toBeGreaterThan(55);
    expect(Math.max(...values)).toBeLessThan(105);
    expect(Math.max(...values) - Math.min(...values)).toBeGreaterThan(10);
  });

  it("answers in °C unless asked for °F, and the same values every time", async () => {
    const [celsius] = await decode({ ...params, temperature_unit: undefined });
    const [fahrenheit] = await decode();
    expect(celsius!.unit).toBe(Unit.celsius);
    // °F = °C × 9/5 + 32 (definition of the scale) [published]; float32 on the wire
    celsius!.values.forEach((c, i) => expect(fahrenheit!.values[i]).toBeCloseTo((c * 9) / 5 + 32, 3));
    expect((await decode())[0]!.values).toEqual(fahrenheit!.values);
  });

  it("shifts the values in a heat wave and a cold snap", async () => {
    const [normal] = await decode();
    fake.setScenario("heat_wave");
    const [hot] = await decode();
    fake.setScenario("cold_snap");
    const [cold] = await decode();
    expect(Math.max(...hot!.values)).toBeGreaterThan(Math.max(...normal!.values) + 10);
    expect(Math.min(...cold!.values)).toBeLessThan(Math.min(...normal!.values) - 15);
  });

  it("records what it received, in process and over HTTP", async () => {
    await decode();
    expect(fake.requests).toHaveLength(1);
    expect(fake.requests[0]).toMatchObject({
      method: "GET",
      path: "/v1/forecast",
      query: { format: "flatbuffers", latitude: "36.12,33.45", start_hour: "2026-07-15T00:00" },
    });
    const overHttp = (await (await fetch(`${fake.url}/__requests`)).json()) as unknown[];
    expect(overHttp).toEqual(fake.requests);
  });

  it("refuses bad parameters with a 400 and a reason, as the service does", async () => {
    await expect(fetchWeatherApi(forecastUrl(), { ...params, latitude: [95], longitude: [0] }, 1)).rejects.toThrow(
      /Latitude must be in range/,
    );
    await expect(fetchWeatherApi(forecastUrl(), { ...params, hourly: "wind_speed_10m" }, 1)).rejects.toThrow(
      /temperature_2m and shortwave_radiation only/,
    );
  });

  it("serves shortwave_radiation beside the temperature, in W/m², zero at night and highest near solar noon", async () => {
    const responses = await fetchWeatherApi(
      forecastUrl(),
      { ...params, hourly: "temperature_2m,shortwave_radiation" },
      1,
    );
    const hourly = responses[0]!.hourly()!;
    expect(hourly.variablesLength()).toBe(2);
    // the service answers the variables in the order asked (Open-Meteo API documentation) [memory]
    expect(hourly.variables(0)!.variable()).toBe(Variable.temperature);
    const radiation = hourly.variables(1)!;
    expect(radiation.variable()).toBe(Variable.shortwave_radiation);
    expect(radiation.unit()).toBe(Unit.watt_per_square_metre);
    const values = Array.from(radiation.valuesArray()!);
    expect(values).toHaveLength(24);
    // Nashville (86.67° W) in mid-July: solar noon near 18:55 UTC, night from about 01:00 to
    // 11:00 UTC (NOAA solar calculator for 36° N in July: sunrise ≈ 05:45, sunset ≈ 20:00 local
    // solar time) [memory]; the value at an hour is the mean of the hour before it
    for (const hour of [3, 6, 9]) expect(values[hour]).toBe(0);
    const brightest = values.indexOf(Math.max(...values));
    expect([18, 19, 20]).toContain(brightest);
    // at most the clear-sky value, which is about 1,000 W/m² at a high summer sun (Haurwitz 1945) [published]
    expect(Math.max(...values)).toBeGreaterThan(400);
    expect(Math.max(...values)).toBeLessThan(1100);
  });
});

describe("failure scenarios", () => {
  const query = () => new URLSearchParams({ ...params, latitude: "36.12", longitude: "-86.67", format: "flatbuffers" });

  it("switches scenario through the control endpoint", async () => {
    const answer = await fetch(fake.controlUrl, { method: "POST", body: JSON.stringify({ scenario: "outage" }) });
    expect(await answer.json()).toMatchObject({ scenario: "outage" });
    expect(fake.scenario).toBe("outage");
    const outage = await fetch(`${forecastUrl()}?${query()}`);
    expect(outage.status).toBe(503);
    const refused = await fetch(fake.controlUrl, { method: "POST", body: JSON.stringify({ scenario: "tornado" }) });
    expect(refused.status).toBe(400);
  });

  it("resets the connection", async () => {
    fake.setScenario("reset");
    await expect(fetch(`${forecastUrl()}?${query()}`)).rejects.toThrow();
  });

  it("redirects elsewhere", async () => {
    fake.setScenario("redirect");
    const answer = await fetch(`${forecastUrl()}?${query()}`, { redirect: "manual" });
    expect(answer.status).toBe(302);
    expect(answer.headers.get("location")).toMatch(/^\/v1\/forecast-moved\?/);
  });

  it("answers late when slow", async () => {
    fake.setScenario("slow", { slowMs: 300 });
    const started = performance.now();
    const answer = await fetch(`${forecastUrl()}?${query()}`);
    expect(answer.status).toBe(200);
    expect(performance.now() - started).toBeGreaterThanOrEqual(290);
  });

  it("sends bytes that are no forecast", async () => {
    fake.setScenario("garbage", { garbage: "negative_size_prefix" });
    const bytes = new Uint8Array(await (await fetch(`${forecastUrl()}?${query()}`)).arrayBuffer());
    expect(new DataView(bytes.buffer).getInt32(0, true)).toBe(-12);
    fake.setScenario("garbage");
    expect((await (await fetch(`${forecastUrl()}?${query()}`)).arrayBuffer()).byteLength).toBe(512);
  });

  it("closes with a slow answer still pending", async () => {
    const other = await startOpenMeteoFake({ scenario: "slow" });
    const hanging = fetch(`${other.url}/v1/forecast?${query()}`).catch(() => "closed");
    await new Promise((r) => setTimeout(r, 50));
    await other.close();
    expect(await hanging).toBe("closed");
  });
});
