import type { PhotoDto } from "@shared/schemas/transfer";
import { PHOTO_SUBJECT_WORDS } from "@shared/words";
import { formatInstant } from "@shared/dates";

/**
 * Photos of a moment as thumbnails; each opens the full photo. `shows` names what a photo's box or
 * animal line is ("Box D", "Agalychnis callidryas") where the caller knows it.
 */
export function PhotoStrip({
  photos,
  shows,
  label = "Photos",
}: {
  photos: readonly PhotoDto[];
  shows?: (photo: PhotoDto) => string | null;
  label?: string;
}) {
  if (photos.length === 0) return null;
  return (
    <ul aria-label={label} className="mt-2 flex flex-wrap gap-2">
      {photos.map((photo) => {
        const what = [PHOTO_SUBJECT_WORDS[photo.subject], shows?.(photo)].filter(Boolean).join(" — ");
        const caption = `${what}, by ${photo.uploadedBy.displayName}, ${formatInstant(photo.at)}`;
        return (
          <li key={photo.id}>
            <a
              href={photo.url}
              target="_blank"
              rel="noopener"
              className="block rounded-md border border-rule bg-paper-card p-1 hover:border-fern"
              title={caption}
            >
              <img src={photo.url} alt={caption} className="h-20 w-20 rounded object-cover" width={80} height={80} />
              <span className="mt-1 block max-w-20 truncate text-xs text-ink-soft">{what}</span>
            </a>
          </li>
        );
      })}
    </ul>
  );
}
