import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { ambientFromForecasts, forecastWindow, indexForecasts } from "@shared/temperature/ambient";
import { assessTransit } from "@shared/temperature/assess";
import { DEFAULT_PROFILES } from "@shared/temperature/profiles";
import { buildTransitTimeline } from "@shared/temperature/timeline";
import { GARBAGE_KINDS, startOpenMeteoFake, type OpenMeteoFake } from "../../fakes/open-meteo/server";
import { cToF } from "@shared/units";
import { fakeShortwaveRadiationWm2, fakeTemperatureC } from "../../fakes/open-meteo/climate";
import { WEATHER_TIMEOUT_MS, fetchHourlyForecastsF, type ForecastRequest } from "./weather";

let fake: OpenMeteoFake;
beforeAll(async () => {
  fake = await startOpenMeteoFake({ port: 0 });
});
afterAll(() => fake.close());
beforeEach(() => {
  fake.setScenario("normal");
  fake.clearRequests();
});

// Real coordinates of invented parties: Nashville, TN and Los Angeles, CA.
const points = [
  { lat: 36.12, lon: -86.67 },
  { lat: 33.94, lon: -118.4 },
];
const request = (overrides: Partial<ForecastRequest> = {}): ForecastRequest => ({
  baseUrl: fake.url,
  points,
  fromHour: "2026-07-15T00:00:00Z",
  toHour: "2026-07-15T23:00:00Z",
  ...overrides,
});

describe("fetchHourlyForecastsF against the fake", () => {
  it("decodes hourly °F per point with the real client", async () => {
    const result = await fetchHourlyForecastsF(request());
    if (!result.ok) throw new Error(`unavailable: ${result.reason} ${result.detail}`);
    expect(result.forecasts).toHaveLength(2);
    const [nashville] = result.forecasts;
    expect(nashville).toMatchObject({ lat: 36.12, lon: -86.67 });
    expect(nashville!.hours).toHaveLength(24);
    expect(nashville!.hours[0]!.at).toBe("2026-07-15T00:00:00.000Z");
    expect(nashville!.hours[23]!.at).toBe("2026-07-15T23:00:00.000Z");
    // the fake's value at its grid cell (36.10, −86.65), as float32 on the wire
    const expectedF = cToF(fakeTemperatureC(36.1, -86.65, Date.parse("2026-07-15T20:00:00Z") / 1000));
    expect(nashville!.hours[20]!.tempF).toBeCloseTo(expectedF, 1);
    // NOAA normals, Nashville July: low 70.8 °F, high 89.5 °F [memory]; the fake wobbles around them
    for (const { tempF } of nashville!.hours) expect(tempF).toBeGreaterThan(55);
  });

  it("decodes the solar radiation of each hour with the real client", async () => {
    const result = await fetchHourlyForecastsF(request());
    if (!result.ok) throw new Error(`unavailable: ${result.reason} ${result.detail}`);
    const nashville = result.forecasts[0]!;
    // the fake's value at its grid cell, as float32 on the wire
    const expected = fakeShortwaveRadiationWm2(36.1, -86.65, Date.parse("2026-07-15T19:00:00Z") / 1000);
    expect(nashville.hours[19]!.radiationWm2).toBeCloseTo(expected, 0);
    // night in Tennessee at 06:00 UTC (00:00 local solar time) [practice]
    expect(nashville.hours[6]!.radiationWm2).toBe(0);
    for (const { radiationWm2 } of nashville.hours) {
      expect(radiationWm2).toBeGreaterThanOrEqual(0);
      // never above the solar constant, about 1361 W/m² (Kopp and Lean 2011) [memory]
      expect(radiationWm2).toBeLessThan(1361);
    }
  });

  it("asks for FlatBuffers, °F, GMT and exactly the hours wanted", async () => {
    await fetchHourlyForecastsF(request({ fromHour: "2026-07-15T00:20:00Z", toHour: "2026-07-15T05:40:00Z" }));
    expect(fake.requests).toHaveLength(1);
    expect(fake.requests[0]!.query).toEqual({
      latitude: "36.1200,33.9400",
      longitude: "-86.6700,-118.4000",
      hourly: "temperature_2m,shortwave_radiation",
      temperature_unit: "fahrenheit",
      timezone: "GMT",
      start_hour: "2026-07-15T00:00",
      end_hour: "2026-07-15T06:00",
      format: "flatbuffers",
    });
  });

  it("feeds an assessment that reaches a verdict", async () => {
    const timeline = buildTransitTimeline({
      mode: "overnight_air",
      origin: { label: "Nashville, TN", lat: 36.12, lon: -86.67, timeZone: "America/Chicago" },
      destination: { label: "Los Angeles, CA", lat: 33.94, lon: -118.4, timeZone: "America/Los_Angeles" },
      departAt: "2026-07-14T10:00:00-05:00",
    });
    const result = await fetchHourlyForecastsF({
      baseUrl: fake.url,
      points: timeline.waypoints,
      ...forecastWindow(timeline, 0),
    });
    if (!result.ok) throw new Error(result.detail);
    const assessment = assessTransit({
      timeline,
      ambientByHour: ambientFromForecasts(timeline, indexForecasts(result.forecasts)),
      box: {
        wall: "eps",
        wallThicknessMm: 38,
        lengthMm: 300,
        widthMm: 300,
        heightMm: 300,
        contentsG: 800,
        pack: "none",
      },
      profile: DEFAULT_PROFILES.temperate_snake,
    });
    expect(assessment.verdict).not.toBe("forecast_unavailable");
    expect(assessment.hours.every((h) => h.ambientF !== null && h.insideF !== null)).toBe(true);
  });
});

describe("an unusable weather service gives 'unavailable', never values", () => {
  it("503 outage", async () => {
    fake.setScenario("outage");
    expect(await fetchHourlyForecastsF(request())).toMatchObject({
      ok: false,
      reason: "upstream_error",
      detail: "HTTP 503 Service Unavailable",
    });
  });

  it("connection reset", async () => {
    fake.setScenario("reset");
    expect(await fetchHourlyForecastsF(request())).toMatchObject({ ok: false, reason: "network" });
  });

  it("nothing listening", async () => {
    const closed = await startOpenMeteoFake();
    await closed.close();
    expect(await fetchHourlyForecastsF(request({ baseUrl: closed.url }))).toMatchObject({
      ok: false,
      reason: "network",
    });
  });

  it("a redirect, which is not followed", async () => {
    fake.setScenario("redirect");
    expect(await fetchHourlyForecastsF(request())).toMatchObject({ ok: false, reason: "redirect" });
    expect(fake.requests.map((r) => r.path)).toEqual(["/v1/forecast"]);
  });

  it.each(GARBAGE_KINDS)("garbage: %s", async (kind) => {
    fake.setScenario("garbage", { garbage: kind });
    const started = performance.now();
    const result = await fetchHourlyForecastsF(request());
    expect(result).toMatchObject({ ok: false, reason: "invalid_response" });
    // the checks reject it at once; the client never gets to loop on it
    expect(performance.now() - started).toBeLessThan(WEATHER_TIMEOUT_MS);
  });

  it("an answer later than 3 s", async () => {
    fake.setScenario("slow", { slowMs: 10_000 });
    const started = performance.now();
    const result = await fetchHourlyForecastsF(request());
    const elapsedMs = performance.now() - started;
    expect(result).toMatchObject({ ok: false, reason: "timeout" });
    expect(elapsedMs).toBeGreaterThanOrEqual(WEATHER_TIMEOUT_MS - 50);
    expect(elapsedMs).toBeLessThan(WEATHER_TIMEOUT_MS + 500);
  });
});

describe("requests that could never be right", () => {
  it("throws before calling anyone", async () => {
    await expect(fetchHourlyForecastsF(request({ points: [] }))).rejects.toThrow(RangeError);
    await expect(fetchHourlyForecastsF(request({ toHour: "2026-07-14T00:00:00Z" }))).rejects.toThrow(RangeError);
    await expect(fetchHourlyForecastsF(request({ baseUrl: "file:///etc" }))).rejects.toThrow(RangeError);
    expect(fake.requests).toHaveLength(0);
  });
});
