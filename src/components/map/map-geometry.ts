import { geoAlbersUsa, geoPath } from "d3-geo";
import { feature } from "topojson-client";
import type { Feature, MultiPolygon, Polygon } from "geojson";
import type { GeometryCollection, Topology } from "topojson-specification";
import type { LatLon } from "@shared/temperature/geo";
import statesAlbers from "us-atlas/states-albers-10m.json";

/** The viewport us-atlas's projected files are made for, in SVG units. */
export const ATLAS_SIZE = { width: 975, height: 610 } as const;

/**
 * d3-geo's Albers USA composite (Alaska and Hawaii as insets), with the scale and translation
 * us-atlas projected its "albers" files with (its README), so a place lands on its state.
 */
export const atlasProjection = geoAlbersUsa().scale(1300).translate([487.5, 305]);

/** A position on the map in SVG units; null outside the lower 48, Alaska and Hawaii (the projection's null). */
export function project(position: LatLon): [number, number] | null {
  return atlasProjection([position.lon, position.lat]) ?? null;
}

type StatesTopology = Topology<{ states: GeometryCollection<{ name: string }> }>;
const topology = statesAlbers as unknown as StatesTopology;

/** The states as planar features in the map's units (Census Bureau cartographic outlines, 2017, via us-atlas). */
export const stateFeatures = feature(topology, topology.objects.states).features.filter(
  (state): state is Feature<Polygon | MultiPolygon, { name: string }> =>
    state.geometry.type === "Polygon" || state.geometry.type === "MultiPolygon",
);

const planarPath = geoPath(null);

/** Each state's outline as SVG path data, with its name. */
export const stateOutlines: readonly { name: string; d: string }[] = stateFeatures.map((state) => ({
  name: state.properties.name,
  d: planarPath(state) ?? "",
}));

export type ViewBox = { x: number; y: number; width: number; height: number };

/** The smallest part of the atlas a map shows, in SVG units (about 750 km across in the lower 48). */
export const MIN_VIEW_WIDTH = 200;

/**
 * The part of the atlas that shows every point with a margin: at least MIN_VIEW_WIDTH wide, the
 * atlas's own aspect ratio (so the page reserves its height before the map draws), moved back
 * inside the atlas where it can be. No points: the whole atlas.
 */
export function fitView(points: readonly [number, number][], paddingShare = 0.15): ViewBox {
  const whole: ViewBox = { x: 0, y: 0, ...ATLAS_SIZE };
  if (points.length === 0) return whole;
  const xs = points.map((p) => p[0]);
  const ys = points.map((p) => p[1]);
  const [minX, maxX, minY, maxY] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  const aspect = ATLAS_SIZE.width / ATLAS_SIZE.height;
  let width = Math.max((maxX - minX) * (1 + 2 * paddingShare), MIN_VIEW_WIDTH);
  let height = (maxY - minY) * (1 + 2 * paddingShare);
  if (width / aspect < height) width = height * aspect;
  else height = width / aspect;
  if (width >= ATLAS_SIZE.width) return whole;
  const fit = (centre: number, size: number, limit: number) => Math.min(Math.max(centre - size / 2, 0), limit - size);
  return {
    x: fit((minX + maxX) / 2, width, ATLAS_SIZE.width),
    y: fit((minY + maxY) / 2, height, ATLAS_SIZE.height),
    width,
    height,
  };
}

/**
 * Marks that fall on one spot (the hours the box waits at a place) laid out in a block of rows
 * just below it, in time order, so each hour stays visible and countable; a lone mark stays put.
 * `spacing` is the distance between marks in SVG units.
 */
export function spreadStacked(points: readonly [number, number][], spacing: number, perRow = 6): [number, number][] {
  const groups = new Map<string, number[]>();
  points.forEach(([x, y], index) => {
    const key = `${Math.round(x / (spacing / 4))},${Math.round(y / (spacing / 4))}`;
    groups.set(key, [...(groups.get(key) ?? []), index]);
  });
  const spread = points.map((p): [number, number] => [p[0], p[1]]);
  for (const members of groups.values()) {
    if (members.length < 2) continue;
    const [x0, y0] = points[members[0]!]!;
    members.forEach((index, k) => {
      const row = Math.floor(k / perRow);
      const inRow = Math.min(perRow, members.length - row * perRow);
      const col = k % perRow;
      spread[index] = [x0 + (col - (inRow - 1) / 2) * spacing, y0 + spacing * 1.8 + row * spacing];
    });
  }
  return spread;
}
