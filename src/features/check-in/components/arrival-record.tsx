import type { TransferDto } from "@shared/schemas/transfer";
import { SEX_WORDS } from "@shared/words";
import { formatInstant } from "@shared/dates";
import { formatWeight } from "@shared/units";
import { Notice } from "@/components/ui/feedback";
import { PhotoStrip } from "@/components/ui/photo-strip";
import { TaxonName } from "@/components/ui/taxon-name";
import { useUnitSystem } from "@/lib/units-preference";

/**
 * What the check-in recorded, line by line: losses first and plainly ("2 dead on arrival, 1 missing"
 * with their notes), then every line's outcome, problem, weight, notes and photos. Nothing the
 * receiver wrote is dropped.
 */
export function ArrivalRecord({ transfer: t }: { transfer: TransferDto }) {
  const [system] = useUnitSystem();
  const c = t.checkIn;
  if (!c) return null;
  const animals = new Map(t.animals.map((a) => [a.id, a]));
  const dead = c.items.reduce((n, i) => n + i.deadOnArrival, 0);
  const missing = c.items.reduce((n, i) => n + i.missing, 0);
  const losses = c.items.filter((i) => i.deadOnArrival || i.missing);
  const photosOf = (animalId: string | null) =>
    t.photos.filter((p) => p.moment === "check_in" && p.animalId === animalId);
  const lossTitle = [dead ? `${dead} dead on arrival` : null, missing ? `${missing} missing` : null]
    .filter(Boolean)
    .join(", ");
  return (
    <div className="grid gap-4">
      {losses.length ? (
        <Notice tone="block" title={lossTitle}>
          <ul className="grid gap-1">
            {losses.map((item) => {
              const animal = animals.get(item.animalId);
              const parts = [
                item.deadOnArrival ? `${item.deadOnArrival} dead on arrival` : null,
                item.missing ? `${item.missing} missing` : null,
              ].filter(Boolean);
              return (
                <li key={item.animalId}>
                  <span className="font-semibold">
                    {animal ? <TaxonName taxon={animal.taxon} /> : "An animal line"}
                  </span>
                  : {parts.join(", ")}
                  {item.notes ? ` — ${item.notes}` : ""}
                </li>
              );
            })}
          </ul>
          <p className="mt-1">The register records them as losses, and the sender was told.</p>
        </Notice>
      ) : null}
      <p className="text-sm text-ink-soft">
        Signed by {c.signedName}
        {c.signedName.trim() !== c.signedBy.displayName ? ` (account of ${c.signedBy.displayName})` : ""} on{" "}
        {formatInstant(c.signedAt)}.
      </p>
      <ul className="grid gap-3">
        {c.items.map((item) => {
          const animal = animals.get(item.animalId);
          const outcome = [
            item.arrivedWell ? `${item.arrivedWell} arrived well` : null,
            item.arrivedProblem ? `${item.arrivedProblem} with a problem` : null,
            item.deadOnArrival ? `${item.deadOnArrival} dead on arrival` : null,
            item.missing ? `${item.missing} missing` : null,
          ].filter(Boolean);
          return (
            <li key={item.animalId} className="rounded-card border border-rule bg-paper p-3">
              <p className="font-semibold">
                {animal ? (
                  <>
                    {animal.count} × <TaxonName taxon={animal.taxon} />, {SEX_WORDS[animal.sex].toLowerCase()}
                  </>
                ) : (
                  "An animal line"
                )}
              </p>
              <p className="text-sm">{outcome.join(", ")}.</p>
              {item.problem ? <p className="text-sm">Problem: {item.problem}</p> : null}
              {item.weightG != null ? (
                <p className="text-sm">Weight on arrival: {formatWeight(item.weightG, system)}</p>
              ) : null}
              {item.notes ? <p className="whitespace-pre-wrap text-sm">Notes: {item.notes}</p> : null}
              <PhotoStrip photos={photosOf(item.animalId)} label="Photos of this line" />
            </li>
          );
        })}
      </ul>
      {photosOf(null).length ? (
        <div>
          <p className="text-sm font-semibold">Photos of the arrival</p>
          <PhotoStrip photos={photosOf(null)} label="Photos of the arrival" />
        </div>
      ) : null}
      {c.notes ? <p className="whitespace-pre-wrap text-sm">Notes on the arrival: {c.notes}</p> : null}
    </div>
  );
}
