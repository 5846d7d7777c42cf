/**
 * Issue 16: the runs list the courier service's people open (GET /api/runs). Their own service's
 * runs only; keepers get a plain 403; an admin sees every service's.
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import type { RunDto, RunListDto } from "@shared/schemas/run";
import { TransferSchema } from "../../server/db/entities/transfer.entity";
import { buildOrganization, buildTransfer, buildUser } from "../factories";
import { createTestApp, signIn, type TestApp } from "../support/app";

let t: TestApp;
const em = () => t.orm.em.fork();
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

// Invented street addresses at ZIP centres (as tests/api/runs.test.ts uses).
const KNOXVILLE = {
  originCity: "Knoxville",
  originState: "TN",
  originZip: "37917",
  originLat: 35.99,
  originLon: -83.92,
};
const NASHVILLE = {
  destinationCity: "Nashville",
  destinationState: "TN",
  destinationZip: "37203",
  destinationLat: 36.15,
  destinationLon: -86.79,
};

async function serviceWithRun(name: string) {
  const org = await buildOrganization(em(), { kind: "courier_service", name, listed: true });
  const manager = await buildUser(em(), { role: "manager", organization: org });
  const courier = await buildUser(em(), { role: "courier", organization: org, displayName: `${name} driver` });
  const cast = await buildTransfer(em(), { status: "ready", mode: "ground_courier", couriers: [courier] });
  await em().nativeUpdate(
    TransferSchema,
    { id: cast.transfer.id },
    {
      courierService: org.id,
      originStreet: "1 Depot Lane",
      destinationStreet: "2 Yard Road",
      ...KNOXVILLE,
      ...NASHVILLE,
    },
  );
  const boss = await signIn(t.app, manager.email);
  const res = await boss.post("/api/runs", {
    departAt: "2026-12-14T13:00:00.000Z",
    climateControlled: false,
    driverIds: [courier.id],
    transferIds: [cast.transfer.id],
  });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return { org, manager, courier, cast, boss, run: res.body as RunDto };
}

describe("GET /api/runs", () => {
  it("lists a service's own runs to its manager and couriers, with the transfers and drivers", async () => {
    const mine = await serviceWithRun("Lark Road Couriers");
    const theirs = await serviceWithRun("Heron Van Lines");
    const res = await mine.boss.get("/api/runs");
    expect(res.status).toBe(200);
    const list = res.body as RunListDto;
    expect(list.runs.map((r) => r.id)).toEqual([mine.run.id]);
    expect(list.runs[0]).toMatchObject({
      courierOrganization: { id: mine.org.id, name: "Lark Road Couriers" },
      departAt: "2026-12-14T13:00:00.000Z",
      finishAt: mine.run.finishAt,
      stopCount: 2,
      transferNumbers: [mine.cast.transfer.number],
      drivers: ["Lark Road Couriers driver"],
      climateControlled: false,
    });
    expect(list.runs[0]!.drivingH).toBe(mine.run.drivingH);
    expect(list.runs[0]!.roadKm).toBe(mine.run.roadKm);
    const driver = await signIn(t.app, mine.courier.email);
    expect(((await driver.get("/api/runs")).body as RunListDto).runs.map((r) => r.id)).toEqual([mine.run.id]);
    const admin = await signIn(t.app, (await buildUser(em(), { role: "admin", organization: null })).email);
    const all = ((await admin.get("/api/runs")).body as RunListDto).runs.map((r) => r.id);
    expect(all).toEqual(expect.arrayContaining([mine.run.id, theirs.run.id]));
  });

  it("refuses keepers in plain words and changes nothing", async () => {
    const keeperOrg = await buildOrganization(em(), { kind: "breeder" });
    const keeper = await buildUser(em(), { role: "manager", organization: keeperOrg });
    const res = await (await signIn(t.app, keeper.email)).get("/api/runs");
    expect(res.status).toBe(403);
    expect(JSON.stringify(res.body)).toMatch(/courier services/);
  });
});
