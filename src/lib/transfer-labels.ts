import type { TransferStatus } from "@shared/constants";

/** The colour a state wears: amber when someone has to act, brick only for a cancelled one. */
export const statusTone: Record<TransferStatus, "neutral" | "info" | "caution" | "ok" | "block"> = {
  draft: "neutral",
  awaiting_receiver: "caution",
  ready: "ok",
  in_transit: "info",
  delivered: "caution",
  checked_in: "ok",
  closed: "neutral",
  cancelled: "block",
};

/** Options for a select from a word map (shared/words), in the map's order. */
export function optionsOf<K extends string>(labels: Readonly<Record<K, string>>): { value: K; label: string }[] {
  return (Object.entries(labels) as [K, string][]).map(([value, label]) => ({ value, label }));
}
