import type { TaxonBriefDto, TransferInput } from "@shared/schemas/transfer";
import { forgetWork, keepWork, readKeptWork } from "@/lib/kept-work";

/** The new-transfer form as this browser keeps it between reloads, Back and Forward. */
export type BrowserDraft = {
  step: number;
  values: TransferInput;
  taxa: Record<string, TaxonBriefDto>;
  /** The draft on the server, once the route and parties were chosen; null before. */
  serverDraft: { id: string; number: string; version: number } | null;
  /** The form's values as last saved on the server (or blank): what differs is not saved yet. */
  savedSnapshot: string;
};

const WHAT = "new-transfer";

export function readBrowserDraft(userId: string): (BrowserDraft & { keptAt: string }) | null {
  const kept = readKeptWork<BrowserDraft>(WHAT, userId);
  return kept?.work.values ? { ...kept.work, keptAt: kept.keptAt } : null;
}

/** False when the browser would not keep it (then leaving the page loses it, and the page asks). */
export function writeBrowserDraft(userId: string, draft: BrowserDraft): boolean {
  return keepWork(WHAT, userId, draft);
}

export function clearBrowserDraft(userId: string): void {
  forgetWork(WHAT, userId);
}
