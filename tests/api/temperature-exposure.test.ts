/**
 * Where the box really is (issue 13): the what-if's vehicle and stops, each hour's exposure and
 * the air around the box, the transfer's own plan and its legs' vehicles, box readings against the
 * model with an alert when one is out of range, and how far the model has been from the readings.
 */
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { EXPOSURES } from "@shared/constants";
import { createTestApp, signIn, type Client, type TestApp } from "../support/app";
import { actorOf, buildTransfer, buildUser } from "../factories";
import { startOpenMeteoFake, type OpenMeteoFake } from "../../fakes/open-meteo/server";
import { OutboxMessageSchema } from "../../server/db/entities/outbox-message.entity";
import { TemperatureCheckSchema } from "../../server/db/entities/temperature.entity";
import { ContainerSchema, TransferChangeSchema } from "../../server/db/entities/transfer.entity";
import { recordHandoff } from "../../server/services/transfers/handoff";

let t: TestApp;
let fake: OpenMeteoFake;
let member: Client;
const em = () => t.orm.em.fork();

beforeAll(async () => {
  fake = await startOpenMeteoFake();
  t = await createTestApp({ WEATHER_URL: fake.url });
  member = await signIn(t.app, (await buildUser(em())).email);
});
afterAll(async () => {
  await t.close();
  await fake.close();
});
beforeEach(() => fake.setScenario("normal"));

const put = (client: Client, path: string, body: unknown) =>
  client.agent
    .put(path)
    .set("X-CSRF-Token", client.csrf)
    .send(body as object);

// A well-filled foam box (demo values).
const box = {
  wall: "eps",
  wallThicknessMm: 38,
  lengthMm: 400,
  widthMm: 300,
  heightMm: 300,
  contentsG: 2000,
  pack: "none",
};

/** Atlanta → Macon by hand (about 135 km), the outside held at `tempF`. */
function handTrip(tempF: number, extra: Record<string, unknown> = {}) {
  const departAt = "2027-07-13T15:30:00Z"; // 11:30 EDT
  return {
    origin: { zip: "30303" },
    destination: { zip: "31201" },
    departAt,
    mode: "hand_delivery",
    profile: "temperate_snake",
    box,
    ambientOverrideF: [{ at: departAt, tempF }],
    ...extra,
  };
}

describe("POST /api/temperature/assess: vehicle, set range and stops", () => {
  it("gives every hour its exposure and the air around the box beside the outside air and the box", async () => {
    const res = await member.post("/api/temperature/assess", handTrip(75, { vehicle: "climate_controlled" }));
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    for (const hour of res.body.hours) {
      expect(EXPOSURES).toContain(hour.exposure);
      expect(typeof hour.aroundBoxF).toBe("number");
      expect(typeof hour.ambientF).toBe("number");
      expect(typeof hour.insideF).toBe("number");
    }
    expect(res.body.vehicle).toMatchObject({ conditioning: "climate_controlled", declared: true });
    expect(res.body.exposures.length).toBeGreaterThan(2);
  });

  it("flags a lunch stop in a car parked in the sun on a 90 °F day and names the hour and the place", async () => {
    // McLaren, Null and Quinn 2005: a closed car in the sun gains about 40 °F in an hour [published]
    const stops = [{ at: "2027-07-13T16:30:00Z", durationMin: 60, parked: "sun" }];
    const body = (
      await member.post("/api/temperature/assess", handTrip(90, { vehicle: "climate_controlled", stops })).expect(200)
    ).body;
    expect(body.verdict).not.toBe("ship");
    expect(body.advice.message).toMatch(/12:30–13:30 EDT parked in the sun/);
    expect(body.advice.message).toMatch(/the car reaches about \d+ °F; the box inside reaches \d+ °F/);
    const stopHour = body.hours.find((h: { at: string }) => h.at === "2027-07-13T17:00:00.000Z");
    expect(stopHour.exposure).toBe("parked_sun");
    expect(stopHour.aroundBoxF).toBeGreaterThan(stopHour.ambientF + 20);

    const indoors = await member
      .post(
        "/api/temperature/assess",
        handTrip(90, { vehicle: "climate_controlled", stops: [{ ...stops[0], parked: "indoors" }] }),
      )
      .expect(200);
    expect(indoors.body.verdict).toBe("ship");
  });

  it("says beside the verdict when nobody said how the vehicle is held, and what a climate-controlled one would do", async () => {
    const body = (await member.post("/api/temperature/assess", handTrip(30)).expect(200)).body;
    expect(body.vehicle).toMatchObject({ conditioning: "unconditioned", declared: false });
    expect(body.vehicle.note).toContain("not climate-controlled");
    expect(body.vehicle.ifClimateControlled.verdict).toBeDefined();
    expect(body.sources.map((s: { id: string }) => s.id)).toContain("vehicle-assumed");
  });

  it("refuses a vehicle for the overnight carrier, a range without climate control, a stop before departure", async () => {
    const cases: [Record<string, unknown>, string][] = [
      [{ mode: "overnight_air", vehicle: "unconditioned" }, "vehicle"],
      [{ vehicle: "unconditioned", vehicleRangeF: { min: 60, max: 70 } }, "vehicleRangeF"],
      [{ vehicle: "climate_controlled", vehicleRangeF: { min: 80, max: 60 } }, "vehicleRangeF.max"],
      [{ vehicle: "climate_controlled", vehicleRangeF: { min: 10, max: 60 } }, "vehicleRangeF.min"],
      [{ stops: [{ at: "2027-07-13T10:00:00Z", durationMin: 30, parked: "sun" }] }, "stops.0.at"],
      [{ stops: [{ at: "2027-07-13T17:00:00Z", durationMin: 30, parked: "roof" }] }, "stops.0.parked"],
      [{ stops: [{ at: "2027-07-13T17:00:00Z", durationMin: 0, parked: "sun" }] }, "stops.0.durationMin"],
      [{ vehicle: "hovercraft" }, "vehicle"],
    ];
    for (const [extra, field] of cases) {
      const res = await member.post("/api/temperature/assess", handTrip(75, extra));
      expect(res.status, JSON.stringify(extra)).toBe(400);
      expect(res.body.error.field).toBe(field);
      expect(res.body.error.message).not.toMatch(/_|undefined|Invalid/);
    }
  });
});

describe("the transfer's own plan: vehicle, set range, stops, and the legs' vehicles", () => {
  it("the sender sets it, the courier declares their leg, others may not; the assessment uses it", async () => {
    const cast = await buildTransfer(em(), { status: "ready", mode: "ground_courier" });
    const path = `/api/transfers/${cast.transfer.id}/temperature`;
    const sender = await signIn(t.app, cast.sender.email);
    const receiver = await signIn(t.app, cast.receiver.email);
    const courier = await signIn(t.app, cast.couriers[0]!.email);

    const before = (await sender.get(path).expect(200)).body;
    expect(before.plan).toMatchObject({ applies: true, vehicle: null, stops: [], canEdit: true });
    expect(before.vehicle).toMatchObject({ declared: false, conditioning: "unconditioned" });

    const departure = Date.parse(cast.transfer.plannedDepartureAt.toISOString());
    const stopAt = new Date(departure + 3 * 3_600_000).toISOString();
    const plan = {
      vehicle: "climate_controlled",
      vehicleRangeF: { min: 68, max: 76 },
      stops: [{ at: stopAt, durationMin: 45, parked: "shade" }],
    };
    await put(receiver, `${path}/plan`, plan).expect(403);
    await put(courier, `${path}/plan`, plan).expect(403);
    await put(sender, `${path}/plan`, { ...plan, vehicle: "unconditioned" }).expect(400);
    const saved = (await put(sender, `${path}/plan`, plan).expect(200)).body;
    expect(saved.plan).toMatchObject({ vehicle: "climate_controlled", vehicleRangeF: { min: 68, max: 76 } });
    expect(saved.plan.stops).toEqual([{ at: stopAt, durationMin: 45, parked: "shade" }]);
    // the leg's courier has not said yet: the sender's word stands for the leg
    expect(saved.vehicle).toMatchObject({
      declared: true,
      conditioning: "climate_controlled",
      rangeF: { min: 68, max: 76 },
    });

    const legId = saved.plan.legs[0].id;
    expect(saved.plan.legs[0].canDeclare).toBe(true);
    const other = await signIn(t.app, (await buildUser(em(), { role: "courier" })).email);
    await put(other, `/api/transfers/${cast.transfer.id}/legs/${legId}/vehicle`, { vehicle: "unconditioned" }).expect(
      404,
    );
    const declared = (
      await put(courier, `/api/transfers/${cast.transfer.id}/legs/${legId}/vehicle`, {
        vehicle: "climate_controlled",
        vehicleRangeF: { min: 65, max: 75 },
      }).expect(200)
    ).body;
    expect(declared.plan.legs[0]).toMatchObject({ vehicle: "climate_controlled", vehicleRangeF: { min: 65, max: 75 } });
    expect(declared.vehicle).toMatchObject({ declared: true, conditioning: "climate_controlled" });
    expect(declared.vehicle.rangeF).toEqual({ min: 65, max: 75 });
    const stopSpan = declared.exposures.find((s: { exposure: string }) => s.exposure === "parked_shade");
    expect(stopSpan.from).toBe(stopAt);

    const changes = await em().find(TransferChangeSchema, { transfer: cast.transfer.id });
    expect(changes.map((c) => c.field)).toEqual(
      expect.arrayContaining(["vehicle", "vehicleRangeF", "stops", "legs[1].vehicle", "legs[1].vehicleRangeF"]),
    );
  });

  it("has nothing to set for the overnight carrier", async () => {
    const cast = await buildTransfer(em(), { status: "draft" });
    const sender = await signIn(t.app, cast.sender.email);
    const path = `/api/transfers/${cast.transfer.id}/temperature`;
    expect((await sender.get(path).expect(200)).body.plan).toMatchObject({ applies: false, canEdit: false });
    const refused = await put(sender, `${path}/plan`, { vehicle: "climate_controlled", stops: [] }).expect(400);
    expect(refused.body.error.field).toBe("vehicle");
  });
});

describe("box readings against the model", () => {
  it("lists the readings with the model's value; one out of range raises an alert and e-mails parties and couriers", async () => {
    const cast = await buildTransfer(em(), { status: "in_transit", app: t.ctx });
    const sender = await signIn(t.app, cast.sender.email);
    const path = `/api/transfers/${cast.transfer.id}/temperature`;
    const first = (await sender.get(path).expect(200)).body;
    // the fixture's pickup read 72 °F: inside the corn snake's range, no alert
    expect(first.readings).toHaveLength(1);
    expect(first.readings[0]).toMatchObject({ tempF: 72, source: "pickup", place: "Test depot" });
    expect(typeof first.readings[0].modelF).toBe("number");
    expect(first.readings[0].differenceF).toBeCloseTo(72 - first.readings[0].modelF, 1);
    expect(first.plan.followingPickupAt).not.toBeNull();

    const containers = await em().find(ContainerSchema, { transfer: cast.transfer.id });
    await recordHandoff({
      em: em(),
      actor: await actorOf(em(), cast.receiver),
      transferId: cast.transfer.id,
      links: t.ctx.links,
      input: {
        handoffIndex: 1,
        boxesCounted: containers.length,
        seals: containers.map((c) => ({ containerId: c.id, sealNumber: c.sealNumber ?? null, intact: true })),
        boxTempF: 97,
        place: { text: "Front porch" },
        releasedByName: "Courier",
        receivedByName: cast.receiver.displayName,
        notes: null,
        // Recorded moments after the pickup, thousands of miles away: the plausibility check wants a reason.
        reasons: { implausibleSpeed: "Recorded together after the trip; the flight was overnight." },
        acknowledged: true,
      },
    });
    const after = (await sender.get(path).expect(200)).body;
    expect(after.readings.map((r: { tempF: number }) => r.tempF)).toEqual([72, 97]);
    expect(after.readings[1]).toMatchObject({ place: "Front porch", source: "delivery", outsideSafeRange: true });

    const transfer = (await sender.get(`/api/transfers/${cast.transfer.id}`).expect(200)).body.transfer;
    const alert = transfer.alerts.find((a: { kind: string }) => a.kind === "temperature_out_of_range");
    // temperate snakes travel at 55–85 °F (profile default) [practice]
    expect(alert.message).toContain("97 °F");
    expect(alert.message).toContain("above the safe range");
    const mails = await em().find(OutboxMessageSchema, { topic: "transfer.alert" });
    const to = mails.map((m) => m.toAddress);
    expect(to).toEqual(expect.arrayContaining([cast.sender.email, cast.receiver.email, cast.couriers[0]!.email]));
  });

  it("takes the box temperature at check-in, and a cold one raises an alert", async () => {
    const cast = await buildTransfer(em(), { status: "delivered", app: t.ctx });
    const receiver = await signIn(t.app, cast.receiver.email);
    const transfer = (await receiver.get(`/api/transfers/${cast.transfer.id}`).expect(200)).body.transfer;
    await receiver
      .post(`/api/transfers/${cast.transfer.id}/check-in`, {
        items: transfer.animals.map((a: { id: string; count: number }) => ({
          animalId: a.id,
          arrivedWell: a.count,
          arrivedProblem: 0,
          deadOnArrival: 0,
          missing: 0,
        })),
        extras: [],
        boxTempF: 41,
        signedName: "Receiver",
        acknowledged: true,
      })
      .set("Idempotency-Key", `check-in-${cast.transfer.id}`)
      .expect(201);
    const body = (await receiver.get(`/api/transfers/${cast.transfer.id}/temperature`).expect(200)).body;
    expect(body.readings.at(-1)).toMatchObject({ tempF: 41, source: "check_in", outsideSafeRange: true });
    const alerts = (await receiver.get(`/api/transfers/${cast.transfer.id}`).expect(200)).body.transfer.alerts;
    expect(
      alerts.some(
        (a: { kind: string; message: string }) => a.kind === "temperature_out_of_range" && a.message.includes("below"),
      ),
    ).toBe(true);
  });
});

describe("GET /api/temperature/model-accuracy", () => {
  it("compares each reading with the prediction on record when the box left: mean and worst difference", async () => {
    const sender = await buildUser(em(), { role: "member" });
    const cast = await buildTransfer(em(), { status: "delivered", app: t.ctx, sender });
    // the prediction the parties relied on: the check kept when the transfer was cleared
    const check = await em().findOneOrFail(TemperatureCheckSchema, { transfer: cast.transfer.id, mark: "gate" });
    expect(check.verdict).not.toBe("forecast_unavailable");
    // the box at the planned departure, linear between the prediction's first two hours
    const [first, second] = check.result.hours;
    const share = (Date.parse(check.result.exposures[0]!.from) - Date.parse(first!.at)) / 3_600_000;
    const modelAtPickupF = first!.insideF! + (second!.insideF! - first!.insideF!) * share;
    const client = await signIn(t.app, sender.email);
    const body = (await client.get("/api/temperature/model-accuracy").expect(200)).body;
    // the fixture read 72 °F at the pickup and at the delivery, seconds apart
    expect(body.readings).toBe(2);
    expect(body.transfers).toBe(1);
    expect(body.meanAbsoluteDifferenceF).toBeCloseTo(Math.abs(72 - modelAtPickupF), 0);
    expect(body.worst).toMatchObject({ transferId: cast.transfer.id, tempF: 72 });
    expect(body.byTransfer).toHaveLength(1);

    const stranger = await signIn(t.app, (await buildUser(em(), { role: "member" })).email);
    expect((await stranger.get("/api/temperature/model-accuracy").expect(200)).body.readings).toBe(0);
    const courier = await signIn(t.app, cast.couriers[0]!.email);
    await courier.get("/api/temperature/model-accuracy").expect(403);
  });
});
