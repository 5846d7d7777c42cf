import type { EntityManager } from "@mikro-orm/postgresql";
import type { UsState } from "@shared/constants";
import { FEDERAL, jurisdictionName, type Jurisdiction } from "@shared/compliance/jurisdiction";
import type { CoverageEntry } from "@shared/compliance/coverage";
import type { Finding } from "@shared/compliance/schemas";
import { RUN_GUIDANCE, RUN_REST_WORDS, SEVERITY_WORDS, UNCOVERED_REASON_WORDS } from "@shared/words";
import { AnimalSchema } from "../../db/entities/transfer.entity";
import type { Run } from "../../db/entities/run.entity";
import type { RunSheetInput, RunSheetState } from "../../pdf/run-sheet.pdf";
import { loadCoverageRecords } from "../compliance/coverage";
import { evaluateTransfer } from "../compliance/evaluation";
import { transitStatesAlong } from "../compliance/route-states";
import { readRunView, runBoxes } from "./read-run";

/** The states the van is in, in order: each stop's state and those crossed between stops. */
function statesOnTheWay(stops: readonly { place: { state: string; lat: number; lon: number } }[]): UsState[] {
  const states: UsState[] = [];
  const add = (state: string) => {
    if (states.at(-1) !== state && !states.includes(state as UsState)) states.push(state as UsState);
  };
  stops.forEach((stop, i) => {
    if (i > 0) for (const state of transitStatesAlong(stops[i - 1]!.place, stop.place, "ground_courier")) add(state);
    add(stop.place.state);
  });
  return states;
}

/**
 * Everything the run sheet prints, read from the database: the stops with their boxes and
 * contents, the rests, and the paperwork by state. The paperwork is each transfer's own
 * compliance evaluation (its route, its documents on file), gathered by jurisdiction; a state the
 * van crosses that no transfer's evaluation covered, or whose rules nobody reviewed, says
 * "not reviewed" with the agency to ask: never an empty "nothing needed".
 */
export async function runSheetInput(em: EntityManager, run: Run, now: Date): Promise<RunSheetInput> {
  const view = await readRunView(em, run);
  const transferIds = [...view.transfers.keys()];
  const [containers, animals, coverageRecords] = await Promise.all([
    runBoxes(em, transferIds),
    transferIds.length
      ? em.find(AnimalSchema, { transfer: { $in: transferIds } }, { populate: ["taxon"], orderBy: { position: "asc" } })
      : Promise.resolve([]),
    loadCoverageRecords(em),
  ]);

  const findings = new Map<Jurisdiction, string[]>();
  const coverage = new Map<Jurisdiction, CoverageEntry[]>();
  for (const transfer of view.transfers.values()) {
    const { result } = await evaluateTransfer(em, transfer);
    const seen = new Set<string>();
    const all: Finding[] = [...result.shipmentFindings, ...result.animals.flatMap((line) => line.findings)];
    for (const finding of all) {
      const key = `${finding.ruleId}:${finding.jurisdiction}`;
      if (seen.has(key)) continue;
      seen.add(key);
      const line = `${transfer.number}: ${SEVERITY_WORDS[finding.severity]}. ${finding.message} (${finding.citation.text})${
        finding.satisfiedBy ? ` On file: ${finding.satisfiedBy.number ?? finding.satisfiedBy.kind}.` : ""
      }`;
      findings.set(finding.jurisdiction, [...(findings.get(finding.jurisdiction) ?? []), line]);
    }
    for (const entry of result.coverage)
      coverage.set(entry.jurisdiction, [...(coverage.get(entry.jurisdiction) ?? []), entry]);
  }

  const stateEntry = (jurisdiction: Jurisdiction): RunSheetState => {
    const record = coverageRecords.find((r) => r.jurisdiction === jurisdiction);
    const ask = record ? ` Ask ${record.wildlifeAgency.name} (${record.wildlifeAgency.url}).` : "";
    const entries = coverage.get(jurisdiction) ?? [];
    const uncovered = entries.find((e) => !e.covered);
    const notReviewed =
      entries.length === 0
        ? `no transfer on board was checked against ${jurisdictionName(jurisdiction)}'s rules (each is checked along its own straight route).${ask}`
        : uncovered
          ? `${UNCOVERED_REASON_WORDS[uncovered.uncoveredBecause ?? "not_reviewed"]}${ask}`
          : null;
    const name = jurisdiction === FEDERAL ? "Federal law" : jurisdictionName(jurisdiction);
    return {
      name: name.replace(/^the /, "").replace(/^./, (c) => c.toUpperCase()),
      code: jurisdiction,
      requirements: findings.get(jurisdiction) ?? [],
      notReviewed,
    };
  };

  const contentsOf = (containerId: string) =>
    animals
      .filter((a) => a.container?.id === containerId)
      .map((a) => ({
        scientificName: a.taxon.getEntity().scientificName,
        count: a.count,
        venomous: a.taxon.getEntity().venomous,
      }));
  const zoneOf = (i: number) => view.stops[i]?.place.timeZone ?? "UTC";
  const firstZone = zoneOf(0);
  return {
    courierName: view.organization.name,
    departAt: run.departAt.toISOString(),
    timeZone: firstZone,
    vehicle: run.climateControlled
      ? `Climate-controlled${run.vehicleMinF != null ? `, set ${run.vehicleMinF}–${run.vehicleMaxF} °F` : ", range not given"}`
      : "Not climate-controlled",
    drivers: run.driverIds.map((id) => view.people.get(id)?.displayName ?? "").filter(Boolean),
    drivingH: run.drivingH,
    roadKm: run.roadKm,
    finishAt: run.finishAt.toISOString(),
    guidance: RUN_GUIDANCE,
    stops: view.stops.map((stop) => {
      const transfer = view.transfers.get(stop.transfer.id)!;
      const side = stop.kind === "pickup" ? transfer.senderOrganization.id : transfer.receiverOrganization.id;
      const contactId = stop.kind === "pickup" ? transfer.senderContact?.id : transfer.receiverContact?.id;
      const org = view.organizations.get(side);
      return {
        kind: stop.kind,
        arriveAt: stop.arriveAt.toISOString(),
        leaveAt: stop.leaveAt.toISOString(),
        timeZone: stop.place.timeZone,
        transferNumber: transfer.number,
        address: stop.place.label,
        organizationName: org?.name ?? "",
        contactName: contactId ? (view.people.get(contactId)?.displayName ?? null) : null,
        phone: org?.phone || "no phone on file",
        boxes: containers
          .filter((c) => c.transfer.id === transfer.id)
          .map((c) => ({ label: c.label, sealNumber: c.sealNumber ?? null, contents: contentsOf(c.id) })),
      };
    }),
    rests: run.rests.map((rest) => ({
      title: RUN_REST_WORDS[rest.reason],
      startAt: rest.startAt,
      endAt: rest.endAt,
      afterStop: rest.afterStop,
      timeZone: zoneOf(rest.afterStop),
    })),
    states: [FEDERAL as Jurisdiction, ...statesOnTheWay(view.stops)].map(stateEntry),
    generatedAt: now.toISOString(),
  };
}
