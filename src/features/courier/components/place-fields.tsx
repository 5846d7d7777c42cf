import { useState } from "react";
import { useFormContext } from "react-hook-form";
import type { HandoffInput } from "@shared/schemas/transfer";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";

type Located =
  | { state: "idle" }
  | { state: "locating" }
  | { state: "found"; accuracyM: number }
  | { state: "failed"; message: string };

/**
 * Where custody changes hands: a place in words and, if the phone allows, its position. Without a
 * position Hatchway takes the pickup to be at the origin address and the delivery at the destination.
 */
export function PlaceFields() {
  const { register, setValue, formState } = useFormContext<HandoffInput>();
  const [located, setLocated] = useState<Located>({ state: "idle" });

  function locate() {
    setLocated({ state: "locating" });
    navigator.geolocation.getCurrentPosition(
      (position) => {
        setValue("place.lat", position.coords.latitude, { shouldDirty: true });
        setValue("place.lon", position.coords.longitude, { shouldDirty: true });
        setValue("place.accuracyM", Math.round(position.coords.accuracy), { shouldDirty: true });
        setLocated({ state: "found", accuracyM: Math.round(position.coords.accuracy) });
      },
      (error) =>
        setLocated({
          state: "failed",
          message:
            error.code === error.PERMISSION_DENIED
              ? "Location is not allowed for this site. Type the place instead."
              : "No location fix. Type the place instead.",
        }),
      { enableHighAccuracy: true, timeout: 15_000, maximumAge: 60_000 },
    );
  }

  return (
    <fieldset className="grid gap-3">
      <legend className="mb-2 font-display text-lg font-semibold">Where</legend>
      <TextField
        label="Place"
        placeholder="e.g. carrier hub, Memphis"
        error={formState.errors.place?.text?.message}
        {...register("place.text")}
      />
      {typeof navigator !== "undefined" && "geolocation" in navigator ? (
        <div className="flex flex-wrap items-center gap-3">
          <Button type="button" variant="secondary" size="lg" onClick={locate} busy={located.state === "locating"}>
            Use my location
          </Button>
          <p role="status" className="text-ink-soft">
            {located.state === "found"
              ? `Location recorded (within ${located.accuracyM} m).`
              : located.state === "failed"
                ? located.message
                : ""}
          </p>
        </div>
      ) : null}
    </fieldset>
  );
}
