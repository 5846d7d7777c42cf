import { ANIMAL_ORIGINS, DOCUMENT_KINDS, LIMITS, PURPOSES, SEXES, US_STATES } from "@shared/constants";
import { NO_CONTROL_CHARACTERS } from "../schemas/common";
import { z } from "../validation/zod";
import { FEDERAL, JURISDICTIONS } from "./jurisdiction";
import { taxonSelectorSchema } from "./taxon";

/**
 * What a rule governs, read against the route:
 * - import: the rule's state is the destination of an interstate move (or a transit state that
 *   is not transit-only exempt);
 * - export: the rule's state is the origin of an interstate move;
 * - transit: the rule's state is one the route passes through;
 * - possession: the rule's state is the destination (also within the state); federal: always;
 * - interstate: the move crosses a state line and the rule's state is an end of it; federal: any
 *   interstate move;
 * - movement: any transfer that touches the rule's state, within it or across; federal: always.
 */
export const GOVERNS = ["import", "export", "transit", "possession", "interstate", "movement"] as const;
export type Governs = (typeof GOVERNS)[number];

/** Which party of a transfer holds a document. */
export const HOLDER_SIDES = ["receiver", "sender"] as const;
export type HolderSide = (typeof HOLDER_SIDES)[number];

/** Text every demo rule's citation carries, so no one takes it for a state's law. */
export const DEMO_RULE_NOTICE = "demo rule, not a statement of that state's law";

const PERMIT_KINDS = DOCUMENT_KINDS.filter((kind) => kind !== "cvi");

const isoDate = z.iso.date();
const text = (max: number) =>
  z
    .string()
    .trim()
    .min(1)
    .max(max)
    .refine((value) => !value.includes("\u0000"), { params: { instruction: NO_CONTROL_CHARACTERS } });

export const citationSchema = z.strictObject({
  text: text(LIMITS.textMax),
  url: z
    .url({ protocol: /^https$/ })
    .max(LIMITS.textMax)
    .nullable(),
});
export type Citation = z.infer<typeof citationSchema>;

/** Every condition given must hold for the rule to apply (they combine with AND). */
export const ruleConditionsSchema = z.strictObject({
  origins: z.array(z.enum(ANIMAL_ORIGINS)).min(1).optional(),
  purposes: z.array(z.enum(PURPOSES)).min(1).optional(),
  /** Purposes the rule exempts (e.g. bona fide scientific or educational use). */
  exceptPurposes: z.array(z.enum(PURPOSES)).min(1).optional(),
  /** true: only a sale or commercial distribution; purpose "commercial_sale" counts as one. */
  sale: z.boolean().optional(),
  /** Applies when the animal's length is strictly below this many millimetres. */
  lengthBelowMm: z.number().positive().max(LIMITS.lengthMmMax).optional(),
  /** Applies when the animal's length is strictly above this many millimetres. */
  lengthAboveMm: z.number().nonnegative().max(LIMITS.lengthMmMax).optional(),
  /** Applies when the line's count is strictly above this number. */
  countAbove: z.int().min(0).max(LIMITS.animalCountMax).optional(),
  sexes: z.array(z.enum(SEXES)).min(1).optional(),
  venomous: z.boolean().optional(),
  /** true: only a move that starts or ends outside the continental US; false: only one that does not. */
  routeLeavesContinental: z.boolean().optional(),
});
export type RuleConditions = z.infer<typeof ruleConditionsSchema>;

/** A permit that satisfies a rule: any of the kinds, held by the named side. */
export const permitRequirementSchema = z.strictObject({
  documentKinds: z.array(z.enum(PERMIT_KINDS)).min(1),
  holder: z.enum([...HOLDER_SIDES, "either"]),
  /** The permit must list the species (or a name covering it). */
  namesSpecies: z.boolean(),
});
export type PermitRequirement = z.infer<typeof permitRequirementSchema>;

export const ruleEffectSchema = z.discriminatedUnion("kind", [
  z.strictObject({
    kind: z.literal("prohibited"),
    /** A permit that lifts the prohibition (e.g. an injurious-wildlife permit for a zoo). */
    unlessPermit: permitRequirementSchema.optional(),
  }),
  z.strictObject({ kind: z.literal("permit_required"), permit: permitRequirementSchema }),
  z.strictObject({
    kind: z.literal("certificate_required"),
    /** The certificate must be issued no more than this many days before the ship date. */
    withinDays: z.int().min(0).max(366),
    statements: z.array(text(LIMITS.nameMax)).max(20),
    accreditedVeterinarian: z.boolean(),
    namesSpecies: z.boolean(),
  }),
  z.strictObject({ kind: z.literal("packing") }),
  z.strictObject({ kind: z.literal("advisory") }),
]);
export type RuleEffect = z.infer<typeof ruleEffectSchema>;

export const ruleSchema = z
  .strictObject({
    id: z.string().regex(/^[a-z0-9][a-z0-9.-]{0,99}$/),
    /** Editing a rule makes a new version under the same id. */
    version: z.int().min(1),
    jurisdiction: z.enum(JURISDICTIONS),
    governs: z.enum(GOVERNS),
    selector: taxonSelectorSchema,
    conditions: ruleConditionsSchema,
    effect: ruleEffectSchema,
    /** What the rule says, in one or two plain sentences a keeper understands. */
    summary: text(LIMITS.textMax),
    citation: citationSchema,
    /** null: in force since a date not recorded here. */
    effectiveFrom: isoDate.nullable(),
    /** Last day in force; null while in force. */
    effectiveTo: isoDate.nullable(),
    reviewedOn: isoDate,
    reviewedBy: text(LIMITS.nameMax),
    demo: z.boolean(),
  })
  .check((ctx) => {
    const rule = ctx.value;
    if (rule.demo && !rule.citation.text.includes(DEMO_RULE_NOTICE)) {
      ctx.issues.push({
        code: "custom",
        input: rule.citation.text,
        path: ["citation", "text"],
        params: { instruction: `a demo rule's citation must say “${DEMO_RULE_NOTICE}”` },
      });
    }
    if (rule.effectiveFrom && rule.effectiveTo && rule.effectiveTo < rule.effectiveFrom) {
      ctx.issues.push({
        code: "custom",
        input: rule.effectiveTo,
        path: ["effectiveTo"],
        params: { instruction: "make it no earlier than the first day in force" },
      });
    }
    if (rule.jurisdiction === FEDERAL && ["import", "export", "transit"].includes(rule.governs)) {
      ctx.issues.push({
        code: "custom",
        input: rule.governs,
        path: ["governs"],
        params: {
          instruction:
            "a federal rule governs crossing a state line, any move, or keeping; not a state's import, export or transit",
        },
      });
    }
  });
export type Rule = z.infer<typeof ruleSchema>;

/**
 * Per-state setting: a transit-only exempt state's import rules do not reach a shipment that only
 * passes through it by carrier (Ohio Rev. Code 1533.31 is the published example).
 */
export const stateTransitPolicySchema = z.strictObject({
  state: z.enum(US_STATES),
  transitOnlyExempt: z.boolean(),
  citation: citationSchema,
  demo: z.boolean(),
});
export type StateTransitPolicy = z.infer<typeof stateTransitPolicySchema>;
