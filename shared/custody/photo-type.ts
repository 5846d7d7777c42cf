/**
 * The image types a custody photo may have: what phone cameras save (JPEG) and screenshots (PNG).
 * The bytes decide the type (server/services/compliance/documents.ts validates them), never the
 * name or the declared type.
 */
export const PHOTO_CONTENT_TYPES = ["image/jpeg", "image/png"] as const;
export type PhotoContentType = (typeof PHOTO_CONTENT_TYPES)[number];

export function isPhotoContentType(type: string | null | undefined): type is PhotoContentType {
  return (PHOTO_CONTENT_TYPES as readonly string[]).includes(type ?? "");
}
