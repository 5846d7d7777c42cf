/** The file types a permit or certificate scan may have. */
export const SCAN_CONTENT_TYPES = ["application/pdf", "image/jpeg", "image/png"] as const;
export type ScanContentType = (typeof SCAN_CONTENT_TYPES)[number];

/** Types a client may declare for the upload body; the content decides, never the declaration. */
export const SCAN_UPLOAD_DECLARED_TYPES = [...SCAN_CONTENT_TYPES, "application/octet-stream"] as const;

const SIGNATURES: readonly { type: ScanContentType; bytes: readonly number[] }[] = [
  { type: "application/pdf", bytes: [0x25, 0x50, 0x44, 0x46, 0x2d] }, // "%PDF-"
  { type: "image/jpeg", bytes: [0xff, 0xd8, 0xff] },
  { type: "image/png", bytes: [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a] },
];

/** The type a file's first bytes (its magic number) show, or null for anything else. */
export function sniffScanType(bytes: Uint8Array): ScanContentType | null {
  const match = SIGNATURES.find(({ bytes: signature }) => signature.every((byte, i) => bytes[i] === byte));
  return match?.type ?? null;
}

/** The file-name extension a scan of this type is saved under. */
export const SCAN_EXTENSIONS: Record<ScanContentType, string> = {
  "application/pdf": "pdf",
  "image/jpeg": "jpg",
  "image/png": "png",
};
