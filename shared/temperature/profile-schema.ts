import { ANIMAL_CLASSES, LIMITS, type ProfileGroup } from "../constants";
import { measure } from "../schemas/common";
import { z } from "../validation/zod";
import { PLAUSIBLE_AMBIENT_F } from "./limits";
import type { TemperatureProfile } from "./profiles";

const tempFSchema = measure("temperature", { min: PLAUSIBLE_AMBIENT_F.min, max: PLAUSIBLE_AMBIENT_F.max });

/**
 * A temperature profile as admins edit it and as the database keeps it (the group is the key,
 * so it is not part of the data). Bands are °F and must be in the order `classifyAmbientF`
 * reads them: do not ship < heat pack < (cold pack ≤) hold ≤ do not ship above.
 */
export const profileDataSchema = z
  .strictObject({
    label: z.string().trim().min(1).max(LIMITS.nameMax),
    animalClass: z.enum(ANIMAL_CLASSES),
    safeTransitF: z.strictObject({ min: tempFSchema, max: tempFSchema }),
    bandsF: z.strictObject({
      doNotShipBelow: tempFSchema,
      heatPackBelow: tempFSchema,
      coldPackFrom: tempFSchema.nullable(),
      holdFrom: tempFSchema,
      doNotShipAbove: tempFSchema,
    }),
    source: z.string().trim().min(1).max(LIMITS.textMax),
  })
  .superRefine((profile, ctx) => {
    const { safeTransitF: safe, bandsF: b } = profile;
    if (!(safe.min < safe.max))
      ctx.addIssue({
        code: "custom",
        path: ["safeTransitF", "max"],
        params: { instruction: "make it higher than the lowest safe temperature" },
      });
    const rules: [keyof typeof b, boolean, string][] = [
      ["heatPackBelow", b.heatPackBelow > b.doNotShipBelow, "make it higher than “do not ship below”"],
      [
        "coldPackFrom",
        b.coldPackFrom === null || (b.coldPackFrom >= b.heatPackBelow && b.coldPackFrom < b.holdFrom),
        "make it at least “heat pack below” and lower than “hold from”",
      ],
      ["holdFrom", b.holdFrom >= b.heatPackBelow, "make it no lower than “heat pack below”"],
      ["doNotShipAbove", b.doNotShipAbove >= b.holdFrom, "make it no lower than “hold from”"],
    ];
    for (const [key, ordered, instruction] of rules) {
      if (!ordered) ctx.addIssue({ code: "custom", path: ["bandsF", key], params: { instruction } });
    }
  });

export type ProfileData = z.infer<typeof profileDataSchema>;

/** The editable data of a profile (everything but its group). */
export function profileDataOf(profile: TemperatureProfile): ProfileData {
  const { group: _group, ...data } = profile;
  return data;
}

/** A profile from its group and its stored data. */
export function profileFromData(group: ProfileGroup, data: ProfileData): TemperatureProfile {
  return { group, ...data };
}
