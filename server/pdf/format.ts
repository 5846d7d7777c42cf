import type {
  AnimalOrigin,
  DocumentKind,
  PackKind,
  Purpose,
  Sex,
  TransportMode,
  WallMaterial,
} from "@shared/constants";

const MM_PER_INCH = 25.4;
const G_PER_OUNCE = 28.349523125;

/** Degrees Fahrenheit to degrees Celsius. */
export function fToC(tempF: number): number {
  return ((tempF - 32) * 5) / 9;
}

/** Millimetres to inches. */
export function mmToIn(lengthMm: number): number {
  return lengthMm / MM_PER_INCH;
}

/** Grams to avoirdupois ounces. */
export function gToOz(weightG: number): number {
  return weightG / G_PER_OUNCE;
}

/** A range given in °F as { f: "65–85 °F", c: "18–29 °C" }, whole degrees. */
export function tempRangeParts(minF: number, maxF: number): { f: string; c: string } {
  return {
    f: `${Math.round(minF)}–${Math.round(maxF)} °F`,
    c: `${Math.round(fToC(minF))}–${Math.round(fToC(maxF))} °C`,
  };
}

/** "65–85 °F (18–29 °C)" for a range given in °F: Fahrenheit first, as US keepers read it. */
export function formatTempRangeF(minF: number, maxF: number): string {
  const { f, c } = tempRangeParts(minF, maxF);
  return `${f} (${c})`;
}

/** "250 mm (9.8 in)". */
export function formatLengthMm(lengthMm: number): string {
  return `${Math.round(lengthMm)} mm (${mmToIn(lengthMm).toFixed(1)} in)`;
}

/** "400 × 300 × 250 mm (15.7 × 11.8 × 9.8 in)", length × width × height. */
export function formatDimensionsMm(lengthMm: number, widthMm: number, heightMm: number): string {
  const mm = [lengthMm, widthMm, heightMm].map((v) => Math.round(v)).join(" × ");
  const inches = [lengthMm, widthMm, heightMm].map((v) => mmToIn(v).toFixed(1)).join(" × ");
  return `${mm} mm (${inches} in)`;
}

/** "350 g (12.3 oz)". */
export function formatWeightG(weightG: number): string {
  return `${Math.round(weightG)} g (${gToOz(weightG).toFixed(1)} oz)`;
}

/** An instant shown in an IANA zone: "Tue, Apr 14, 2026, 17:30 CDT". */
export function formatZonedTime(iso: string, tz: string): string {
  return new Intl.DateTimeFormat("en-US", {
    timeZone: tz,
    weekday: "short",
    year: "numeric",
    month: "short",
    day: "numeric",
    hour: "2-digit",
    minute: "2-digit",
    hourCycle: "h23",
    timeZoneName: "short",
  }).format(new Date(iso));
}

/** A calendar date (YYYY-MM-DD) as "Apr 14, 2026", without shifting it through a time zone. */
export function formatIsoDate(date: string): string {
  return new Intl.DateTimeFormat("en-US", {
    timeZone: "UTC",
    year: "numeric",
    month: "short",
    day: "numeric",
  }).format(new Date(`${date.slice(0, 10)}T00:00:00Z`));
}

export const MODE_LABELS: Record<TransportMode, string> = {
  overnight_air: "Overnight air carrier",
  ground_courier: "Ground courier",
  hand_delivery: "Hand delivery",
};

export const PURPOSE_LABELS: Record<Purpose, string> = {
  education_exhibition: "Education / exhibition",
  breeding: "Breeding",
  private_keeping: "Private keeping",
  rescue_rehoming: "Rescue / rehoming",
  scientific: "Scientific",
  commercial_sale: "Commercial sale",
};

export const SEX_LABELS: Record<Sex, string> = {
  male: "Male",
  female: "Female",
  unknown: "Unknown",
};

export const ORIGIN_LABELS: Record<AnimalOrigin, string> = {
  captive_bred: "Captive-bred",
  captive_hatched: "Captive-hatched",
  wild_caught: "Wild-caught",
  long_term_captive: "Long-term captive",
  rescued: "Rescued",
};

export const DOCUMENT_KIND_LABELS: Record<DocumentKind, string> = {
  state_import_permit: "State import permit",
  possession_permit: "Possession permit",
  export_permit: "Export permit",
  federal_permit: "Federal permit",
  captive_bred_registration: "Captive-bred wildlife registration",
  cvi: "Certificate of Veterinary Inspection (CVI)",
};

export const PACK_LABELS: Record<PackKind, string> = {
  none: "No heat or cold pack",
  heat_40h: "Heat pack (40 h)",
  heat_72h: "Heat pack (72 h)",
  cold: "Cold pack",
};

export const WALL_LABELS: Record<WallMaterial, string> = {
  eps: "EPS foam",
  corrugated: "Corrugated board",
};
