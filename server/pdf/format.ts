import type {
  AnimalOrigin,
  DocumentKind,
  PackKind,
  Purpose,
  Sex,
  TransportMode,
  WallMaterial,
} from "@shared/constants";

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
