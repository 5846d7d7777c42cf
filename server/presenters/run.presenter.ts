import type { RunDto, RunStopDto } from "@shared/schemas/run";
import { RUN_GUIDANCE } from "@shared/words/runs";
import { townNear } from "@shared/temperature/places";
import { timeZoneAt } from "@shared/temperature/zoned-time";
import { runAbilities, type RunViewerRole } from "../policies/run.policy";
import type { RunView } from "../services/runs/read-run";

/** The sender at a pickup, the receiver at a drop-off: who to ask for at the door. */
function partyAt(view: RunView, transferId: string, kind: RunStopDto["kind"]): RunStopDto["party"] {
  const t = view.transfers.get(transferId)!;
  const org = view.organizations.get(kind === "pickup" ? t.senderOrganization.id : t.receiverOrganization.id);
  const contactId = kind === "pickup" ? t.senderContact?.id : t.receiverContact?.id;
  return {
    organizationName: org?.name ?? "",
    contactName: contactId ? (view.people.get(contactId)?.displayName ?? null) : null,
    phone: org?.phone ?? "",
  };
}

/** The zone at a position, or null off the zone map (tz-lookup throws there). */
function zoneAt(lat: number, lon: number): string | null {
  try {
    return timeZoneAt(lat, lon);
  } catch {
    return null;
  }
}

/** A run as its service's people read it (never `res.json(entity)`). */
export function presentRun(view: RunView, role: RunViewerRole): RunDto {
  const { run } = view;
  return {
    id: run.id,
    courierOrganization: { id: view.organization.id, name: view.organization.name },
    departAt: run.departAt.toISOString(),
    climateControlled: run.climateControlled,
    vehicleRangeF:
      run.vehicleMinF != null && run.vehicleMaxF != null ? { min: run.vehicleMinF, max: run.vehicleMaxF } : null,
    drivers: run.driverIds.map((id) => ({ id, displayName: view.people.get(id)?.displayName ?? "" })),
    stops: view.stops.map((stop) => ({
      kind: stop.kind,
      transferId: stop.transfer.id,
      at: stop.arriveAt.toISOString(),
      leaveAt: stop.leaveAt.toISOString(),
      place: stop.place,
      legKm: Math.round(stop.legKm * 10) / 10,
      transferNumber: view.transfers.get(stop.transfer.id)?.number ?? "",
      boxCount: view.boxCounts.get(stop.transfer.id) ?? 0,
      party: partyAt(view, stop.transfer.id, stop.kind),
    })),
    drivingH: Math.round(run.drivingH * 100) / 100,
    roadKm: Math.round(run.roadKm * 10) / 10,
    finishAt: run.finishAt.toISOString(),
    rests: run.rests.map((rest) => ({
      ...rest,
      timeZone: zoneAt(rest.position.lat, rest.position.lon),
      near: townNear(rest.position.lat, rest.position.lon) ?? null,
    })),
    guidance: RUN_GUIDANCE,
    version: run.version,
    abilities: runAbilities(role),
  };
}
