/**
 * Issue 16: a courier service plans a run of transfers assigned to it; Hatchway orders the stops
 * (each pickup before its drop-off), times them with rests after 49 CFR 395.3 [published] as
 * planning guidance, and each transfer's planned times and van follow the run.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { precedenceHolds, roadKm } from "@shared/runs/plan";
import type { RunDto } from "@shared/schemas/run";
import { OutboxMessageSchema } from "../../server/db/entities/outbox-message.entity";
import { RunSchema, RunStopSchema } from "../../server/db/entities/run.entity";
import { TransferChangeSchema, TransferSchema } from "../../server/db/entities/transfer.entity";
import type { Organization } from "../../server/db/entities/organization.entity";
import type { User } from "../../server/db/entities/user.entity";
import { buildOrganization, buildTransfer, buildUser } from "../factories";
import { createTestApp, signIn, type Client, type TestApp } from "../support/app";
import { extractPageTexts } from "../../server/pdf/pdf-test-support";

let t: TestApp;
const em = () => t.orm.em.fork();
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

/** Invented places (ZIP centres are enough for the planner): Knoxville, Nashville, Memphis, Little Rock. */
const PLACES = {
  knoxville: {
    street: "418 Quarry Hollow Road",
    city: "Knoxville",
    state: "TN",
    zip: "37917",
    lat: 35.99,
    lon: -83.92,
  },
  nashville: { street: "7 Fiddle Row", city: "Nashville", state: "TN", zip: "37203", lat: 36.15, lon: -86.79 },
  memphis: { street: "55 River Bluff Way", city: "Memphis", state: "TN", zip: "38103", lat: 35.15, lon: -90.05 },
  littleRock: { street: "3 Pinnacle Court", city: "Little Rock", state: "AR", zip: "72201", lat: 34.75, lon: -92.27 },
} as const;
type PlaceKey = keyof typeof PLACES;

type Service = { org: Organization; manager: User; courier: User; boss: Client };

async function courierService(): Promise<Service> {
  const org = await buildOrganization(em(), { kind: "courier_service", name: "Test Night Van Couriers", listed: true });
  const manager = await buildUser(em(), { role: "manager", organization: org });
  const courier = await buildUser(em(), { role: "courier", organization: org });
  return { org, manager, courier, boss: await signIn(t.app, manager.email) };
}

/** A ground transfer sent to the receiver and asked of the service, between two of the places. */
async function carried(
  service: Service,
  from: PlaceKey,
  to: PlaceKey,
  status: "awaiting_receiver" | "ready" = "ready",
) {
  const cast = await buildTransfer(em(), { status, mode: "ground_courier", couriers: [service.courier] });
  const [o, d] = [PLACES[from], PLACES[to]];
  await em().nativeUpdate(
    TransferSchema,
    { id: cast.transfer.id },
    {
      courierService: service.org.id,
      originStreet: o.street,
      originCity: o.city,
      originState: o.state,
      originZip: o.zip,
      originLat: o.lat,
      originLon: o.lon,
      destinationStreet: d.street,
      destinationCity: d.city,
      destinationState: d.state,
      destinationZip: d.zip,
      destinationLat: d.lat,
      destinationLon: d.lon,
    },
  );
  return cast;
}

const DEPART = "2026-12-14T13:00:00.000Z";

async function transferRow(id: string) {
  return em().findOneOrFail(TransferSchema, { id });
}

describe("planning a run", () => {
  it("orders the stops with every pickup before its drop-off, and answers the contract's shape", async () => {
    const service = await courierService();
    const a = await carried(service, "knoxville", "memphis");
    const b = await carried(service, "nashville", "littleRock");
    const c = await carried(service, "knoxville", "nashville", "awaiting_receiver");
    const ids = [a, b, c].map((x) => x.transfer.id);
    const res = await service.boss.post("/api/runs", {
      departAt: DEPART,
      climateControlled: true,
      vehicleRangeF: { min: 68, max: 78 },
      driverIds: [service.courier.id],
      transferIds: ids,
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const run = res.body as RunDto;
    expect(Object.keys(run)).toEqual(expect.arrayContaining(["id", "stops", "drivingH", "rests", "guidance"]));
    expect(run.stops).toHaveLength(6);
    for (const stop of run.stops) {
      expect(["pickup", "dropoff"]).toContain(stop.kind);
      expect(ids).toContain(stop.transferId);
      expect(Date.parse(stop.at)).not.toBeNaN();
      expect(stop.place).toMatchObject({ city: expect.any(String), lat: expect.any(Number), lon: expect.any(Number) });
    }
    expect(precedenceHolds(run.stops)).toBe(true);
    // West along I-40: Knoxville first, Little Rock last [the map's plain geography].
    expect(run.stops[0]!.place.city).toBe("Knoxville");
    expect(run.stops.at(-1)!.place.city).toBe("Little Rock");
    expect(run.stops[0]!.at).toBe(DEPART);
    // Times only go forward.
    const times = run.stops.map((s) => Date.parse(s.at));
    expect([...times].sort((x, y) => x - y)).toEqual(times);
    // The stops lie near one east–west line, so the run is about Knoxville → Little Rock by road:
    // haversine × 1.2 [memory, Ballou et al. 2002] at 88 km/h [practice], within 10 %.
    const straightH = roadKm(PLACES.knoxville, PLACES.littleRock) / 88;
    expect(run.drivingH).toBeGreaterThanOrEqual(straightH - 0.01);
    expect(run.drivingH).toBeLessThan(straightH * 1.1);
    expect(run.guidance).toMatch(/49 CFR 395\.3/);
    expect(run.guidance).toMatch(/10,000 lb/);
    expect(run.vehicleRangeF).toEqual({ min: 68, max: 78 });
    // More than 8 h of driving: a 30-minute break (49 CFR 395.3(a)(3)(ii)) about 700 km west of
    // Knoxville, in Central time (west Tennessee and Arkansas: 49 CFR 71.7 [memory]; tz-lookup's data).
    expect(run.rests.length).toBeGreaterThan(0);
    for (const rest of run.rests) {
      expect(rest.timeZone).toBe("America/Chicago");
      expect(rest.near === null || /, (TN|AR)$/.test(rest.near)).toBe(true);
    }
    expect(run.drivers).toEqual([{ id: service.courier.id, displayName: service.courier.displayName }]);
    expect(run.version).toBe(1);
    const firstStop = run.stops[0]!;
    expect(firstStop.transferNumber).toMatch(/\S/);
    expect(firstStop.boxCount).toBe(1);
    expect(firstStop.party.organizationName).toMatch(/\S/);

    // GET answers at least everything POST did.
    const got = await service.boss.get(`/api/runs/${run.id}`);
    expect(got.status).toBe(200);
    expect(got.body).toEqual(run);

    // The transfer API names the run.
    const asSender = await signIn(t.app, a.sender.email);
    expect((await asSender.get(`/api/transfers/${a.transfer.id}`)).body.transfer.runId).toBe(run.id);

    // Each transfer takes its pickup and drop-off times and the van from the run, with history.
    for (const id of ids) {
      const row = await transferRow(id);
      const pickup = run.stops.find((s) => s.transferId === id && s.kind === "pickup")!;
      const dropoff = run.stops.find((s) => s.transferId === id && s.kind === "dropoff")!;
      expect(row.plannedDepartureAt.toISOString()).toBe(pickup.at);
      expect(row.expectedArrivalAt.toISOString()).toBe(dropoff.at);
      expect([row.vehicle, row.vehicleMinF, row.vehicleMaxF]).toEqual(["climate_controlled", 68, 78]);
      const fields = (await em().find(TransferChangeSchema, { transfer: id })).map((ch) => ch.field);
      expect(fields).toEqual(expect.arrayContaining(["plannedDepartureAt", "expectedArrivalAt", "vehicle"]));
    }
  });

  it("makes the transfer's temperature check follow the run: its times and its van", async () => {
    const service = await courierService();
    const a = await carried(service, "knoxville", "memphis");
    const b = await carried(service, "nashville", "littleRock");
    const res = await service.boss.post("/api/runs", {
      departAt: DEPART,
      climateControlled: true,
      vehicleRangeF: { min: 66, max: 76 },
      transferIds: [a.transfer.id, b.transfer.id],
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const sender = await signIn(t.app, b.sender.email);
    const report = await sender.get(`/api/transfers/${b.transfer.id}/temperature`);
    expect(report.status).toBe(200);
    expect(report.body.vehicle).toMatchObject({ conditioning: "climate_controlled", rangeF: { min: 66, max: 76 } });
    const source = report.body.sources.find((s: { id: string }) => s.id === "following-run");
    const pickup = (res.body as RunDto).stops.find((s) => s.transferId === b.transfer.id && s.kind === "pickup")!;
    const dropoff = (res.body as RunDto).stops.find((s) => s.transferId === b.transfer.id && s.kind === "dropoff")!;
    expect(source?.title).toContain(pickup.at);
    expect(source?.title).toContain(dropoff.at);
    // The stored check after the plan was made for the transfer's new version.
    const row = await transferRow(b.transfer.id);
    expect(report.body.transferVersion).toBe(row.version);
  });
});

describe("who may plan and see runs", () => {
  it("lets the service's couriers read but not plan; other organisations get 404, keepers 403 on planning", async () => {
    const service = await courierService();
    const a = await carried(service, "knoxville", "memphis");
    const created = await service.boss.post("/api/runs", {
      departAt: DEPART,
      climateControlled: false,
      transferIds: [a.transfer.id],
    });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    const path = `/api/runs/${created.body.id}`;

    const courier = await signIn(t.app, service.courier.email);
    expect((await courier.get(path)).status).toBe(200);
    expect((await courier.get(path)).body.abilities).toEqual({ edit: false });
    expect((await courier.patch(path, { departAt: DEPART })).status).toBe(403);
    expect(
      (await courier.post("/api/runs", { departAt: DEPART, climateControlled: false, transferIds: [a.transfer.id] }))
        .status,
    ).toBe(403);

    // The service's people list its runs; another service's list is empty of them.
    for (const client of [service.boss, courier])
      expect((await client.get("/api/runs")).body.runs.map((r: { id: string }) => r.id)).toEqual([created.body.id]);
    const other = await courierService();
    expect((await other.boss.get("/api/runs")).body.runs).toEqual([]);
    expect((await other.boss.get(path)).status).toBe(404);
    expect((await other.boss.patch(path, { departAt: DEPART })).status).toBe(404);
    const keeper = await signIn(t.app, a.sender.email);
    expect((await keeper.get(path)).status).toBe(404);
    expect(
      (await keeper.post("/api/runs", { departAt: DEPART, climateControlled: false, transferIds: [a.transfer.id] }))
        .status,
    ).toBe(403);
    // Another service may not put this service's transfer on its run; the answer does not name it.
    const stolen = await other.boss.post("/api/runs", {
      departAt: DEPART,
      climateControlled: false,
      transferIds: [a.transfer.id],
    });
    expect([stolen.status, stolen.body.error.field]).toEqual([400, "transferIds.0"]);
    expect(stolen.body.error.message).not.toContain(a.transfer.number);
  });

  it("refuses bad input with a 400 in plain words and changes nothing", async () => {
    const service = await courierService();
    const a = await carried(service, "knoxville", "memphis");
    const air = await buildTransfer(em(), { status: "ready", mode: "overnight_air", couriers: [service.courier] });
    await em().nativeUpdate(TransferSchema, { id: air.transfer.id }, { courierService: service.org.id });
    const draft = await buildTransfer(em(), { status: "draft", mode: "ground_courier", couriers: [] });
    await em().nativeUpdate(TransferSchema, { id: draft.transfer.id }, { courierService: service.org.id });
    const before = await transferRow(a.transfer.id);
    const cases: [unknown, string][] = [
      [{ departAt: "tomorrow", climateControlled: false, transferIds: [a.transfer.id] }, "departAt"],
      [{ departAt: DEPART, climateControlled: false, transferIds: [] }, "transferIds"],
      [
        {
          departAt: DEPART,
          climateControlled: false,
          vehicleRangeF: { min: 60, max: 70 },
          transferIds: [a.transfer.id],
        },
        "vehicleRangeF",
      ],
      [
        {
          departAt: DEPART,
          climateControlled: true,
          vehicleRangeF: { min: 80, max: 70 },
          transferIds: [a.transfer.id],
        },
        "vehicleRangeF.max",
      ],
      [{ departAt: DEPART, climateControlled: false, transferIds: [a.transfer.id, a.transfer.id] }, "transferIds"],
      [{ departAt: DEPART, climateControlled: false, transferIds: [a.transfer.id], extra: 1 }, "extra"],
      [{ departAt: DEPART, climateControlled: false, transferIds: [a.transfer.id, air.transfer.id] }, "transferIds.1"],
      [{ departAt: DEPART, climateControlled: false, transferIds: [draft.transfer.id] }, "transferIds.0"],
      [
        { departAt: DEPART, climateControlled: false, transferIds: [a.transfer.id], driverIds: [a.sender.id] },
        "driverIds.0",
      ],
    ];
    for (const [body, field] of cases) {
      const res = await service.boss.post("/api/runs", body);
      expect([res.status, res.body.error?.field], JSON.stringify(body)).toEqual([400, field]);
      expect(res.body.error.message).toMatch(/^[A-Z].*\.$/);
    }
    expect(await em().count(RunSchema, { courierOrganization: service.org.id })).toBe(0);
    const after = await transferRow(a.transfer.id);
    expect([after.version, after.plannedDepartureAt.toISOString()]).toEqual([
      before.version,
      before.plannedDepartureAt.toISOString(),
    ]);
  });

  it("puts a transfer on one run at most", async () => {
    const service = await courierService();
    const a = await carried(service, "knoxville", "memphis");
    const body = { departAt: DEPART, climateControlled: false, transferIds: [a.transfer.id] };
    expect((await service.boss.post("/api/runs", body)).status).toBe(201);
    const again = await service.boss.post("/api/runs", body);
    expect(again.status).toBe(409);
    expect(again.body.error.message).toContain(a.transfer.number);
    expect(await em().count(RunSchema, { courierOrganization: service.org.id })).toBe(1);
  });
});

describe("the run sheet", () => {
  it("prints the stops, the boxes and their contents, the states' paperwork or NOT REVIEWED, for the service only", async () => {
    const service = await courierService();
    const a = await carried(service, "knoxville", "littleRock");
    const created = await service.boss.post("/api/runs", {
      departAt: DEPART,
      climateControlled: true,
      vehicleRangeF: { min: 68, max: 78 },
      transferIds: [a.transfer.id],
    });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    const path = `/api/runs/${created.body.id}/sheet.pdf`;
    const res = await service.boss
      .get(path)
      .buffer(true)
      .parse((response, done) => {
        const chunks: Buffer[] = [];
        response.on("data", (chunk: Buffer) => chunks.push(chunk));
        response.on("end", () => done(null, Buffer.concat(chunks)));
      });
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toBe("application/pdf");
    const text = (await extractPageTexts(new Uint8Array(res.body as Buffer))).join(" ");
    expect(text).toContain(a.transfer.number);
    expect(text).toContain("418 Quarry Hollow Road, Knoxville, TN 37917");
    expect(text).toContain("3 Pinnacle Court, Little Rock, AR 72201");
    expect(text).toMatch(/Load Box A, seal SEAL-1: Pantherophis guttatus × 2 \(not venomous\)/);
    // Tennessee to Arkansas; the seed reviews no state, so every one says so (D25).
    expect(text).toMatch(/Tennessee \(TN\) • NOT REVIEWED/);
    expect(text).toMatch(/Arkansas \(AR\) • NOT REVIEWED/);
    expect(text).toContain("Van temperature log");
    expect((await (await signIn(t.app, service.courier.email)).get(path)).status).toBe(200);
    expect((await (await courierService()).boss.get(path)).status).toBe(404);
    expect((await (await signIn(t.app, a.receiver.email)).get(path)).status).toBe(404);
  });
});

describe("changing a run", () => {
  async function planned(service: Service) {
    const a = await carried(service, "knoxville", "memphis");
    const b = await carried(service, "nashville", "littleRock");
    const res = await service.boss.post("/api/runs", {
      departAt: DEPART,
      climateControlled: true,
      transferIds: [a.transfer.id, b.transfer.id],
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    return { a, b, run: res.body as RunDto, path: `/api/runs/${res.body.id}` };
  }

  it("takes an explicit order that keeps pickups first, refuses one that does not, and replans the times", async () => {
    const service = await courierService();
    const { a, b, run, path } = await planned(service);
    const order = run.stops.map((s) => ({ kind: s.kind, transferId: s.transferId }));
    // Drop-off before pickup: refused in plain words, nothing changes.
    const backwards = [
      { kind: "dropoff", transferId: a.transfer.id },
      ...order.filter((s) => !(s.kind === "dropoff" && s.transferId === a.transfer.id)),
    ];
    const refused = await service.boss.patch(path, { stops: backwards });
    expect([refused.status, refused.body.error.field]).toEqual([400, "stops"]);
    expect(refused.body.error.message).toContain("before its pickup");
    expect(refused.body.error.message).toContain(a.transfer.number);
    expect((await service.boss.get(path)).body).toEqual(run);
    // A stop missing: refused.
    expect((await service.boss.patch(path, { stops: order.slice(1) })).status).toBe(400);

    // Both pickups first, then Little Rock before Memphis: the long way round.
    const detour = [
      { kind: "pickup", transferId: a.transfer.id },
      { kind: "pickup", transferId: b.transfer.id },
      { kind: "dropoff", transferId: b.transfer.id },
      { kind: "dropoff", transferId: a.transfer.id },
    ];
    const moved = await service.boss.patch(path, { stops: detour, version: run.version });
    expect(moved.status, JSON.stringify(moved.body)).toBe(200);
    expect(
      moved.body.stops.map((s: { kind: string; transferId: string }) => ({ kind: s.kind, transferId: s.transferId })),
    ).toEqual(detour);
    expect(moved.body.version).toBe(run.version + 1);
    expect(moved.body.drivingH).toBeGreaterThan(run.drivingH);
    const row = await transferRow(a.transfer.id);
    expect(row.expectedArrivalAt.toISOString()).toBe(moved.body.stops[3].at);
    // A set range on a van that is not climate-controlled is refused; changing the van is not.
    const plain = await service.boss.patch(path, { climateControlled: false });
    expect([plain.body.climateControlled, plain.body.vehicleRangeF]).toEqual([false, null]);
    expect((await transferRow(a.transfer.id)).vehicle).toBe("unconditioned");
    const ranged = await service.boss.patch(path, { vehicleRangeF: { min: 60, max: 70 } });
    expect([ranged.status, ranged.body.error.field]).toEqual([400, "vehicleRangeF"]);
    const cooled = await service.boss.patch(path, { climateControlled: true, vehicleRangeF: { min: 60, max: 70 } });
    expect(cooled.body.vehicleRangeF).toEqual({ min: 60, max: 70 });
    expect((await transferRow(a.transfer.id)).vehicleMinF).toBe(60);
    // A stale version is a 409.
    expect((await service.boss.patch(path, { stops: detour, version: run.version })).status).toBe(409);
  });

  it("adds and removes transfers", async () => {
    const service = await courierService();
    const { a, b, path } = await planned(service);
    const c = await carried(service, "memphis", "littleRock");
    const added = await service.boss.patch(path, { addTransferIds: [c.transfer.id] });
    expect(added.status, JSON.stringify(added.body)).toBe(200);
    expect(added.body.stops).toHaveLength(6);
    expect(precedenceHolds(added.body.stops)).toBe(true);
    const removed = await service.boss.patch(path, { removeTransferIds: [a.transfer.id] });
    expect(removed.status).toBe(200);
    expect(new Set(removed.body.stops.map((s: { transferId: string }) => s.transferId))).toEqual(
      new Set([b.transfer.id, c.transfer.id]),
    );
    expect(await em().count(RunStopSchema, { transfer: a.transfer.id })).toBe(0);
    // Removing what is not on the run, or everything, is refused.
    expect((await service.boss.patch(path, { removeTransferIds: [a.transfer.id] })).status).toBe(400);
    expect((await service.boss.patch(path, { removeTransferIds: [b.transfer.id, c.transfer.id] })).status).toBe(400);
    // A transfer taken off can go on another run.
    const other = await service.boss.post("/api/runs", {
      departAt: DEPART,
      climateControlled: false,
      transferIds: [a.transfer.id],
    });
    expect(other.status).toBe(201);
  });

  it("keeps a picked-up transfer on the run: later changes move only its arrival; bad additions are named by their place", async () => {
    const service = await courierService();
    const { a, b, path } = await planned(service);
    const before = await transferRow(a.transfer.id);
    const bBefore = await transferRow(b.transfer.id);
    // The pickup was recorded (the handoff service moves the status; here the state is set directly).
    await em().nativeUpdate(TransferSchema, { id: a.transfer.id }, { status: "in_transit" });
    const later = await service.boss.patch(path, {
      departAt: new Date(Date.parse(DEPART) + 3 * 3_600_000).toISOString(),
    });
    expect(later.status, JSON.stringify(later.body)).toBe(200);
    const after = await transferRow(a.transfer.id);
    expect(after.plannedDepartureAt.toISOString()).toBe(before.plannedDepartureAt.toISOString());
    expect(after.expectedArrivalAt.getTime() - before.expectedArrivalAt.getTime()).toBe(3 * 3_600_000);
    // The transfer not yet picked up moves both ways.
    expect((await transferRow(b.transfer.id)).plannedDepartureAt.getTime() - bBefore.plannedDepartureAt.getTime()).toBe(
      3 * 3_600_000,
    );
    const c = await carried(service, "memphis", "littleRock");
    const air = await buildTransfer(em(), { status: "ready", mode: "overnight_air", couriers: [service.courier] });
    await em().nativeUpdate(TransferSchema, { id: air.transfer.id }, { courierService: service.org.id });
    const refused = await service.boss.patch(path, { addTransferIds: [c.transfer.id, air.transfer.id] });
    expect([refused.status, refused.body.error.field]).toEqual([400, "addTransferIds.1"]);
    expect(refused.body.error.message).toContain(air.transfer.number);
  });

  it("tells the sender and the receiver when their arrival moves by more than 2 hours", async () => {
    const service = await courierService();
    const { a, b, run, path } = await planned(service);
    const aDropoff = run.stops.find((s) => s.transferId === a.transfer.id && s.kind === "dropoff")!;
    const bDropoff = run.stops.find((s) => s.transferId === b.transfer.id && s.kind === "dropoff")!;
    // One hour later: nobody is told.
    const hour = await service.boss.patch(path, { departAt: new Date(Date.parse(DEPART) + 3_600_000).toISOString() });
    expect(hour.status).toBe(200);
    expect(hour.body.notified).toEqual([]);
    expect(
      await em().count(OutboxMessageSchema, { topic: "transfer.arrival_moved", toAddress: a.receiver.email }),
    ).toBe(0);
    // A day later: both parties of both transfers are told, and the answer says who.
    const day = await service.boss.patch(path, {
      departAt: new Date(Date.parse(DEPART) + 25 * 3_600_000).toISOString(),
    });
    expect(day.status).toBe(200);
    expect(day.body.notified).toHaveLength(2);
    for (const [cast, dropoff] of [
      [a, aDropoff],
      [b, bDropoff],
    ] as const) {
      const entry = day.body.notified.find((n: { transferId: string }) => n.transferId === cast.transfer.id);
      expect(entry.arrivalMovedH).toBeCloseTo(24, 1);
      expect(entry.told).toEqual(
        expect.arrayContaining([
          { party: "sender", name: cast.sender.displayName },
          { party: "receiver", name: cast.receiver.displayName },
        ]),
      );
      for (const person of [cast.sender, cast.receiver]) {
        const mails = await em().find(OutboxMessageSchema, {
          topic: "transfer.arrival_moved",
          toAddress: person.email,
        });
        expect(mails).toHaveLength(1);
        expect(mails[0]!.textBody).toContain(cast.transfer.number);
      }
      expect((await transferRow(cast.transfer.id)).expectedArrivalAt.getTime()).toBe(
        Date.parse(dropoff.at) + 25 * 3_600_000,
      );
    }
    // The re-check ran on the new times.
    expect(day.body.temperature).toHaveLength(2);
  });
});
