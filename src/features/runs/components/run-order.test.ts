import { describe, expect, it } from "vitest";
import type { RunStopDto } from "@shared/schemas/run";
import { movedStops, runMapProps } from "./run-order";

const place = (label: string, lat: number, lon: number) => ({
  label,
  street: "1 Depot Lane",
  city: label,
  state: "TN",
  zip: "37917",
  lat,
  lon,
  timeZone: "America/New_York",
});
const stop = (kind: RunStopDto["kind"], transferId: string, at: string, lat = 36, lon = -85): RunStopDto => ({
  kind,
  transferId,
  at,
  leaveAt: at,
  place: place(`${kind} ${transferId}`, lat, lon),
  legKm: 0,
  transferNumber: `HW-26-${transferId}`,
  boxCount: 1,
  party: { organizationName: "Invented Keepers", contactName: null, phone: "+1 555 0100" },
});

// A run of two transfers: pick up A, pick up B, drop off A, drop off B.
const stops = [
  stop("pickup", "AAAAA", "2026-12-14T13:00:00Z"),
  stop("pickup", "BBBBB", "2026-12-14T15:00:00Z"),
  stop("dropoff", "AAAAA", "2026-12-14T18:00:00Z"),
  stop("dropoff", "BBBBB", "2026-12-14T20:00:00Z"),
];

describe("movedStops", () => {
  it("swaps a stop with its neighbour when every pickup stays before its drop-off", () => {
    expect(movedStops(stops, 2, 1)).toEqual([
      { kind: "pickup", transferId: "AAAAA" },
      { kind: "pickup", transferId: "BBBBB" },
      { kind: "dropoff", transferId: "BBBBB" },
      { kind: "dropoff", transferId: "AAAAA" },
    ]);
  });

  it("lets a drop-off pass another transfer's pickup, never its own, and nothing past either end", () => {
    expect(movedStops(stops, 2, -1)).toEqual([
      { kind: "pickup", transferId: "AAAAA" },
      { kind: "dropoff", transferId: "AAAAA" },
      { kind: "pickup", transferId: "BBBBB" },
      { kind: "dropoff", transferId: "BBBBB" },
    ]);
    expect(movedStops([stops[0]!, stops[2]!], 0, 1)).toBeNull();
    expect(movedStops(stops, 0, -1)).toBeNull();
    expect(movedStops(stops, 3, 1)).toBeNull();
  });
});

describe("runMapProps", () => {
  it("puts the stops and the rests on the map in time order, the line through the stops only", () => {
    const props = runMapProps({
      stops,
      rests: [
        {
          kind: "break",
          reason: "driving_8h",
          startAt: "2026-12-14T16:00:00Z",
          endAt: "2026-12-14T16:30:00Z",
          afterStop: 1,
          position: { lat: 36.1, lon: -86 },
          timeZone: "America/Chicago",
          near: null,
        },
      ],
    });
    expect(props.line).toHaveLength(4);
    expect(props.stops.map((s) => s.name)).toEqual([
      "Pick up HW-26-AAAAA",
      "Pick up HW-26-BBBBB",
      "30-minute break: 8 hours of driving since the last break",
      "Drop off HW-26-AAAAA",
      "Drop off HW-26-BBBBB",
    ]);
  });
});
