import type { TransferDto } from "@shared/schemas/transfer";

type Parties = Pick<TransferDto, "sender" | "receiver" | "legs">;

/** How a party signs at a handoff: the contact's name, or the organisation's when there is none. */
const partyName = (p: TransferDto["sender"]) => p.contact?.displayName ?? p.organization.name;

/**
 * Who releases and who receives at handoff `index`: 0 is the sender to the first courier,
 * index n (the number of legs) is the last courier to the receiver, and between them each
 * leg's courier hands to the next one's. Null when no leg is planned at that index.
 */
export function handoffParties(t: Parties, index: number): { releasedBy: string; receivedBy: string } | null {
  const legs = [...t.legs].sort((a, b) => a.sequence - b.sequence);
  if (legs.length === 0 || index < 0 || index > legs.length) return null;
  const releasedBy = index === 0 ? partyName(t.sender) : legs[index - 1]!.courier.displayName;
  const receivedBy = index === legs.length ? partyName(t.receiver) : legs[index]!.courier.displayName;
  return { releasedBy, receivedBy };
}
