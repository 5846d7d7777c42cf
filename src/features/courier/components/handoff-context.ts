import type { HandoffContext } from "@shared/custody/handoff-review";
import type { TransferDto } from "@shared/schemas/transfer";

/**
 * What the phone knows of the record before a handoff, for the same review the server runs
 * (shared/custody/handoff-review.ts): the boxes and seals on record, earlier handoffs, who is
 * assigned, who may receive. `viewerName` counts as a receiver's name when the viewer is the receiver.
 */
export function handoffContextOf(t: TransferDto, viewerName: string): HandoffContext {
  const position = (p: TransferDto["origin"]) => (p.lat != null && p.lon != null ? { lat: p.lat, lon: p.lon } : null);
  return {
    mode: t.mode,
    plannedDepartureAt: t.plannedDepartureAt,
    originTimeZone: t.origin.timeZone,
    origin: position(t.origin),
    destination: position(t.destination),
    legCourierNames: [...t.legs].sort((a, b) => a.sequence - b.sequence).map((l) => l.courier.displayName),
    receiverNames: [
      ...(t.receiver.contact ? [t.receiver.contact.displayName] : []),
      t.receiver.organization.name,
      ...(t.viewerRole === "receiver" ? [viewerName] : []),
    ],
    containers: t.containers.map((c) => ({ id: c.id, label: c.label, sealNumber: c.sealNumber })),
    previous: t.handoffs.map((h) => ({ handoffIndex: h.handoffIndex, at: h.at, place: h.place })),
  };
}
