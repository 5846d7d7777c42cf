/**
 * How long new arrivals stay in quarantine: the organisation's length, or a longer (or shorter)
 * one it set for a genus or a species — 30–90 days is common, longer for boas [practice:
 * SOURCES.md]. The species' own setting wins over its genus; the genus is the first word of the
 * scientific name.
 */
export type QuarantineOverride = { name: string; days: number };

const normal = (name: string) => name.trim().replace(/\s+/g, " ").toLowerCase();

export function quarantineDaysFor(
  scientificName: string,
  defaultDays: number,
  overrides: readonly QuarantineOverride[],
): number {
  const name = normal(scientificName);
  const genus = name.split(" ")[0];
  const bySpecies = overrides.find((o) => normal(o.name) === name);
  if (bySpecies) return bySpecies.days;
  // A subspecies takes its species' setting before its genus'.
  const species = name.split(" ").slice(0, 2).join(" ");
  const bySpeciesOfSubspecies = overrides.find((o) => normal(o.name) === species);
  if (bySpeciesOfSubspecies) return bySpeciesOfSubspecies.days;
  const byGenus = overrides.find((o) => normal(o.name) === genus);
  return byGenus ? byGenus.days : defaultDays;
}
