import type { EntityManager } from "@mikro-orm/postgresql";
import type { RunSummaryDto } from "@shared/schemas/run";
import { RunSchema, RunStopSchema, type Run, type RunStop } from "../../db/entities/run.entity";
import { ContainerSchema, TransferSchema, type Transfer } from "../../db/entities/transfer.entity";
import { OrganizationSchema, type Organization } from "../../db/entities/organization.entity";
import { UserSchema, type User } from "../../db/entities/user.entity";

/** Everything a run's page and sheet show, read in a handful of queries. */
export type RunView = {
  run: Run;
  organization: Organization;
  stops: RunStop[];
  transfers: Map<string, Transfer>;
  boxCounts: Map<string, number>;
  organizations: Map<string, Organization>;
  people: Map<string, User>;
};

export async function readRunView(em: EntityManager, run: Run): Promise<RunView> {
  const stops = await em.find(RunStopSchema, { run }, { orderBy: { position: "asc" } });
  const transferIds = [...new Set(stops.map((s) => s.transfer.id))];
  const transfers = await em.find(TransferSchema, { id: { $in: transferIds } });
  const counts = transferIds.length
    ? await em.execute<{ transfer_id: string; boxes: string }[]>(
        `SELECT transfer_id, count(*) AS boxes FROM container WHERE transfer_id IN (?) GROUP BY transfer_id`,
        [transferIds],
      )
    : [];
  const orgIds = new Set([run.courierOrganization.id]);
  const personIds = new Set(run.driverIds);
  for (const t of transfers) {
    orgIds.add(t.senderOrganization.id);
    orgIds.add(t.receiverOrganization.id);
    if (t.senderContact) personIds.add(t.senderContact.id);
    if (t.receiverContact) personIds.add(t.receiverContact.id);
  }
  const [organizations, people] = await Promise.all([
    em.find(OrganizationSchema, { id: { $in: [...orgIds] } }),
    personIds.size ? em.find(UserSchema, { id: { $in: [...personIds] } }) : Promise.resolve([] as User[]),
  ]);
  const orgMap = new Map(organizations.map((o) => [o.id, o]));
  return {
    run,
    organization: orgMap.get(run.courierOrganization.id)!,
    stops,
    transfers: new Map(transfers.map((t) => [t.id, t])),
    boxCounts: new Map(counts.map((c) => [c.transfer_id, Number(c.boxes)])),
    organizations: orgMap,
    people: new Map(people.map((p) => [p.id, p])),
  };
}

/** Boxes of the run's transfers, for the sheet: label, seal and contents. */
export async function runBoxes(em: EntityManager, transferIds: readonly string[]) {
  if (transferIds.length === 0) return [];
  return em.find(ContainerSchema, { transfer: { $in: [...transferIds] } }, { orderBy: { position: "asc" } });
}

/**
 * The runs of the caller's courier service (its manager and couriers see them all), soonest
 * departure first; nobody else has any.
 */
export async function listRuns(em: EntityManager, organizationId: string | null): Promise<RunSummaryDto[]> {
  if (!organizationId) return [];
  const runs = await em.find(
    RunSchema,
    { courierOrganization: organizationId },
    { orderBy: { departAt: "asc", id: "asc" }, limit: 200 },
  );
  if (runs.length === 0) return [];
  const stops = await em.find(RunStopSchema, { run: { $in: runs.map((r) => r.id) } }, { orderBy: { position: "asc" } });
  return runs.map((run) => {
    const own = stops.filter((s) => s.run.id === run.id);
    return {
      id: run.id,
      departAt: run.departAt.toISOString(),
      finishAt: run.finishAt.toISOString(),
      climateControlled: run.climateControlled,
      stopCount: own.length,
      transferIds: [...new Set(own.map((s) => s.transfer.id))],
      drivingH: Math.round(run.drivingH * 100) / 100,
      version: run.version,
    };
  });
}
