import type { AppContext } from "../../context";
import type { ManifestDocument, ManifestTemperature } from "../../pdf/manifest-input";

/** What other parts of Hatchway add to the manifest: the permits on file, the temperature advice. */
export type ManifestExtras = { documents?: ManifestDocument[]; temperature?: ManifestTemperature | null };
type Provider = (ctx: AppContext, transferId: string) => Promise<ManifestExtras>;

const providers: Provider[] = [];

/** Compliance and temperature register here, so the PDF code depends on neither. */
export function registerManifestExtras(provider: Provider): void {
  providers.push(provider);
}

export async function manifestExtras(ctx: AppContext, transferId: string): Promise<Required<ManifestExtras>> {
  const out: Required<ManifestExtras> = { documents: [], temperature: null };
  for (const p of providers) {
    const extra = await p(ctx, transferId);
    if (extra.documents) out.documents.push(...extra.documents);
    if (extra.temperature !== undefined) out.temperature = extra.temperature;
  }
  return out;
}
