import type { DocumentKind } from "../constants";
import type { ExpiryStatus } from "../compliance/expiry";
import type { HolderSide } from "../compliance/rule";

/** A document's kind as a label: on screen, on the manifest, in e-mail. */
export const DOCUMENT_KIND_WORDS: Readonly<Record<DocumentKind, string>> = {
  state_import_permit: "State import permit",
  possession_permit: "Possession permit or licence",
  export_permit: "Export permit",
  federal_permit: "Federal permit",
  captive_bred_registration: "Captive-bred wildlife registration",
  cvi: "Certificate of Veterinary Inspection (CVI)",
};

/**
 * A document's kind inside a sentence ("a possession permit or licence from Ohio"). The CVI also
 * names the health certificate that 9 CFR 74.1 accepts in its place.
 */
export const DOCUMENT_KIND_IN_SENTENCE: Readonly<Record<DocumentKind, string>> = {
  // The issuing state follows in the sentence: "an import permit from Ohio".
  state_import_permit: "import permit",
  possession_permit: "possession permit or licence",
  export_permit: "export permit",
  federal_permit: "federal permit",
  captive_bred_registration: "captive-bred wildlife registration",
  cvi: "certificate of veterinary inspection (CVI) or health certificate",
};

export const EXPIRY_WORDS: Readonly<Record<ExpiryStatus, string>> = {
  open: "No end date",
  valid: "Valid",
  expiring: "Expires soon",
  expired: "Expired",
};

/** Which party of the transfer holds a document. */
export const HOLDER_SIDE_WORDS: Readonly<Record<HolderSide, string>> = {
  receiver: "the receiver",
  sender: "the sender",
};
