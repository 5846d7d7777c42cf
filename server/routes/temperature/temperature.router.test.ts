import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { transitAssessmentSchema } from "@shared/temperature/schemas";
import { createTestApp, anonymousClient, signIn, type Client, type TestApp } from "../../../tests/support/app";
import { buildTransfer, buildUser, markReviewed } from "../../../tests/factories";
import { startOpenMeteoFake, type OpenMeteoFake } from "../../../fakes/open-meteo/server";
import { cToF } from "@shared/units";
import { SCENARIO_SHIFT_C, fakeTemperatureC } from "../../../fakes/open-meteo/climate";

let t: TestApp;
let fake: OpenMeteoFake;
let member: Client;
let admin: Client;
let courier: Client;
const extraApps: TestApp[] = [];
const em = () => t.orm.em.fork();

beforeAll(async () => {
  fake = await startOpenMeteoFake();
  t = await createTestApp({ WEATHER_URL: fake.url, WEATHER_FAKE_CONTROL_URL: fake.controlUrl });
  member = await signIn(t.app, (await buildUser(em())).email);
  admin = await signIn(t.app, (await buildUser(em(), { role: "admin", organization: null })).email);
  courier = await signIn(t.app, (await buildUser(em(), { role: "courier" })).email);
});
afterAll(async () => {
  for (const app of extraApps) await app.close();
  await t.close();
  await fake.close();
});

const clearCache = () => t.ctx.pool.query("DELETE FROM forecast_hour");
beforeEach(async () => {
  fake.setScenario("normal");
  fake.clearRequests();
  await clearCache();
});

const CONTRACT_KEYS = [
  "verdict",
  "advice",
  "ambientF",
  "insideF",
  "hoursOutsideRange",
  "hours",
  "suggestedDeparture",
  "sources",
] as const;

/** The issue's public contract, exactly: the extra keys are ours, these must parse strictly. */
function expectContract(body: Record<string, unknown>) {
  const contract = Object.fromEntries(CONTRACT_KEYS.map((k) => [k, body[k]]));
  const parsed = transitAssessmentSchema.safeParse(contract);
  expect(parsed.success, JSON.stringify(parsed.error?.issues)).toBe(true);
}

/** `days` from now at a whole UTC hour, ISO. */
function utcDaysAhead(days: number, hourUtc: number): string {
  const d = new Date(Date.now() + days * 86_400_000);
  d.setUTCHours(hourUtc, 0, 0, 0);
  return d.toISOString();
}

// A well-filled EPS box: 2 kg of contents barely cools in the hour of a short hand delivery.
const box = {
  wall: "eps",
  wallThicknessMm: 38,
  lengthMm: 400,
  widthMm: 300,
  heightMm: 300,
  contentsG: 2000,
  pack: "none",
};
// Real positions, invented trips: Honolulu → Hilo and Fairbanks → Anchorage by overnight air.
const HONOLULU = { lat: 21.31, lon: -157.86 };
const HILO = { lat: 19.72, lon: -155.08 };
const FAIRBANKS = { lat: 64.84, lon: -147.72 };
const ANCHORAGE = { lat: 61.22, lon: -149.9 };

/** Knoxville → Maryville, TN by hand (about 30 km): outside held at `tempF` all the way. */
function steady(tempF: number, profile = "temperate_snake") {
  const departAt = "2027-03-09T15:00:00Z";
  return {
    origin: { zip: "37917" },
    destination: { zip: "37801" },
    departAt,
    mode: "hand_delivery",
    profile,
    box,
    ambientOverrideF: [{ at: departAt, tempF }],
  };
}

async function assess(body: unknown, client = member) {
  const res = await client.post("/api/temperature/assess", body);
  expect(res.status, JSON.stringify(res.body)).toBe(200);
  return res.body;
}

describe("POST /api/temperature/assess with the caller's own outside temperatures", () => {
  it("reptile guideline edges: 37 °F postpone, 38 °F a heat pack; 95 °F staffed facility only, 96 °F postpone", async () => {
    // [practice] REPTILES magazine shipping guide: below 38 °F do not ship; 38–59 °F heat pack;
    // 92–95 °F hold at a staffed facility only; above 95 °F do not ship.
    const at37 = await assess(steady(37));
    expect(at37).toMatchObject({ verdict: "do_not_ship", advice: { code: "postpone", pack: null } });
    const at38 = await assess(steady(38));
    expect(at38).toMatchObject({ verdict: "pack", advice: { code: "add_heat_pack", pack: "heat_40h" } });
    expect((await assess(steady(95))).advice.code).toBe("hold_at_staffed_facility");
    expect((await assess(steady(96))).advice.code).toBe("postpone");
    for (const body of [at37, at38]) expectContract(body);
    expect(at38.ambientF).toEqual({ min: 38, max: 38 });
    expect(at38.sources.map((s: { id: string }) => s.id)).toContain("ambient-override");
    // the override replaces the forecast: nobody asked the weather service
    expect(fake.requests).toHaveLength(0);
  });

  it("amphibian guideline edges: 79 °F as packed, 80 °F a cold pack", async () => {
    // [practice] REPTILES magazine shipping guide, amphibians: 70–79 °F none, 80–91 °F cold pack
    expect(await assess(steady(79, "frog_toad"))).toMatchObject({
      verdict: "ship",
      advice: { code: "ship_as_planned" },
    });
    expect(await assess(steady(80, "frog_toad"))).toMatchObject({
      verdict: "pack",
      advice: { code: "add_cold_pack", pack: "cold" },
    });
  });

  it("finds the profile by scientific name, synonym or genus, and suggests names for a typo", async () => {
    const body = steady(75);
    const { profile: _profile, ...withoutProfile } = body;
    // [published] Elaphe guttata is the older name of the corn snake, Pantherophis guttatus (Reptile Database)
    expect((await assess({ ...withoutProfile, scientificName: "Elaphe guttata" })).profile.group).toBe(
      "temperate_snake",
    );
    // [published] Ambystoma is a salamander genus (class Amphibia): a genus-level entry takes the
    // narrowest amphibian range, tropical frogs 65–80 °F among the guideline defaults
    expect((await assess({ ...withoutProfile, scientificName: "Ambystoma" })).profile.group).toBe("tropical_frog");
    const typo = await member.post("/api/temperature/assess", {
      ...withoutProfile,
      scientificName: "Pantherophis gutatus",
    });
    expect(typo.status).toBe(400);
    expect(typo.body.error.field).toBe("scientificName");
    expect(typo.body.error.suggestions).toContain("Pantherophis guttatus");
  });

  it("refuses what it cannot plan, and people who do not plan trips", async () => {
    const unknownZip = await member.post("/api/temperature/assess", { ...steady(70), origin: { zip: "00000" } });
    expect(unknownZip.status).toBe(400);
    expect(unknownZip.body.error.field).toBe("origin.zip");
    const both = await member.post("/api/temperature/assess", {
      ...steady(70),
      scientificName: "Pantherophis guttatus",
    });
    expect(both.body.error.field).toBe("profile");
    expect(
      (await member.post("/api/temperature/assess", { ...steady(70), box: { ...box, wallThicknessMm: 200 } })).body
        .error.field,
    ).toBe("box.wallThicknessMm");
    expect((await courier.post("/api/temperature/assess", steady(70))).status).toBe(403);
    expect((await (await anonymousClient(t.app)).post("/api/temperature/assess", steady(70))).status).toBe(401);
  });
});

describe("POST /api/temperature/assess with forecasts from the Open-Meteo fake", () => {
  const trip = (origin: object, destination: object, departAt: string) => ({
    origin,
    destination,
    departAt,
    mode: "overnight_air",
    profile: "temperate_snake",
    box,
  });

  it("a heat wave in Hawaii: decoded from FlatBuffers by the real client, above 95 °F, postpone", async () => {
    fake.setScenario("heat_wave");
    // 12:00 HST (UTC−10), so the origin's afternoon is on the trip
    const body = await assess(trip(HONOLULU, HILO, utcDaysAhead(2, 22)));
    expectContract(body);
    // [practice] REPTILES magazine shipping guide: above 95 °F do not ship
    expect(body).toMatchObject({ verdict: "do_not_ship", advice: { code: "postpone" } });
    expect(body.ambientF.max).toBeGreaterThan(95);
    // the fake's value at its 0.05° grid cell for the cached position (21.31, −157.86)
    const hour = body.hours[3];
    expect(hour.place).toBe("21.310, -157.860");
    const expectedF = cToF(fakeTemperatureC(21.3, -157.85, Date.parse(hour.at) / 1000, SCENARIO_SHIFT_C.heat_wave));
    expect(hour.ambientF).toBeCloseTo(expectedF, 0);
    expect(body.sources.map((s: { id: string }) => s.id)).toContain("forecast");
  });

  it("a cold snap in Alaska: every daytime high in the heat-pack band or colder, postpone", async () => {
    fake.setScenario("cold_snap");
    const body = await assess(trip(FAIRBANKS, ANCHORAGE, utcDaysAhead(2, 21)));
    // [practice] REPTILES magazine shipping guide: below 70 °F a heat pack at best (below 38 °F do not ship)
    expect(body.ambientF.max).toBeLessThan(70);
    expect(body).toMatchObject({ verdict: "do_not_ship", advice: { code: "postpone" } });
  });

  it("caches by rounded position and hour: a second assessment asks the service nothing, a stale cache asks again", async () => {
    const body = trip(HONOLULU, HILO, utcDaysAhead(3, 22));
    const first = await assess(body);
    expect(fake.requests).toHaveLength(1);
    expect(fake.requests[0]!.query).toMatchObject({ latitude: "21.3100,19.7200", longitude: "-157.8600,-155.0800" });
    const second = await assess(body);
    expect(fake.requests).toHaveLength(1);
    expect(second.hours).toEqual(first.hours);
    await t.ctx.pool.query("UPDATE forecast_hour SET fetched_at = fetched_at - interval '4 hours'");
    await assess(body);
    expect(fake.requests).toHaveLength(2);
  });

  it.each([
    ["an outage (503)", "outage", undefined, /HTTP 503/],
    ["random bytes", "garbage", "random_bytes", /failed the checks/],
    ["NaN temperatures", "garbage", "nan_values", /implausible value NaN/],
    ["°C where °F was asked", "garbage", "wrong_unit", /not in °F/],
  ] as const)("%s gives 'forecast unavailable', never a kind of ship", async (_label, scenario, garbage, why) => {
    fake.setScenario(scenario, { garbage });
    const body = await assess(trip(HONOLULU, HILO, utcDaysAhead(2, 22)));
    expectContract(body);
    expect(body).toMatchObject({
      verdict: "forecast_unavailable",
      advice: { code: "retry_when_forecast_available", pack: null },
      ambientF: null,
      insideF: null,
      suggestedDeparture: null,
    });
    expect(body.hours.every((h: { ambientF: number | null }) => h.ambientF === null)).toBe(true);
    expect(body.sources.find((s: { id: string }) => s.id === "forecast-unavailable")?.title).toMatch(why);
    // nothing bad is cached
    expect((await t.ctx.pool.query("SELECT count(*)::int AS n FROM forecast_hour")).rows[0].n).toBe(0);
  });

  it("a trip beyond the 16-day forecast is unavailable without asking", async () => {
    // [memory] Open-Meteo forecasts reach 16 days ahead (forecast_days max 16)
    const body = await assess(trip(HONOLULU, HILO, utcDaysAhead(20, 22)));
    expect(body.verdict).toBe("forecast_unavailable");
    expect(body.sources.find((s: { id: string }) => s.id === "forecast-unavailable")?.title).toMatch(/16 days/);
    expect(fake.requests).toHaveLength(0);
  });
});

describe("GET /api/transfers/:id/temperature", () => {
  it("assesses each box under its animals' profile, for the parties and admins only", async () => {
    const cast = await buildTransfer(em(), { status: "awaiting_receiver" });
    const sender = await signIn(t.app, cast.sender.email);
    const res = await sender.get(`/api/transfers/${cast.transfer.id}/temperature`);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expectContract(res.body);
    expect(["ship", "pack", "hold", "do_not_ship"]).toContain(res.body.verdict);
    // the factory's box: two corn snakes of unrecorded weight (a temperate colubrid)
    expect(res.body.boxes).toHaveLength(1);
    expect(res.body.boxes[0]).toMatchObject({
      label: "Box A",
      plannedPack: "none",
      contentsG: 300,
      profile: { group: "temperate_snake" },
    });
    expect(res.body.profile.group).toBe("temperate_snake");
    expect(res.body.hours[0].place).toBe("Knoxville, TN");
    expect(res.body.hours.at(-1).place).toBe("Eugene, OR");
    expect(res.body).toMatchObject({ transferVersion: cast.transfer.version, alert: null, checks: [] });
    expect(fake.requests).toHaveLength(1);

    await sender.get(`/api/transfers/${cast.transfer.id}/temperature`);
    expect(fake.requests).toHaveLength(1);
    expect((await admin.get(`/api/transfers/${cast.transfer.id}/temperature`)).status).toBe(200);
    expect((await member.get(`/api/transfers/${cast.transfer.id}/temperature`)).status).toBe(404);
  });

  it("says 'forecast unavailable' when the weather service is down", async () => {
    const cast = await buildTransfer(em(), { status: "awaiting_receiver" });
    fake.setScenario("outage");
    const res = await (await signIn(t.app, cast.receiver.email)).get(`/api/transfers/${cast.transfer.id}/temperature`);
    expect(res.body).toMatchObject({
      verdict: "forecast_unavailable",
      advice: { code: "retry_when_forecast_available" },
    });
    expect(res.body.boxes[0].verdict).toBe("forecast_unavailable");
  });
});

describe("the ready-to-ship gate", () => {
  it("409 while the forecast is unavailable; a reasoned override clears it and is logged in the custody log", async () => {
    const cast = await buildTransfer(em(), { status: "awaiting_receiver" });
    const receiver = await signIn(t.app, cast.receiver.email);
    const path = `/api/transfers/${cast.transfer.id}/transition`;
    fake.setScenario("outage");
    // The rules of the route (by air: federal, TN, OR) reviewed, so the compliance gate, which runs
    // first, lets the temperature gate speak (D25, D27).
    await markReviewed(em(), ["US", "TN", "OR"]);

    const refused = await receiver.post(path, { to: "ready" });
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(/override/);
    expect(refused.body.error.temperature).toMatchObject({
      verdict: "forecast_unavailable",
      boxes: [{ verdict: "forecast_unavailable" }],
    });

    const unexplained = await receiver.post(path, { to: "ready", override: true });
    expect(unexplained.status).toBe(400);
    expect(unexplained.body.error.field).toBe("reason");

    const reason = "Hand carried in a heated car; we read the box thermometer every hour.";
    const cleared = await receiver.post(path, { to: "ready", override: true, reason });
    expect(cleared.status, JSON.stringify(cleared.body)).toBe(200);
    expect(cleared.body.transfer.status).toBe("ready");

    const log = (await receiver.get(`/api/transfers/${cast.transfer.id}/custody`)).body;
    expect(log.intact).toBe(true);
    const kinds = log.entries.map((e: { kind: string }) => e.kind);
    expect(kinds.slice(-2)).toEqual(["override", "status_change"]);
    expect(log.entries.at(-2).payload).toEqual({
      gate: "temperature",
      verdict: "forecast_unavailable",
      advice: "retry_when_forecast_available",
      reason,
    });
    expect(log.entries.at(-2).actor.id).toBeTruthy();

    // refusals change nothing; the confirmation keeps the check it was made on
    const checks = await t.ctx.pool.query(
      "SELECT mark, verdict, transfer_version FROM temperature_check WHERE transfer_id = $1",
      [cast.transfer.id],
    );
    expect(checks.rows).toEqual([
      { mark: "gate", verdict: "forecast_unavailable", transfer_version: cast.transfer.version },
    ]);
    const shown = (await receiver.get(`/api/transfers/${cast.transfer.id}/temperature`)).body;
    expect(shown.checks).toMatchObject([{ mark: "gate", verdict: "forecast_unavailable" }]);
  });

  it("acknowledging the unverified rules never answers a temperature block the receiver was not shown", async () => {
    const cast = await buildTransfer(em(), { status: "awaiting_receiver" });
    const receiver = await signIn(t.app, cast.receiver.email);
    const path = `/api/transfers/${cast.transfer.id}/transition`;
    fake.setScenario("outage");
    // No review for the route: the rules check is "unverified" (D25) and speaks first.
    await markReviewed(em(), ["US", "TN", "OR"], null);

    const first = await receiver.post(path, { to: "ready" });
    expect(first.status).toBe(409);
    expect(first.body.error.acknowledgeUnverified).toBe(true);

    const rules = "Both wildlife agencies confirmed by phone.";
    const second = await receiver.post(path, {
      to: "ready",
      override: true,
      overrideGates: ["compliance"],
      reason: rules,
    });
    expect(second.status).toBe(409);
    expect(second.body.error.temperature).toMatchObject({ verdict: "forecast_unavailable" });
    const kindsOf = async () =>
      ((await receiver.get(`/api/transfers/${cast.transfer.id}/custody`)).body.entries as { kind: string }[]).map(
        (e) => e.kind,
      );
    // The refused step rolled back: the acknowledgement waits for the step that clears.
    expect(await kindsOf()).not.toContain("override");

    const both = await receiver.post(path, {
      to: "ready",
      override: true,
      overrideGates: ["compliance", "temperature"],
      reason: `${rules} Heated car, box thermometer read hourly.`,
    });
    expect(both.status, JSON.stringify(both.body)).toBe(200);
    const log = (await receiver.get(`/api/transfers/${cast.transfer.id}/custody`)).body;
    expect(
      log.entries
        .filter((e: { kind: string }) => e.kind === "override")
        .map((e: { payload: { gate: string } }) => e.payload.gate),
    ).toEqual(["compliance", "temperature"]);

    const unknown = await receiver.post(path, {
      to: "ready",
      override: true,
      overrideGates: ["weather"],
      reason: rules,
    });
    expect(unknown.status).toBe(400);
  });
});

describe("temperature profiles", () => {
  it("everyone signed in reads the guideline defaults; only admins edit them, with checked values", async () => {
    const list = await member.get("/api/temperature/profiles");
    expect(list.status).toBe(200);
    expect(list.body.profiles).toHaveLength(12);
    expect(list.body.abilities).toEqual({ edit: false });
    expect((await admin.get("/api/temperature/profiles")).body.abilities).toEqual({ edit: true });
    const snake = list.body.profiles.find((p: { group: string }) => p.group === "temperate_snake");
    // [practice] REPTILES magazine shipping guide, reptiles: do not ship below 38 °F, heat pack below 70 °F,
    // hold from 92 °F, do not ship above 95 °F; no cold-pack band
    expect(snake).toMatchObject({
      bandsF: { doNotShipBelow: 38, heatPackBelow: 70, coldPackFrom: null, holdFrom: 92, doNotShipAbove: 95 },
      edited: false,
      updatedBy: null,
    });
    const frog = list.body.profiles.find((p: { group: string }) => p.group === "frog_toad");
    // [practice] same guide, amphibians: heat pack below 60 °F, cold pack from 80 °F
    expect(frog.bandsF).toMatchObject({ heatPackBelow: 60, coldPackFrom: 80 });

    const {
      group: _group,
      guidelineDefault,
      edited: _edited,
      updatedAt: _updatedAt,
      updatedBy: _updatedBy,
      ...data
    } = snake;
    const put = (client: Client, body: unknown, group = "temperate_snake") =>
      client.agent
        .put(`/api/temperature/profiles/${group}`)
        .set("X-CSRF-Token", client.csrf)
        .send(body as object);
    expect((await put(member, data)).status).toBe(403);

    const edited = await put(admin, { ...data, safeTransitF: { min: 58, max: 84 } });
    expect(edited.status, JSON.stringify(edited.body)).toBe(200);
    expect(edited.body.profile).toMatchObject({
      safeTransitF: { min: 58, max: 84 },
      edited: true,
      guidelineDefault: { safeTransitF: guidelineDefault.safeTransitF },
    });
    expect(edited.body.profile.updatedBy.displayName).toBeTruthy();
    // the edit is what the next verdict uses
    expect((await assess(steady(75))).profile.safeTransitF).toEqual({ min: 58, max: 84 });

    const inverted = await put(admin, { ...data, safeTransitF: { min: 84, max: 58 } });
    expect(inverted.status).toBe(400);
    expect(inverted.body.error.field).toBe("safeTransitF.max");
    const unordered = await put(admin, { ...data, bandsF: { ...data.bandsF, holdFrom: 60 } });
    expect(unordered.body.error.field).toBe("bandsF.holdFrom");
    expect((await put(admin, { ...data, colour: "green" })).body.error.field).toBe("colour");
    expect((await put(admin, data, "dragons")).status).toBe(400);

    const restored = await put(admin, guidelineDefault);
    expect(restored.body.profile.edited).toBe(false);
  });
});

describe("POST /api/dev/weather-scenario (demo)", () => {
  it("admins switch the fake's scenario, which empties the forecast cache", async () => {
    await assess({
      origin: HONOLULU,
      destination: HILO,
      departAt: utcDaysAhead(2, 22),
      mode: "overnight_air",
      profile: "temperate_snake",
      box,
    });
    const switched = await admin.post("/api/dev/weather-scenario", { scenario: "heat_wave" });
    expect(switched.status, JSON.stringify(switched.body)).toBe(200);
    expect(fake.scenario).toBe("heat_wave");
    expect((await t.ctx.pool.query("SELECT count(*)::int AS n FROM forecast_hour")).rows[0].n).toBe(0);
    expect((await admin.get("/api/dev/weather-scenario")).body).toMatchObject({
      scenario: "heat_wave",
      scenarios: expect.arrayContaining(["cold_snap"]),
    });
    expect((await admin.post("/api/dev/weather-scenario", { scenario: "blizzard" })).body.error.field).toBe("scenario");
    expect((await member.post("/api/dev/weather-scenario", { scenario: "normal" })).status).toBe(403);
  });

  it("is not there without a weather fake", async () => {
    const plain = await createTestApp({ WEATHER_URL: fake.url });
    extraApps.push(plain);
    const email = (await buildUser(plain.orm.em.fork(), { role: "admin", organization: null })).email;
    const res = await (await signIn(plain.app, email)).post("/api/dev/weather-scenario", { scenario: "normal" });
    expect(res.status).toBe(404);
  });
});
