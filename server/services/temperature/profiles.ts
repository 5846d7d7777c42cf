import type { EntityManager } from "@mikro-orm/postgresql";
import { ref } from "@mikro-orm/core";
import type { ProfileGroup } from "@shared/constants";
import { profileDataSchema, profileFromData, type ProfileData } from "@shared/temperature/profile-schema";
import { DEFAULT_PROFILES, type TemperatureProfile } from "@shared/temperature/profiles";
import type { Actor } from "../../auth/actor";
import { TemperatureProfileSchema, type TemperatureProfileRow } from "../../db/entities/temperature.entity";
import { UserSchema } from "../../db/entities/user.entity";

export type ProfileTable = Record<ProfileGroup, TemperatureProfile>;

/** Every group's profile as admins left it; a group without a usable row keeps its guideline default. */
export async function loadProfiles(em: EntityManager): Promise<ProfileTable> {
  const table: ProfileTable = { ...DEFAULT_PROFILES };
  for (const row of await em.find(TemperatureProfileSchema, {})) {
    const parsed = profileDataSchema.safeParse(row.data);
    if (parsed.success) table[row.profileGroup] = profileFromData(row.profileGroup, parsed.data);
    else console.error(`[temperature] stored profile ${row.profileGroup} is not valid; using the guideline default`);
  }
  return table;
}

/** The stored rows (with who edited them), for the profiles screen. */
export async function loadProfileRows(em: EntityManager): Promise<Map<ProfileGroup, TemperatureProfileRow>> {
  const rows = await em.find(TemperatureProfileSchema, {}, { populate: ["updatedBy"] });
  return new Map(rows.map((r) => [r.profileGroup, r]));
}

/** Replaces a group's profile with an admin's edit (already validated). */
export async function saveProfile({
  em,
  actor,
  input,
}: {
  em: EntityManager;
  actor: Actor;
  input: { group: ProfileGroup; data: ProfileData };
}) {
  const values = { data: input.data, updatedBy: ref(em.getReference(UserSchema, actor.id)), updatedAt: new Date() };
  const row = await em.findOne(TemperatureProfileSchema, { profileGroup: input.group });
  if (row) em.assign(row, values);
  else em.create(TemperatureProfileSchema, { profileGroup: input.group, ...values });
  await em.flush();
}
