import type { DocumentKind } from "@shared/constants";
import type { ExpiryStatus } from "./expiry";
import type { Severity, Verdict } from "./schemas";

/** Words for document kinds, on screen and in e-mail. */
export const DOCUMENT_KIND_LABELS: Record<DocumentKind, string> = {
  state_import_permit: "State import permit",
  possession_permit: "Possession permit or licence",
  export_permit: "Export permit",
  federal_permit: "Federal permit",
  captive_bred_registration: "Captive-bred wildlife registration",
  cvi: "CVI or health certificate",
};

export const VERDICT_LABELS: Record<Verdict, string> = {
  clear: "Clear to travel",
  needs_documents: "Documents needed",
  blocked: "Blocked",
};

export const SEVERITY_LABELS: Record<Severity, string> = {
  blocks: "Blocks",
  needs_document: "Needs a document",
  advisory: "Advice",
};

export const EXPIRY_LABELS: Record<ExpiryStatus, string> = {
  open: "No end date",
  valid: "Valid",
  expiring: "Expires soon",
  expired: "Expired",
};
