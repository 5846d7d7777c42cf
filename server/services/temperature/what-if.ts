import type { EntityManager } from "@mikro-orm/postgresql";
import { profileForBox, type AnimalLine } from "@shared/temperature/box-profile";
import { resolvePlace, type TransitPlace } from "@shared/temperature/places";
import type { TemperatureProfile } from "@shared/temperature/profiles";
import type { TemperatureReport } from "@shared/temperature/report";
import type { PlaceInputParsed, WhatIfInput } from "@shared/temperature/schemas";
import { invalidField } from "../../http/errors";
import { assessBoxes, type AmbientPlan } from "./assess-boxes";
import { exposureOf } from "./exposure-plan";
import type { WeatherSource } from "./forecasts";
import { loadProfiles } from "./profiles";
import { animalClasses } from "./transfer-temperature";

/** A taxon found by its scientific name or one of its synonyms, with what the profile choice needs. */
export type ProfileTaxon = { id: string; scientificName: string; profileGroup: AnimalLine["profileGroup"] };

export async function findTaxonByName(em: EntityManager, name: string): Promise<ProfileTaxon | null> {
  const rows = await em.execute<{ id: string; scientific_name: string; profile_group: AnimalLine["profileGroup"] }[]>(
    `SELECT id, scientific_name, profile_group FROM taxon WHERE lower(scientific_name) = lower(?) OR ? = ANY(synonyms)
      ORDER BY (lower(scientific_name) = lower(?)) DESC LIMIT 1`,
    [name, name, name],
  );
  const row = rows[0];
  return row ? { id: row.id, scientificName: row.scientific_name, profileGroup: row.profile_group } : null;
}

function placeOrFail(input: PlaceInputParsed, field: string): TransitPlace {
  const place = resolvePlace(input);
  if (!place) throw invalidField([field, "zip"], "this is not a US ZIP code we know; check it or give another nearby");
  return place;
}

/** The profile for a what-if: the group named, or the taxon's (a genus takes its class's most cautious). */
async function whatIfProfile(
  em: EntityManager,
  input: WhatIfInput,
  taxon: ProfileTaxon | null,
): Promise<TemperatureProfile> {
  const profiles = await loadProfiles(em);
  if (input.profile) return profiles[input.profile];
  const classes = taxon ? await animalClasses(em, [taxon.id]) : new Map();
  const line: AnimalLine = {
    count: 1,
    weightG: null,
    profileGroup: taxon?.profileGroup ?? null,
    animalClass: (taxon && classes.get(taxon.id)) ?? null,
  };
  return profileForBox([line], [line], profiles);
}

/**
 * A trip planned before any transfer exists: one box, one profile, the forecast through the
 * cache or the caller's own outside temperatures, the vehicle and stops the planner gives.
 * Stores nothing but forecasts.
 */
export async function assessWhatIf({
  em,
  source,
  input,
  taxon,
  nowMs,
}: {
  em: EntityManager;
  source: WeatherSource;
  input: WhatIfInput;
  taxon: ProfileTaxon | null;
  nowMs: number;
}): Promise<TemperatureReport> {
  const origin = placeOrFail(input.origin, "origin");
  const destination = placeOrFail(input.destination, "destination");
  const hub = input.hub ? placeOrFail(input.hub, "hub") : undefined;
  const profile = await whatIfProfile(em, input, taxon);
  const plan: AmbientPlan = input.ambientOverrideF
    ? { kind: "override", samples: input.ambientOverrideF }
    : { kind: "forecast", source, nowMs };
  const { driving, exposure } = exposureOf(input, Date.parse(input.departAt));
  try {
    return await assessBoxes(
      { mode: input.mode, origin, destination, hub, departAt: input.departAt, options: { driving } },
      [{ containerId: null, label: "Box", box: input.box, profile }],
      plan,
      profile,
      undefined,
      exposure,
    );
  } catch (err) {
    // The model refuses a trip it cannot lay out (longer than it covers); its own words are for developers.
    if (err instanceof RangeError)
      throw invalidField(
        ["mode"],
        "this trip cannot be modelled this way; check the places, the date and how the animals travel",
      );
    throw err;
  }
}
