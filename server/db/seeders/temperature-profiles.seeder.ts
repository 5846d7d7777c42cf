import type pg from "pg";
import { DEFAULT_PROFILES } from "@shared/temperature/profiles";
import { profileDataOf } from "@shared/temperature/profile-schema";

/**
 * Loads the guideline default of every temperature profile group (reference data, not demo
 * data) when the table is empty; admins edit them from there.
 */
export async function seedTemperatureProfiles(client: pg.Pool | pg.Client): Promise<number> {
  const { rows } = await client.query<{ n: number }>("SELECT count(*)::int AS n FROM temperature_profile");
  if ((rows[0]?.n ?? 0) > 0) return 0;
  const profiles = Object.values(DEFAULT_PROFILES);
  await client.query(
    `INSERT INTO temperature_profile (profile_group, data, updated_by_id, updated_at)
     SELECT g, d, NULL, now() FROM unnest($1::text[], $2::jsonb[]) AS u(g, d)`,
    [profiles.map((p) => p.group), profiles.map((p) => JSON.stringify(profileDataOf(p)))],
  );
  return profiles.length;
}
