import { createRequire } from "node:module";
import { booleanPointInPolygon } from "@turf/boolean-point-in-polygon";
import type { Feature, MultiPolygon, Polygon } from "geojson";
import { feature } from "topojson-client";
import type { GeometryCollection, Topology } from "topojson-specification";
import type { TransportMode, UsState } from "@shared/constants";
import { haversineKm, interpolateGreatCircle, type LatLon } from "@shared/temperature/geo";
import { computedOnce } from "../../computed-once";

/**
 * FIPS state codes (the ids of the Census Bureau's cartographic boundary files) to USPS codes.
 * [published] U.S. Census Bureau, "FIPS codes for the states and the District of Columbia" and
 * ANSI INCITS 38:2009; the names in us-atlas's file are checked against ours in the test.
 */
export const FIPS_TO_USPS: Readonly<Record<string, UsState>> = {
  "01": "AL",
  "02": "AK",
  "04": "AZ",
  "05": "AR",
  "06": "CA",
  "08": "CO",
  "09": "CT",
  "10": "DE",
  "11": "DC",
  "12": "FL",
  "13": "GA",
  "15": "HI",
  "16": "ID",
  "17": "IL",
  "18": "IN",
  "19": "IA",
  "20": "KS",
  "21": "KY",
  "22": "LA",
  "23": "ME",
  "24": "MD",
  "25": "MA",
  "26": "MI",
  "27": "MN",
  "28": "MS",
  "29": "MO",
  "30": "MT",
  "31": "NE",
  "32": "NV",
  "33": "NH",
  "34": "NJ",
  "35": "NM",
  "36": "NY",
  "37": "NC",
  "38": "ND",
  "39": "OH",
  "40": "OK",
  "41": "OR",
  "42": "PA",
  "44": "RI",
  "45": "SC",
  "46": "SD",
  "47": "TN",
  "48": "TX",
  "49": "UT",
  "50": "VT",
  "51": "VA",
  "53": "WA",
  "54": "WV",
  "55": "WI",
  "56": "WY",
  "60": "AS",
  "66": "GU",
  "69": "MP",
  "72": "PR",
  "78": "VI",
};

type StateShape = {
  state: UsState;
  name: string;
  shape: Feature<Polygon | MultiPolygon>;
  /** [west, south, east, north] in degrees, to skip most point-in-polygon tests. */
  box: [number, number, number, number];
};

function boundingBox(shape: Feature<Polygon | MultiPolygon>): StateShape["box"] {
  const rings = shape.geometry.type === "Polygon" ? shape.geometry.coordinates : shape.geometry.coordinates.flat();
  let [west, south, east, north] = [180, 90, -180, -90];
  for (const ring of rings) {
    for (const [lon, lat] of ring as [number, number][]) {
      west = Math.min(west, lon);
      east = Math.max(east, lon);
      south = Math.min(south, lat);
      north = Math.max(north, lat);
    }
  }
  return [west, south, east, north];
}

/**
 * The state outlines of the Census Bureau's cartographic boundary files (2017, 1:10,000,000,
 * as redistributed by the us-atlas package), read once per process.
 */
export const stateShapes: () => readonly StateShape[] = computedOnce(() => {
  const require = createRequire(import.meta.url);
  const topology = require("us-atlas/states-10m.json") as Topology<{ states: GeometryCollection<{ name: string }> }>;
  const collection = feature(topology, topology.objects.states);
  return collection.features.flatMap((shape) => {
    const state = FIPS_TO_USPS[String(shape.id)];
    if (!state || (shape.geometry.type !== "Polygon" && shape.geometry.type !== "MultiPolygon")) return [];
    const outline = shape as Feature<Polygon | MultiPolygon>;
    return [{ state, name: shape.properties?.name ?? "", shape: outline, box: boundingBox(outline) }];
  });
});

/** The state (or DC, or territory) a position lies in; null at sea or outside the US. */
export function stateAt(point: LatLon): UsState | null {
  for (const { state, shape, box } of stateShapes()) {
    const [west, south, east, north] = box;
    if (point.lon < west || point.lon > east || point.lat < south || point.lat > north) continue;
    if (booleanPointInPolygon([point.lon, point.lat], shape)) return state;
  }
  return null;
}

/** Spacing of the points tested along the line: short enough not to jump over a narrow state. */
export const ROUTE_SAMPLE_KM = 5;

/**
 * The states a ground route passes through, in travel order, each once (the states of its ends
 * are included where the line is in them; callers leave the transfer's own ends out).
 * The route is the great circle from origin to destination, as the temperature timeline lays out
 * a drive (shared/temperature/timeline.ts): points every 5 km, each placed in a state by the
 * Census Bureau's state outlines. Roads bend, so the states a driver actually crosses can differ;
 * the screens say so. By air no transit state is named: the box flies over states without
 * entering them, and a transfer records no carrier hub.
 */
export function transitStatesAlong(origin: LatLon, destination: LatLon, mode: TransportMode): UsState[] {
  if (mode === "overnight_air") return [];
  const key = `${origin.lat},${origin.lon}|${destination.lat},${destination.lon}`;
  const known = routesSeen.get(key);
  if (known) return [...known];
  const states = statesAlong(origin, destination);
  // A pure function of the two positions: remembered (a few hundred routes at most), never a setting.
  if (routesSeen.size >= ROUTES_REMEMBERED) routesSeen.delete(routesSeen.keys().next().value as string);
  routesSeen.set(key, states);
  return [...states];
}

/** Routes whose states were worked out, oldest first; each takes tens of milliseconds to lay out. */
const routesSeen = new Map<string, readonly UsState[]>();
const ROUTES_REMEMBERED = 500;

function statesAlong(origin: LatLon, destination: LatLon): UsState[] {
  const steps = Math.max(1, Math.ceil(haversineKm(origin, destination) / ROUTE_SAMPLE_KM));
  const seen: UsState[] = [];
  for (let step = 1; step < steps; step++) {
    const state = stateAt(interpolateGreatCircle(origin, destination, step / steps));
    if (state && !seen.includes(state)) seen.push(state);
  }
  return seen;
}
