import type {
  AnimalOrigin,
  DocumentKind,
  PackKind,
  Purpose,
  Sex,
  TransportMode,
  UsState,
  WallMaterial,
} from "@shared/constants";

/**
 * What the manifest and label renderers need, already resolved by the presenter: plain data,
 * no ORM entities. All free text is the user's own and is drawn verbatim (after glyph checks).
 */
export interface ManifestInput {
  /** The human-facing transfer number, e.g. "HW-2026-0042". */
  transferNumber: string;
  mode: TransportMode;
  purpose: Purpose;
  plannedDeparture: ZonedTime;
  expectedArrival: ZonedTime;
  sender: PartyBlock;
  receiver: PartyBlock;
  /** Empty when no courier is named yet (or the sender hands the animals over in person). */
  couriers: CourierBlock[];
  /** In packing order; `index` is 1-based and unique. */
  boxes: ManifestBox[];
  documents: ManifestDocument[];
  temperature: ManifestTemperature | null;
  /**
   * The transfer's current verdicts, compliance then temperature, as checked when the PDF is made
   * (or the last stored check that still matches the transfer): printed at the top of the
   * manifest and on every label, in words and colour.
   */
  verdicts: ManifestVerdict[];
  handlingNotes: string | null;
  emergencyContacts: EmergencyContact[];
  /** Absolute URL of the transfer's handoff page; encoded in every QR code. */
  handoffUrl: string;
  /** ISO 8601 instant the document is produced, shown in the footer in `generatedTz`. */
  generatedAt: string;
  /** IANA time zone, e.g. "America/Chicago". */
  generatedTz: string;
}

/** An instant (ISO 8601 with offset or Z) and the IANA zone it is shown in. */
export interface ZonedTime {
  at: string;
  tz: string;
}

/** Shipper or consignee: the name and address 50 CFR 14.81 wants on every box. */
export interface PartyBlock {
  organisation: string;
  contactName: string;
  street: string;
  city: string;
  state: UsState;
  zip: string;
  /** A number answered day and night while the animals are in transit. */
  phone24h: string;
  email: string;
}

export interface CourierBlock {
  name: string;
  organisation: string | null;
  phone: string;
}

export interface BoxInsulation {
  material: WallMaterial;
  wallThicknessMm: number;
}

export interface ManifestBox {
  /** The container's record id (labels need not be unique). */
  id: string;
  /** The sender's own name for the box, e.g. "Box A — tortoises". */
  label: string;
  /** 1-based position among the transfer's boxes. */
  index: number;
  lengthMm: number;
  widthMm: number;
  heightMm: number;
  insulation: BoxInsulation | null;
  pack: PackKind;
  sealNumber: string | null;
  animals: ManifestAnimal[];
}

export interface ManifestAnimal {
  scientificName: string;
  commonName: string;
  count: number;
  sex: Sex;
  identifier: string | null;
  origin: AnimalOrigin;
  /** Snout–vent or carapace length, as recorded by the sender. */
  lengthMm: number | null;
  weightG: number | null;
  venomous: boolean;
  notes: string | null;
}

export interface ManifestDocument {
  kind: DocumentKind;
  number: string;
  /** Agency or jurisdiction that issued it, e.g. "Ohio Division of Wildlife". */
  issuer: string;
  holder: string;
  /** ISO dates (YYYY-MM-DD); `validTo` null when open-ended. */
  validFrom: string;
  validTo: string | null;
}

export interface ManifestTemperature {
  advice: string | null;
  /** The band every box must stay in; null when the boxes' bands do not overlap. */
  safeRangeF: { minF: number; maxF: number } | null;
  packingNotes: string | null;
  /** A box's own band by container id, printed on its label; boxes not listed use `safeRangeF`. */
  boxRangesF?: Record<string, { minF: number; maxF: number }>;
}

export interface EmergencyContact {
  name: string;
  role: string;
  phone: string;
}

/** One check's verdict as the manifest prints it. */
export interface ManifestVerdict {
  check: "compliance" | "temperature";
  /** What the transfer page says, in the printed words ("UNVERIFIED", "DO NOT SHIP", …). */
  headline: string;
  /** The same in a word or two, for the box labels. */
  short: string;
  /** ok: green; caution: amber; block: brick red. */
  tone: "ok" | "caution" | "block";
  /** Why, and whom to ask or what to do, in a sentence or two. */
  detail: string;
  /** When the check was made (ISO 8601), printed in `tz` (the origin's zone). */
  checkedAt: string;
  tz: string;
}
