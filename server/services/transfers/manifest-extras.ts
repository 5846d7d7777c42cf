import { placeFromZip } from "@shared/temperature/places";
import type { AppContext } from "../../context";
import type { Transfer } from "../../db/entities/transfer.entity";
import type { ManifestDocument, ManifestTemperature, ManifestVerdict } from "../../pdf/manifest-input";

/** What other parts of Hatchway add to the manifest: the permits on file, the temperature advice, the verdicts. */
export type ManifestExtras = {
  documents?: ManifestDocument[];
  temperature?: ManifestTemperature | null;
  verdicts?: ManifestVerdict[];
};

/**
 * One contributor to the manifest. The composition root lists an app's providers (compliance,
 * then temperature), so the PDF code depends on neither and nothing registers itself.
 */
export type ManifestExtrasProvider = (ctx: AppContext, transferId: string) => Promise<ManifestExtras>;

/** Asks each of the app's providers in turn and merges what they add. */
export async function manifestExtras(ctx: AppContext, transferId: string): Promise<Required<ManifestExtras>> {
  const out: Required<ManifestExtras> = { documents: [], temperature: null, verdicts: [] };
  for (const provide of ctx.manifestExtras) {
    const extra = await provide(ctx, transferId);
    if (extra.documents) out.documents.push(...extra.documents);
    if (extra.verdicts) out.verdicts.push(...extra.verdicts);
    if (extra.temperature !== undefined) out.temperature = extra.temperature;
  }
  return out;
}

/** The origin's IANA time zone, where the manifest prints the time of each check. */
export function originZoneOf(transfer: Pick<Transfer, "originTimeZone" | "originZip">): string {
  return transfer.originTimeZone ?? placeFromZip(transfer.originZip.slice(0, 5))?.timeZone ?? "UTC";
}
