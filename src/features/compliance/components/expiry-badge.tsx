import { EXPIRY_WORDS } from "@shared/words";
import type { DocumentDto } from "@shared/schemas/compliance";
import { Tag } from "./tag";

const TONE = { open: "neutral", valid: "ok", expiring: "caution", expired: "block" } as const;

/** Amber from 30 days before the last valid day, brick once it has passed. */
export function ExpiryBadge({ expiry }: { expiry: DocumentDto["expiry"] }) {
  const days = expiry.daysLeft;
  const detail =
    expiry.status === "expiring"
      ? days === 0
        ? " — last day today"
        : ` — ${days} day${days === 1 ? "" : "s"} left`
      : expiry.status === "expired" && days !== null
        ? ` — ${-days} day${days === -1 ? "" : "s"} ago`
        : "";
  return (
    <Tag tone={TONE[expiry.status]}>
      {EXPIRY_WORDS[expiry.status]}
      {detail}
    </Tag>
  );
}
