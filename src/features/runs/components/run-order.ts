import { precedenceHolds } from "@shared/runs/plan";
import type { RunDto, RunStopDto } from "@shared/schemas/run";
import { formatInstant, formatTimeSpan } from "@shared/dates";
import { RUN_REST_WORDS, RUN_STOP_KIND_WORDS } from "@shared/words";
import type { RouteMapProps } from "@/components/map/map-types";

type Order = { kind: RunStopDto["kind"]; transferId: string }[];

/**
 * The run's stops with the one at `index` moved one place up (-1) or down (+1), as the PATCH
 * takes them; null when it cannot move (the end of the list, or a drop-off before its pickup).
 */
export function movedStops(stops: readonly RunStopDto[], index: number, step: -1 | 1): Order | null {
  const target = index + step;
  if (index < 0 || index >= stops.length || target < 0 || target >= stops.length) return null;
  const order: Order = stops.map((s) => ({ kind: s.kind, transferId: s.transferId }));
  [order[index], order[target]] = [order[target]!, order[index]!];
  return precedenceHolds(order) ? order : null;
}

/**
 * The map of a run: the road through its stops in order, and the stops and the planned rests
 * as numbered marks in time order (a run has no modelled hours of its own).
 */
export function runMapProps(run: Pick<RunDto, "stops" | "rests">): RouteMapProps {
  const stops = run.stops.map((stop) => ({
    atMs: Date.parse(stop.at),
    mark: {
      lat: stop.place.lat,
      lon: stop.place.lon,
      name: `${RUN_STOP_KIND_WORDS[stop.kind]} ${stop.transferNumber}`,
      place: stop.place.label,
      shortPlace: `${stop.place.city}, ${stop.place.state}`,
      when:
        stop.at === stop.leaveAt
          ? formatInstant(stop.at, stop.place.timeZone)
          : formatTimeSpan(stop.at, stop.leaveAt, stop.place.timeZone),
    },
  }));
  const rests = run.rests.map((rest) => ({
    atMs: Date.parse(rest.startAt),
    mark: {
      lat: rest.position.lat,
      lon: rest.position.lon,
      name: RUN_REST_WORDS[rest.reason],
      place: rest.near ? `On the road near ${rest.near}` : "On the road",
      when: formatTimeSpan(rest.startAt, rest.endAt, rest.timeZone),
    },
  }));
  return {
    title: "the run",
    line: run.stops.map((stop) => ({ lat: stop.place.lat, lon: stop.place.lon })),
    stops: [...stops, ...rests].sort((a, b) => a.atMs - b.atMs).map((s) => s.mark),
  };
}
