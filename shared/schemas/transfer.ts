/**
 * The transfer record's inputs (validated the same way by the form and the server) and
 * the shapes the API answers with.
 */
import {
  ANIMAL_ORIGINS,
  IDENTIFIER_KINDS,
  LENGTH_KINDS,
  LIMITS,
  PACK_KINDS,
  PURPOSES,
  SEXES,
  TRANSFER_STATUSES,
  TRANSPORT_MODES,
  WALL_MATERIALS,
  type AnimalOrigin,
  type CheckInOutcome,
  type IdentifierKind,
  type LengthKind,
  type OrganizationKind,
  type PackKind,
  type ProfileGroup,
  type Purpose,
  type Sex,
  type TransferStatus,
  type TransportMode,
  type UsState,
  type WallMaterial,
  TRANSFER_LIST_ROLES,
  TRANSFER_SORT_KEYS,
  type AlertKind,
  type CustodyKind,
  type DeliveryAcknowledgementWay,
  type DeliveryState,
  type HandoffReasonKey,
  type PhotoMoment,
  type PhotoSubject,
  PHOTO_MOMENTS,
  PHOTO_SUBJECTS,
  type HandoffKind,
  type PackingFindingCode,
  type ViewerRole,
} from "../constants";
import type { ChainBreak, ChainHead, SealedEntry } from "../custody/hash-chain";
import { instruction } from "../validation/messages";
import { z } from "../validation/zod";
import {
  addressSchema,
  dateSchema,
  idSchema,
  instantSchema,
  measure,
  optionalText,
  requiredText,
  text,
  wholeNumber,
} from "./common";

export { dateSchema, instantSchema, wholeNumber };

export const containerInputSchema = z.strictObject({
  /** Present for a box that already exists; absent for a new one. */
  id: idSchema.optional(),
  /** The form's own key for the box, so animals can name their box before it has an id. */
  key: requiredText(64),
  label: requiredText(80),
  lengthMm: measure("length", { above: 0, max: LIMITS.boxDimensionMmMax }),
  widthMm: measure("length", { above: 0, max: LIMITS.boxDimensionMmMax }),
  heightMm: measure("length", { above: 0, max: LIMITS.boxDimensionMmMax }),
  wallMaterial: z.enum(WALL_MATERIALS),
  wallThicknessMm: measure("length", { above: 0, max: LIMITS.wallThicknessMmMax }),
  pack: z.enum(PACK_KINDS),
  sealNumber: optionalText(60),
});
export type ContainerInput = z.input<typeof containerInputSchema>;

export const animalInputSchema = z.strictObject({
  id: idSchema.optional(),
  taxonId: idSchema,
  count: wholeNumber(1, LIMITS.animalCountMax),
  sex: z.enum(SEXES),
  identifier: optionalText(120),
  identifierKind: z.enum(IDENTIFIER_KINDS).nullable().optional(),
  origin: z.enum(ANIMAL_ORIGINS),
  lengthMm: measure("length", { above: 0, max: LIMITS.lengthMmMax }).nullable().optional(),
  lengthKind: z.enum(LENGTH_KINDS).nullable().optional(),
  weightG: measure("weight", { above: 0, max: LIMITS.weightGMax }).nullable().optional(),
  hatchDate: dateSchema.nullable().optional(),
  notes: optionalText(2000),
  /** The `key` of the box it travels in; null until it is packed. */
  containerKey: text(64).nullable(),
  /** The sender's register entry the line was started from (issue 15 §2); left out: unchanged. */
  registerEntryId: idSchema.nullable().optional(),
});
export type AnimalInput = z.input<typeof animalInputSchema>;

const transferFields = {
  receiverOrganizationId: idSchema,
  receiverContactId: idSchema.nullable(),
  origin: addressSchema,
  destination: addressSchema,
  mode: z.enum(TRANSPORT_MODES),
  plannedDepartureAt: instantSchema,
  expectedArrivalAt: instantSchema,
  purpose: z.enum(PURPOSES),
  sale: z.boolean(),
  salePriceUsd: z.number().min(0).max(10_000_000).nullable().optional(),
  handlingNotes: optionalText(LIMITS.textMax),
  /** The sender's own notes: never shown to the receiver or the courier. */
  privateNotes: optionalText(LIMITS.textMax),
  containers: z.array(containerInputSchema).max(LIMITS.containersPerTransferMax),
  animals: z.array(animalInputSchema).max(LIMITS.animalsPerTransferMax),
};

type Shape = {
  plannedDepartureAt?: string;
  expectedArrivalAt?: string;
  containers?: { key: string }[];
  animals?: { containerKey: string | null }[];
};

/** Cross-field rules: arrival after departure; each animal's box exists; box keys unique. */
function crossChecks(value: Shape, ctx: z.RefinementCtx) {
  if (
    value.plannedDepartureAt &&
    value.expectedArrivalAt &&
    Date.parse(value.expectedArrivalAt) <= Date.parse(value.plannedDepartureAt)
  ) {
    ctx.addIssue({
      code: "custom",
      path: ["expectedArrivalAt"],
      params: { instruction: "make it later than the planned departure" },
    });
  }
  if (value.containers) {
    const keys = new Set<string>();
    value.containers.forEach((c, i) => {
      if (keys.has(c.key))
        ctx.addIssue({
          code: "custom",
          path: ["containers", i, "key"],
          params: { instruction: "another box has the same reference; give each box its own" },
        });
      keys.add(c.key);
    });
    value.animals?.forEach((a, i) => {
      if (a.containerKey !== null && !keys.has(a.containerKey)) {
        ctx.addIssue({
          code: "custom",
          path: ["animals", i, "containerKey"],
          params: { instruction: "choose one of this transfer's boxes" },
        });
      }
    });
  }
}

export const transferInputSchema = z.strictObject(transferFields).superRefine(crossChecks);
export type TransferInput = z.input<typeof transferInputSchema>;
export type TransferInputParsed = z.output<typeof transferInputSchema>;

/** A new transfer may not depart in the past (a few minutes' grace for slow forms). */
export function createTransferSchema(now: Date) {
  return transferInputSchema.superRefine((value, ctx) => {
    if (Date.parse(value.plannedDepartureAt) < now.getTime() - 10 * 60_000) {
      ctx.addIssue({
        code: "custom",
        path: ["plannedDepartureAt"],
        params: { instruction: "a new transfer cannot leave in the past; choose a later time" },
      });
    }
  });
}

/**
 * An edit: any of the fields, plus the version the editor saw (a stale version is a 409,
 * so two people never silently overwrite each other). Lists, when given, replace the old ones.
 */
export const transferPatchSchema = z
  .strictObject({ version: wholeNumber(1, Number.MAX_SAFE_INTEGER), ...transferFields })
  .partial()
  .required({ version: true })
  .superRefine(crossChecks);
export type TransferPatch = z.input<typeof transferPatchSchema>;

export const transitionSchema = z.strictObject({
  to: z.enum(TRANSFER_STATUSES),
  reason: optionalText(1000),
  /** Set with a reason to ship despite a compliance or temperature block (logged). */
  override: z.boolean().optional(),
  /**
   * Which blocks the override answers: the ones the confirming party was shown ("compliance" for
   * an unverified rules check, "temperature"). Without it, an override answers every block.
   */
  overrideGates: z
    .array(z.enum(["compliance", "temperature"]))
    .max(2)
    .optional(),
});
export type TransitionInput = z.input<typeof transitionSchema>;

export const legsInputSchema = z.strictObject({
  legs: z
    .array(z.strictObject({ courierId: idSchema, fromLabel: optionalText(120), toLabel: optionalText(120) }))
    .min(1, { error: instruction("assign at least one courier") })
    .max(10),
});
export type LegsInput = z.input<typeof legsInputSchema>;

export const messageInputSchema = z.strictObject({ body: requiredText(4000) });

/** A party saying they have seen an alert: what they did or will do about it. */
export const alertAcknowledgeSchema = z.strictObject({ note: requiredText(1000) });

/** A delivery code as the receiver reads it out: six digits (spaces typed between them do not count). */
export const deliveryCodeSchema = z
  .string()
  .max(20)
  .transform((value) => value.replace(/\s+/g, ""))
  .pipe(z.string().regex(/^\d{6}$/, { error: instruction("type the six digits shown in the receiver's account") }));

/** What the person taking custody checks and records at a pickup or handoff. */
export const handoffInputSchema = z.strictObject({
  /** 0 is the pickup from the sender; the last index is the delivery to the receiver. */
  handoffIndex: wholeNumber(0, 20),
  boxesCounted: wholeNumber(0, LIMITS.containersPerTransferMax),
  seals: z
    .array(z.strictObject({ containerId: idSchema, sealNumber: optionalText(60), intact: z.boolean() }))
    .max(LIMITS.containersPerTransferMax),
  boxTempF: measure("temperature", { min: -40, max: 160 }).nullable(),
  place: z.strictObject({
    text: optionalText(200),
    lat: z.number().min(-90).max(90).nullable().optional(),
    lon: z.number().min(-180).max(180).nullable().optional(),
    accuracyM: z.number().min(0).max(100_000).nullable().optional(),
  }),
  releasedByName: requiredText(120),
  receivedByName: requiredText(120),
  notes: optionalText(2000),
  /**
   * Why a handoff that fails a plausibility check is right all the same: a pickup long before the
   * departure, a speed the mode cannot reach, custody to someone not assigned. The server refuses
   * such a handoff without the reason (400 naming the field) and raises an alert with it.
   */
  reasons: z
    .strictObject({
      earlyPickup: optionalText(1000),
      implausibleSpeed: optionalText(1000),
      unexpectedParty: optionalText(1000),
    })
    .optional(),
  /**
   * When the person confirmed it on their phone (the phone's clock). A handoff kept on a phone
   * without signal reaches the server later; the custody entry keeps the server's time as its time
   * and says when it was confirmed (issue 16, §3).
   */
  confirmedAt: instantSchema.nullable().optional(),
  /** At the delivery: the one-time code the receiver shows in their own account, so the receiver acknowledges on this phone. */
  receiverCode: deliveryCodeSchema.nullable().optional(),
  acknowledged: z.literal(true, { message: "Confirm that you have checked the boxes and taken custody." }),
});
export type HandoffInput = z.input<typeof handoffInputSchema>;

/**
 * The receiver says "I have the boxes" for a delivery the courier recorded: from their own account
 * (no code), or on the courier's phone with the one-time code shown in their account.
 */
export const deliveryAcknowledgeSchema = z.strictObject({ code: deliveryCodeSchema.optional() });
export type DeliveryAcknowledgeInput = z.input<typeof deliveryAcknowledgeSchema>;

/** What a photo shows and when it was taken; the file itself is the request body. */
export const photoUploadQuerySchema = z
  .strictObject({
    moment: z.enum(PHOTO_MOMENTS),
    handoffIndex: z.coerce.number<string | number>().int().min(0).max(20).optional(),
    subject: z.enum(PHOTO_SUBJECTS),
    containerId: idSchema.optional(),
    animalId: idSchema.optional(),
    caption: text(200).optional(),
  })
  .superRefine((value, ctx) => {
    if (value.moment === "handoff" && value.handoffIndex === undefined)
      ctx.addIssue({
        code: "custom",
        path: ["handoffIndex"],
        params: { instruction: "say which handoff the photo is of" },
      });
  });
export type PhotoUploadQuery = z.input<typeof photoUploadQuerySchema>;

/** A count per outcome for one animal line; they must add up to the line's count. */
export const checkInItemSchema = z.strictObject({
  animalId: idSchema,
  arrivedWell: wholeNumber(0, LIMITS.animalCountMax),
  arrivedProblem: wholeNumber(0, LIMITS.animalCountMax),
  deadOnArrival: wholeNumber(0, LIMITS.animalCountMax),
  missing: wholeNumber(0, LIMITS.animalCountMax),
  problem: optionalText(1000),
  weightG: measure("weight", { above: 0, max: LIMITS.weightGMax }).nullable().optional(),
  notes: optionalText(2000),
});
export type CheckInItemInput = z.input<typeof checkInItemSchema>;

export const checkInInputSchema = z.strictObject({
  items: z.array(checkInItemSchema).max(LIMITS.animalsPerTransferMax),
  /** Animals that arrived but were not on the manifest. */
  extras: z
    .array(
      z.strictObject({
        taxonId: idSchema,
        count: wholeNumber(1, LIMITS.animalCountMax),
        sex: z.enum(SEXES),
        notes: optionalText(1000),
      }),
    )
    .max(100),
  notes: optionalText(LIMITS.textMax),
  /** The box temperature read on opening, °F (issue 13): drawn beside the model, checked against the safe range. */
  boxTempF: measure("temperature", { min: -40, max: 160 }).nullable().optional(),
  signedName: requiredText(120),
  acknowledged: z.literal(true, { message: "Confirm that every container was opened and checked." }),
});
export type CheckInInput = z.input<typeof checkInInputSchema>;

export const transferListQuerySchema = z.strictObject({
  status: z.enum(TRANSFER_STATUSES).optional(),
  role: z.enum(TRANSFER_LIST_ROLES).optional(),
  departFrom: dateSchema.optional(),
  departTo: dateSchema.optional(),
  q: text(100).optional(),
  sort: z.enum(TRANSFER_SORT_KEYS).default("departure"),
  dir: z.enum(["asc", "desc"]).default("desc"),
  cursor: text(400).optional(),
  limit: z.coerce.number<string | number>().int().min(1).max(100).default(50),
});
export type TransferListQuery = z.input<typeof transferListQuerySchema>;

// ---------------------------------------------------------------- responses

export type OrgBriefDto = {
  id: string;
  name: string;
  kind: OrganizationKind;
  phone: string;
  email: string;
  address: { street: string; city: string; state: UsState; zip: string };
};
/** A courier service as a transfer shows it: no address, its phone once it has joined. */
export type CourierServiceBriefDto = {
  id: string;
  name: string;
  city: string;
  state: string;
  phone: string;
  pending: boolean;
};
export type PersonDto = { id: string; displayName: string; email: string };
export type PlaceDto = {
  street: string;
  city: string;
  state: UsState;
  zip: string;
  lat: number | null;
  lon: number | null;
  timeZone: string | null;
};
export type TaxonBriefDto = {
  id: string;
  scientificName: string;
  commonName: string | null;
  venomous: boolean;
  profileGroup: ProfileGroup | null;
  rank: string;
};

export type ContainerDto = {
  id: string;
  key: string;
  position: number;
  label: string;
  lengthMm: number;
  widthMm: number;
  heightMm: number;
  wallMaterial: WallMaterial;
  wallThicknessMm: number;
  pack: PackKind;
  sealNumber: string | null;
};

export type AnimalDto = {
  id: string;
  position: number;
  taxon: TaxonBriefDto;
  count: number;
  sex: Sex;
  identifier: string | null;
  identifierKind: IdentifierKind | null;
  origin: AnimalOrigin;
  lengthMm: number | null;
  lengthKind: LengthKind | null;
  weightG: number | null;
  hatchDate: string | null;
  notes: string | null;
  containerId: string | null;
  containerKey: string | null;
};

export type LegDto = {
  id: string;
  sequence: number;
  courier: { id: string; displayName: string; organizationName: string | null; phone: string | null };
  fromLabel: string | null;
  toLabel: string | null;
};

export type HandoffDto = {
  handoffIndex: number;
  kind: HandoffKind;
  at: string;
  recordedBy: { id: string; displayName: string };
  releasedByName: string;
  receivedByName: string;
  boxesExpected: number;
  boxesCounted: number;
  /** `expected` is the number on record when the handoff was recorded; `matches` compares them as read. */
  seals: {
    containerId: string;
    sealNumber: string | null;
    expected: string | null;
    matches: boolean;
    intact: boolean;
  }[];
  /** Boxes whose seals the record says nothing about. */
  sealsUnchecked: string[];
  boxTempF: number | null;
  place: { text: string | null; lat: number | null; lon: number | null; accuracyM: number | null };
  notes: string | null;
  /** The reasons given for failed plausibility checks. */
  reasons: Partial<Record<HandoffReasonKey, string>>;
  /** What could not be checked at this handoff, in words. */
  notChecked: string[];
};

/** The delivery to the receiver, once recorded: acknowledged by the receiver, or waiting for it. */
export type DeliveryDto = {
  state: DeliveryState;
  recordedAt: string;
  recordedBy: { id: string | null; displayName: string };
  acknowledgedAt: string | null;
  acknowledgedBy: { id: string | null; displayName: string } | null;
  way: DeliveryAcknowledgementWay | null;
};

/** A photo taken at a handoff or at the check-in; `url` serves it to the parties and assigned couriers. */
export type PhotoDto = {
  id: string;
  moment: PhotoMoment;
  handoffIndex: number | null;
  subject: PhotoSubject;
  containerId: string | null;
  animalId: string | null;
  caption: string | null;
  contentType: string;
  sizeBytes: number;
  sha256: string;
  uploadedBy: { id: string; displayName: string };
  at: string;
  url: string;
};

/** A fresh one-time delivery code, shown once to the receiver. */
export type DeliveryCodeDto = { code: string; expiresAt: string };

/** A problem with the packing the sender must resolve before sending for confirmation. */
export type PackingFindingDto = {
  code: PackingFindingCode;
  containerId: string | null;
  animalIds: string[];
  message: string;
};

export type DiscrepancyRowDto = {
  scientificName: string;
  taxonId: string;
  sex: Sex;
  expected: number;
  arrivedWell: number;
  arrivedProblem: number;
  deadOnArrival: number;
  missing: number;
  extra: number;
};

export type CheckInDto = {
  signedAt: string;
  signedBy: { id: string; displayName: string };
  signedName: string;
  notes: string | null;
  items: {
    animalId: string;
    arrivedWell: number;
    arrivedProblem: number;
    deadOnArrival: number;
    missing: number;
    problem: string | null;
    weightG: number | null;
    notes: string | null;
  }[];
  extras: { taxon: TaxonBriefDto; count: number; sex: Sex; notes: string | null }[];
  discrepancies: DiscrepancyRowDto[];
  allAccountedFor: boolean;
};

export type { ViewerRole } from "../constants";

/** What the caller may do now; the server decides, the client only shows. */
export type TransferAbilitiesDto = {
  edit: boolean;
  submit: boolean;
  withdraw: boolean;
  confirm: boolean;
  sendBack: boolean;
  cancel: boolean;
  close: boolean;
  assignCouriers: boolean;
  /** The handoff the caller may record now, or null. */
  handOff: number | null;
  checkIn: boolean;
  discuss: boolean;
  readCustody: boolean;
  readPrivateNotes: boolean;
  /** May say they have seen an alert (a party of the transfer or an assigned courier). */
  acknowledgeAlerts: boolean;
  /** The receiver may say "I have the boxes" for a delivery the courier recorded. */
  acknowledgeDelivery: boolean;
  /** The receiver may show a one-time code for the courier's phone. */
  showDeliveryCode: boolean;
  /** The delivering courier may enter the receiver's code for a delivery already recorded. */
  enterDeliveryCode: boolean;
  /** May add photos to a recorded handoff or the check-in. */
  addPhotos: boolean;
  /** May see the photos (the parties and assigned couriers). */
  readPhotos: boolean;
};

/** Something on the record a party must see; kept for good, acknowledged with a note. */
export type AlertDto = {
  id: string;
  kind: AlertKind;
  /** When the server raised it (ISO 8601). */
  at: string;
  /** In words, naming the box, the seal, the place: "Box D: expected seal SEAL-0004, courier read SEAL-0044". */
  message: string;
  acknowledgedAt: string | null;
  acknowledgedBy: { id: string | null; displayName: string } | null;
  acknowledgementNote: string | null;
};

/** Demo or benchmark data written past the ready-to-ship gates: what was not checked, and when. */
export type LoadedWithoutChecksDto = {
  loadedAs: "demo" | "bench";
  /** The checks that did not run, by name: "compliance", "temperature". */
  checksNotRun: string[];
  /** When the transfer was cleared without them (ISO 8601). */
  at: string;
};

export type TransferDto = {
  id: string;
  number: string;
  status: TransferStatus;
  version: number;
  viewerRole: ViewerRole;
  sender: { organization: OrgBriefDto; contact: PersonDto | null };
  receiver: { organization: OrgBriefDto; contact: PersonDto | null };
  origin: PlaceDto;
  destination: PlaceDto;
  mode: TransportMode;
  plannedDepartureAt: string;
  expectedArrivalAt: string;
  purpose: Purpose;
  sale: boolean;
  /** Null for the courier's view. */
  salePriceUsd: number | null;
  handlingNotes: string | null;
  /** The caller's own party's private notes; null when they may not read them. */
  privateNotes: string | null;
  containers: ContainerDto[];
  animals: AnimalDto[];
  legs: LegDto[];
  handoffs: HandoffDto[];
  /** Number of handoffs in all: pickup, one between each pair of legs, delivery. */
  handoffsPlanned: number;
  packingFindings: PackingFindingDto[];
  checkIn: CheckInDto | null;
  confirmedAt: string | null;
  cancelledReason: string | null;
  /** Set when an edit after confirmation sent the transfer back to the receiver. */
  reconfirmationReason: string | null;
  /**
   * Set when the transfer was loaded as demo or benchmark data and cleared to ship without the
   * compliance and temperature checks (the custody log holds the same entry); null otherwise.
   */
  loadedWithoutChecks: LoadedWithoutChecksDto | null;
  /** The courier service asked to carry it; pending until someone of it signs up (issue 14, §3). */
  courierService: CourierServiceBriefDto | null;
  /** The courier's run that carries it (issue 16), null when it is on none. */
  runId: string | null;
  /** Every alert raised on this transfer, oldest first; acknowledged ones stay. */
  alerts: AlertDto[];
  /** The delivery to the receiver, once recorded; null before. */
  delivery: DeliveryDto | null;
  /** Photos at the handoffs and the check-in, oldest first (empty for those who may not see them). */
  photos: PhotoDto[];
  abilities: TransferAbilitiesDto;
  createdAt: string;
  updatedAt: string;
};

export type TransferSummaryDto = {
  id: string;
  number: string;
  status: TransferStatus;
  viewerRole: ViewerRole;
  sender: { id: string; name: string };
  receiver: { id: string; name: string };
  /** `timeZone`: the origin's IANA zone (from its ZIP), in which the departure is shown; null when the ZIP was not found. */
  origin: { city: string; state: UsState; timeZone: string | null };
  destination: { city: string; state: UsState };
  mode: TransportMode;
  plannedDepartureAt: string;
  expectedArrivalAt: string;
  animalCount: number;
  speciesCount: number;
  updatedAt: string;
};

export type TransferListDto = { transfers: TransferSummaryDto[]; nextCursor: string | null };

export type CustodyEntryDto = {
  seq: number;
  kind: CustodyKind;
  at: string;
  actor: { id: string | null; displayName: string };
  payload: Record<string, unknown>;
  prevHash: string;
  hash: string;
};
export type CustodyLogDto = {
  entries: CustodyEntryDto[];
  intact: boolean;
  brokenAt: number | null;
  reason: string | null;
  /** Every break found, in order (the first is `brokenAt` and `reason`). */
  breaks: ChainBreak[];
  /** The chain's end as recorded apart from the entries (D19), or null when nothing was recorded. */
  head: ChainHead | null;
};

/**
 * A transfer's custody log to keep and check later without Hatchway
 * (`GET /api/transfers/:id/custody/export`; scripts/verify-custody-export.mjs checks it).
 */
export type CustodyExportDto = {
  format: "hatchway-custody-export/1";
  exportedAt: string;
  transfer: { id: string; number: string };
  /** How each hash is computed, so anyone can recompute it. */
  chain: { algorithm: "SHA-256"; genesisHash: string; rule: string };
  /** Every entry exactly as sealed: the fields the hash covers, then `prevHash` and `hash`. */
  entries: SealedEntry[];
  head: ChainHead | null;
  /** What Hatchway found when it exported. */
  check: { intact: boolean; brokenAt: number | null; reason: string | null; breaks: ChainBreak[] };
};

export type TransferChangeDto = {
  at: string;
  actor: { id: string; displayName: string };
  field: string;
  oldValue: unknown;
  newValue: unknown;
};
export type MessageDto = {
  id: string;
  author: { id: string; displayName: string; organizationName: string | null };
  body: string;
  at: string;
};

export type TaxonSearchHitDto = TaxonBriefDto & {
  commonNames: string[];
  synonyms: string[];
  matched: { name: string; kind: "scientific" | "common" | "synonym" };
};

export type DirectoryOrganizationDto = {
  id: string;
  name: string;
  kind: OrganizationKind;
  city: string;
  state: UsState;
  /** Empty for an organisation shown only because it is listed: the directory shows name, kind, city and state. */
  zip: string;
  street: string;
  contacts: PersonDto[];
  /** Invited by the caller's organisation, nobody signed up yet. */
  pending: boolean;
  listed: boolean;
};
/** A courier service in the directory: name, city and state only (issue 14, §3). */
export type DirectoryCourierServiceDto = {
  id: string;
  name: string;
  city: string;
  state: UsState;
  /** Invited by the caller's organisation, nobody signed up yet. */
  pending: boolean;
  listed: boolean;
};
export type DirectoryCourierDto = { id: string; displayName: string; organizationName: string | null };

export const CHECK_IN_OUTCOME_KEYS: Record<
  CheckInOutcome,
  "arrivedWell" | "arrivedProblem" | "deadOnArrival" | "missing"
> = {
  arrived_well: "arrivedWell",
  arrived_problem: "arrivedProblem",
  dead_on_arrival: "deadOnArrival",
  missing: "missing",
};
