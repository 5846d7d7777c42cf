import type { EntityManager } from "@mikro-orm/postgresql";
import type { RunSummaryDto } from "@shared/schemas/run";

type Row = {
  id: string;
  organization_id: string;
  organization_name: string;
  depart_at: Date;
  finish_at: Date;
  driving_h: number;
  road_km: number;
  climate_controlled: boolean;
  stop_count: number;
  transfer_numbers: string[];
  drivers: string[];
};

/** Most runs the list shows (the latest departures first). */
export const RUN_LIST_MAX = 100;

/** A courier service's runs (null: every service's, for an admin), one statement. */
export async function listRuns(em: EntityManager, organizationId: string | null): Promise<RunSummaryDto[]> {
  const rows = await em.execute<Row[]>(
    `SELECT r.id, r.courier_organization_id AS organization_id, o.name AS organization_name,
            r.depart_at, r.finish_at, r.driving_h, r.road_km, r.climate_controlled,
            (SELECT count(*)::int FROM run_stop s WHERE s.run_id = r.id) AS stop_count,
            (SELECT coalesce(json_agg(t.number ORDER BY s.position), '[]'::json)
               FROM run_stop s JOIN transfer t ON t.id = s.transfer_id
              WHERE s.run_id = r.id AND s.kind = 'pickup') AS transfer_numbers,
            (SELECT coalesce(json_agg(u.display_name ORDER BY u.display_name), '[]'::json)
               FROM app_user u WHERE u.id = ANY (r.driver_ids)) AS drivers
       FROM run r JOIN organization o ON o.id = r.courier_organization_id
      WHERE (?::uuid IS NULL OR r.courier_organization_id = ?::uuid)
      ORDER BY r.depart_at DESC, r.id
      LIMIT ${RUN_LIST_MAX}`,
    [organizationId, organizationId],
  );
  return rows.map((row) => ({
    id: row.id,
    courierOrganization: { id: row.organization_id, name: row.organization_name },
    departAt: new Date(row.depart_at).toISOString(),
    finishAt: new Date(row.finish_at).toISOString(),
    // Rounded as the run's own answer rounds them (run.presenter.ts).
    drivingH: Math.round(Number(row.driving_h) * 100) / 100,
    roadKm: Math.round(Number(row.road_km) * 10) / 10,
    climateControlled: row.climate_controlled,
    stopCount: row.stop_count,
    transferNumbers: row.transfer_numbers,
    drivers: row.drivers,
  }));
}
