import { useEffect, useId, useMemo, useState } from "react";
import type { PhotoSubject } from "@shared/constants";
import { LIMITS } from "@shared/constants";
import type { ChosenPhoto } from "@/lib/photos";

export type PhotoSlot = { subject: PhotoSubject; label: string; containerId?: string; animalId?: string };

let counter = 0;

/** A preview of a chosen file, released when it goes away. */
function Preview({ file, alt }: { file: File; alt: string }) {
  const url = useMemo(() => URL.createObjectURL(file), [file]);
  useEffect(() => () => URL.revokeObjectURL(url), [url]);
  return <img src={url} alt={alt} className="h-20 w-20 rounded object-cover" width={80} height={80} />;
}

/**
 * Camera buttons for the photos of a moment (the box from outside, a seal, an animal). On a phone
 * each opens the back camera (`capture="environment"`); the photos are sent once the moment is recorded.
 */
export function PhotoPicker({
  slots,
  value,
  onChange,
}: {
  slots: readonly PhotoSlot[];
  value: readonly ChosenPhoto[];
  onChange: (photos: ChosenPhoto[]) => void;
}) {
  const id = useId();
  const [problem, setProblem] = useState<string | null>(null);
  const maxMb = LIMITS.photoBytesMax / (1024 * 1024);

  function add(slot: PhotoSlot, files: FileList | null) {
    const chosen = [...(files ?? [])];
    const tooBig = chosen.filter((f) => f.size > LIMITS.photoBytesMax);
    const notImages = chosen.filter((f) => f.type && !f.type.startsWith("image/"));
    setProblem(
      tooBig.length
        ? `${tooBig.map((f) => f.name).join(", ")}: larger than ${maxMb} MB. Take it again at a lower resolution.`
        : notImages.length
          ? `${notImages.map((f) => f.name).join(", ")}: not a photo.`
          : null,
    );
    const ok = chosen.filter((f) => !tooBig.includes(f) && !notImages.includes(f));
    onChange([
      ...value,
      ...ok.map((file) => ({
        key: `photo-${++counter}`,
        file,
        subject: slot.subject,
        containerId: slot.containerId,
        animalId: slot.animalId,
      })),
    ]);
  }

  return (
    <div className="grid gap-3">
      <div className="flex flex-wrap gap-2">
        {slots.map((slot, i) => (
          <label
            key={`${slot.subject}-${slot.containerId ?? slot.animalId ?? i}`}
            htmlFor={`${id}-${i}`}
            className="inline-flex min-h-12 cursor-pointer items-center gap-2 rounded-md border border-rule bg-paper-card px-4 font-medium text-fern focus-within:ring-2 focus-within:ring-fern hover:bg-paper-deep"
          >
            <span aria-hidden className="text-xl leading-none">
              +
            </span>{" "}
            {slot.label}
            <input
              id={`${id}-${i}`}
              type="file"
              accept="image/*"
              capture="environment"
              multiple
              className="sr-only"
              onChange={(e) => {
                add(slot, e.target.files);
                e.target.value = "";
              }}
            />
          </label>
        ))}
      </div>
      {problem ? (
        <p role="alert" className="text-sm font-medium text-brick">
          {problem}
        </p>
      ) : null}
      {value.length ? (
        <ul aria-label="Photos to send" className="flex flex-wrap gap-2">
          {value.map((photo) => {
            const slot = slots.find(
              (s) =>
                s.subject === photo.subject && s.containerId === photo.containerId && s.animalId === photo.animalId,
            );
            return (
              <li
                key={photo.key}
                className="grid justify-items-center gap-1 rounded-md border border-rule bg-paper-card p-1"
              >
                <Preview file={photo.file} alt={slot?.label ?? "Photo"} />
                <button
                  type="button"
                  className="min-h-11 px-2 text-sm font-medium text-brick underline"
                  onClick={() => onChange(value.filter((p) => p.key !== photo.key))}
                >
                  Remove
                </button>
              </li>
            );
          })}
        </ul>
      ) : null}
    </div>
  );
}
