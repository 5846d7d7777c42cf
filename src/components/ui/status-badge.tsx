import { TRANSFER_STATUS_WORDS } from "@shared/words";
import type { TransferStatus } from "@shared/constants";
import { statusTone } from "@/lib/transfer-labels";
import { Badge } from "./feedback";

/** A transfer's state in our words and colours. */
export function StatusBadge({ status }: { status: TransferStatus }) {
  return <Badge tone={statusTone[status]}>{TRANSFER_STATUS_WORDS[status]}</Badge>;
}
