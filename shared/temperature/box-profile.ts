import type { ProfileGroup } from "../constants";
import type { AnimalClass, TemperatureProfile } from "./profiles";

/**
 * Grams allowed for what travels with the animals when the sender gives no box contents: deli
 * cups, damp paper or moss [practice, estimate]. Lighter contents follow the outside air
 * faster, so both allowances err light, toward the cautious side.
 */
export const PACKING_ALLOWANCE_G = 200;
/** Grams assumed for an animal whose weight is not recorded: a juvenile of a small species [practice, estimate]. */
export const UNKNOWN_ANIMAL_WEIGHT_G = 50;

/** An animal line as the box model needs it: how many, how heavy, and which profile group it belongs to. */
export type AnimalLine = {
  count: number;
  weightG: number | null;
  /** Null for a genus-level entry or a taxon without a group. */
  profileGroup: ProfileGroup | null;
  /** The animal's class from the taxon tree; null when it cannot be told. */
  animalClass: AnimalClass | null;
};

/** Water-equivalent contents of a box, g: the packing allowance plus every animal (recorded or assumed weight). */
export function boxContentsG(lines: readonly AnimalLine[]): number {
  return lines.reduce((sum, line) => sum + line.count * (line.weightG ?? UNKNOWN_ANIMAL_WEIGHT_G), PACKING_ALLOWANCE_G);
}

/**
 * The profile with the least room for error: the narrowest safe transit range, and on a tie the
 * lower maximum, since overheating kills more often than cold [practice]. Undefined for none.
 */
export function mostCautiousProfile(profiles: readonly TemperatureProfile[]): TemperatureProfile | undefined {
  const width = (p: TemperatureProfile) => p.safeTransitF.max - p.safeTransitF.min;
  return [...profiles].sort(
    (a, b) => width(a) - width(b) || a.safeTransitF.max - b.safeTransitF.max || a.group.localeCompare(b.group),
  )[0];
}

/**
 * The profile a box travels under. Each animal brings its group's profile; one without a group
 * (a genus-level entry) takes the most cautious profile of its class among the transfer's
 * animals, else of its class among all profiles, else the most cautious reptile profile (the
 * reptile default). Several profiles in one box give the most cautious of them.
 */
export function profileForBox(
  box: readonly AnimalLine[],
  transfer: readonly AnimalLine[],
  profiles: Readonly<Record<ProfileGroup, TemperatureProfile>>,
): TemperatureProfile {
  const all = Object.values(profiles);
  const known = transfer.flatMap((l) => (l.profileGroup ? [profiles[l.profileGroup]] : []));
  const fallback = (animalClass: AnimalClass | null) =>
    mostCautiousProfile(known.filter((p) => animalClass === null || p.animalClass === animalClass)) ??
    mostCautiousProfile(all.filter((p) => p.animalClass === (animalClass ?? "reptile")))!;
  const candidates = box.map((l) => (l.profileGroup ? profiles[l.profileGroup] : fallback(l.animalClass)));
  return mostCautiousProfile(candidates) ?? fallback(null);
}
