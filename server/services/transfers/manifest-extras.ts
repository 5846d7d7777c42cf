import type { AppContext } from "../../context";
import type { ManifestDocument, ManifestTemperature } from "../../pdf/manifest-input";

/** What other parts of Hatchway add to the manifest: the permits on file, the temperature advice. */
export type ManifestExtras = { documents?: ManifestDocument[]; temperature?: ManifestTemperature | null };

/**
 * One contributor to the manifest. The composition root lists an app's providers (compliance,
 * then temperature), so the PDF code depends on neither and nothing registers itself.
 */
export type ManifestExtrasProvider = (ctx: AppContext, transferId: string) => Promise<ManifestExtras>;

/** Asks each of the app's providers in turn and merges what they add. */
export async function manifestExtras(ctx: AppContext, transferId: string): Promise<Required<ManifestExtras>> {
  const out: Required<ManifestExtras> = { documents: [], temperature: null };
  for (const provide of ctx.manifestExtras) {
    const extra = await provide(ctx, transferId);
    if (extra.documents) out.documents.push(...extra.documents);
    if (extra.temperature !== undefined) out.temperature = extra.temperature;
  }
  return out;
}
