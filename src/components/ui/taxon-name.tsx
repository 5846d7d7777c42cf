import type { TaxonBriefDto } from "@shared/schemas/transfer";
import { Badge } from "./feedback";

/** A species as keepers write it: the scientific name in italics, then the common name. */
export function TaxonName({
  taxon,
  showVenomous = true,
}: {
  taxon: Pick<TaxonBriefDto, "scientificName" | "commonName" | "venomous">;
  showVenomous?: boolean;
}) {
  return (
    <span>
      <i>{taxon.scientificName}</i>
      {taxon.commonName ? <span className="text-ink-soft"> — {taxon.commonName}</span> : null}
      {showVenomous && taxon.venomous ? (
        <>
          {" "}
          <Badge tone="block">Venomous</Badge>
        </>
      ) : null}
    </span>
  );
}
