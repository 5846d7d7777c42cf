/**
 * The keeper's register (issue 15): inputs for entries, events, splits, the import's rows, the
 * register's pages and the yearly report, validated the same way by the forms and the server.
 */
import {
  ACQUISITION_WAYS,
  ANIMAL_ORIGINS,
  IDENTIFIER_KINDS,
  LIMITS,
  REGISTER_STATUSES,
  SEXES,
  type AcquisitionWay,
  type RegisterEntryKind,
  type RegisterEventKind,
  type RegisterStatus,
  type Sex,
} from "../constants";
import { KINDS_WITH_COUNTERPARTY, RECORDABLE_EVENT_KINDS } from "../register/ledger";
import type { StateNoticeTodo } from "../register/state-notices";
import { z } from "../validation/zod";
import { dateSchema, idSchema, measure, optionalText, requiredText, text, wholeNumber } from "./common";

const sourceSchema = z.strictObject({
  name: optionalText(200),
  permitNumber: optionalText(120),
});

/** `POST /api/register/entries`: an animal (or group) already in the keeper's care. */
export const registerEntryInputSchema = z
  .strictObject({
    scientificName: requiredText(200),
    count: wholeNumber(1, LIMITS.animalCountMax),
    sex: z.enum(SEXES).default("unknown"),
    identifier: optionalText(120),
    identifierKind: z.enum(IDENTIFIER_KINDS).nullable().optional(),
    origin: z.enum(ANIMAL_ORIGINS).nullable().optional(),
    hatchDate: dateSchema.nullable().optional(),
    acquiredOn: dateSchema,
    acquiredHow: z.enum(ACQUISITION_WAYS).optional(),
    source: sourceSchema.nullable().optional(),
    permitIds: z.array(idSchema).max(20).optional(),
    weightG: measure("weight", { above: 0, max: LIMITS.weightGMax }).nullable().optional(),
    lengthMm: measure("length", { above: 0, max: LIMITS.lengthMmMax }).nullable().optional(),
    notes: optionalText(2000),
    /** Start the organisation's quarantine on the day acquired (new arrivals). */
    startQuarantine: z.boolean().optional(),
  })
  .superRefine((value, ctx) => {
    if (value.identifier && value.count !== 1)
      ctx.addIssue({
        code: "custom",
        path: ["count"],
        params: {
          instruction: "an identifier names one animal: make the count 1, or leave the identifier out for a group",
        },
      });
    if (value.hatchDate && value.hatchDate > value.acquiredOn)
      ctx.addIssue({
        code: "custom",
        path: ["hatchDate"],
        params: { instruction: "make it on or before the day the animal was acquired" },
      });
  });
export type RegisterEntryInput = z.input<typeof registerEntryInputSchema>;
export type RegisterEntryParsed = z.output<typeof registerEntryInputSchema>;

/** `POST /api/register/entries/:id/events`: something that happened to an entry. */
export const registerEventInputSchema = z
  .strictObject({
    kind: z.enum(RECORDABLE_EVENT_KINDS),
    on: dateSchema,
    count: wholeNumber(0, LIMITS.animalCountMax).optional(),
    note: optionalText(2000),
    cause: optionalText(400),
    acquiredHow: z.enum(ACQUISITION_WAYS).optional(),
    counterparty: z
      .strictObject({
        name: optionalText(200),
        address: optionalText(300),
        permitNumber: optionalText(120),
      })
      .nullable()
      .optional(),
    weightG: measure("weight", { above: 0, max: LIMITS.weightGMax }).nullable().optional(),
    lengthMm: measure("length", { above: 0, max: LIMITS.lengthMmMax }).nullable().optional(),
    /** The event this one corrects (replaces); with `voided`, withdraws it. */
    corrects: idSchema.optional(),
  })
  .superRefine((value, ctx) => {
    if (KINDS_WITH_COUNTERPARTY.includes(value.kind) && !value.counterparty?.name)
      ctx.addIssue({
        code: "custom",
        path: ["counterparty", "name"],
        params: { instruction: "say to whom the animals went (a permit holder's records name them)" },
      });
    if (value.kind === "voided" && !value.corrects)
      ctx.addIssue({
        code: "custom",
        path: ["corrects"],
        params: { instruction: "choose the event that was recorded in error" },
      });
    if (value.kind === "measured" && value.weightG == null && value.lengthMm == null)
      ctx.addIssue({ code: "custom", path: ["weightG"], params: { instruction: "give a weight or a length" } });
  });
export type RegisterEventInput = z.input<typeof registerEventInputSchema>;
export type RegisterEventParsed = z.output<typeof registerEventInputSchema>;

/** `POST /api/register/entries/:id/split`: some animals of a group become an entry of their own. */
export const registerSplitInputSchema = z.strictObject({
  count: wholeNumber(1, LIMITS.animalCountMax),
  on: dateSchema,
  identifier: optionalText(120),
  sex: z.enum(SEXES).optional(),
  note: optionalText(2000),
});
export type RegisterSplitInput = z.input<typeof registerSplitInputSchema>;

/** `GET /api/register`: filters, sort and a keyset page. */
export const registerQuerySchema = z.strictObject({
  q: text(100).optional(),
  taxonId: idSchema.optional(),
  species: text(200).optional(),
  sex: z.enum(SEXES).optional(),
  status: z.enum(REGISTER_STATUSES).optional(),
  permitId: idSchema.optional(),
  quarantine: z.enum(["yes", "no"]).optional(),
  from: dateSchema.optional(),
  to: dateSchema.optional(),
  sort: z.enum(["acquired", "species"]).default("acquired"),
  dir: z.enum(["asc", "desc"]).default("desc"),
  cursor: text(400).optional(),
  limit: z.coerce.number<string | number>().int().min(1).max(5000).default(50),
});
export type RegisterQuery = z.input<typeof registerQuerySchema>;

/** `GET /api/register/report`: a permit and the days the report covers (defaults: its last reporting year). */
export const registerReportQuerySchema = z
  .strictObject({
    permitId: idSchema,
    from: dateSchema.optional(),
    to: dateSchema.optional(),
    format: z.enum(["json", "csv", "pdf"]).default("json"),
  })
  .superRefine((value, ctx) => {
    if (value.from && value.to && value.from > value.to)
      ctx.addIssue({
        code: "custom",
        path: ["to"],
        params: { instruction: "make it on or after the start of the period" },
      });
  });

/** `GET /api/register/transfer-lines?ids=a,b`: register entries to start a transfer with. */
export const transferLinesQuerySchema = z.strictObject({
  ids: text(4000)
    .transform((value) => [
      ...new Set(
        value
          .split(",")
          .map((id) => id.trim())
          .filter(Boolean),
      ),
    ])
    .pipe(z.array(idSchema).min(1).max(100)),
});

/** A permit's reporting year and due date (issue 15 §3). */
export const permitReportingSchema = z.strictObject({
  reportStartMonth: wholeNumber(1, 12).nullable(),
  reportDueMonth: wholeNumber(1, 12).nullable(),
  reportDueDay: wholeNumber(1, 31).nullable(),
});

/** The organisation's quarantine length for new arrivals, in days. */
export const quarantineSettingsSchema = z.strictObject({
  quarantineDays: wholeNumber(0, 730),
  /** Lengths for a genus ("Boa") or a species ("Python regius"), checked against the catalogue. */
  overrides: z
    .array(z.strictObject({ name: requiredText(200), days: wholeNumber(0, 730) }))
    .max(50)
    .optional(),
});

// ---------------------------------------------------------------- responses

export type RegisterEntryDto = {
  id: string;
  kind: RegisterEntryKind;
  taxon: { id: string; scientificName: string; commonName: string | null; venomous: boolean };
  sex: Sex;
  /** Animals the entry was made with. */
  count: number;
  /** Animals in care now. */
  countInCare: number;
  status: RegisterStatus;
  identifier: string | null;
  identifierKind: string | null;
  origin: string | null;
  hatchDate: string | null;
  dateAcquired: string;
  acquiredHow: AcquisitionWay | null;
  sourceOrganization: string | null;
  sourcePermitNumber: string | null;
  transferNumber: string | null;
  transferId: string | null;
  condition: "well" | "problem" | "dead_on_arrival" | "missing" | null;
  notes: string | null;
  weightG: number | null;
  lengthMm: number | null;
  permitIds: string[];
  quarantine: { startedOn: string; until: string; daysLeft: number } | null;
  previousEntryId: string | null;
  parentEntryId: string | null;
};

export type RegisterEventDto = {
  id: string;
  entryId: string;
  kind: RegisterEventKind;
  on: string;
  count: number;
  note: string | null;
  cause: string | null;
  acquiredHow: AcquisitionWay | null;
  counterparty: { name: string | null; address: string | null; permitNumber: string | null } | null;
  correctsEventId: string | null;
  /** The later event that replaced this one, if any. */
  replacedById: string | null;
  transferId: string | null;
  otherEntryId: string | null;
  weightG: number | null;
  lengthMm: number | null;
  recordedBy: string;
  recordedAt: string;
};

export type RegisterPageDto = { entries: RegisterEntryDto[]; nextCursor: string | null };

export type ReportEventDto = {
  on: string;
  kind: RegisterEventKind;
  column: string;
  count: number;
  identifier: string | null;
  counterparty: { name: string | null; address: string | null; permitNumber: string | null } | null;
  transferNumber: string | null;
  note: string | null;
};

export type RegisterReportDto = {
  permit: { id: string; number: string; jurisdiction: string; kind: string; holderName: string };
  from: string;
  to: string;
  dueOn: string | null;
  species: {
    scientificName: string;
    start: number;
    acquired: number;
    hatched: number;
    died: number;
    transferredOut: number;
    escapedOrReleased: number;
    end: number;
    events: ReportEventDto[];
  }[];
};

/** `POST /api/register/transfers/:transferId/notices/:key/done`: a state notice sent, with what the agency gave back. */
export const stateNoticeDoneSchema = z.strictObject({
  note: optionalText(2000),
  reference: optionalText(120),
});
export type StateNoticeDoneInput = z.input<typeof stateNoticeDoneSchema>;

/** A state notice owed after a move, and who marked it done (null while it is still to do). */
export type StateNoticeDto = StateNoticeTodo & {
  done: { byName: string; at: string; note: string | null; reference: string | null } | null;
};
