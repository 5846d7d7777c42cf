import { booleanPointInPolygon } from "@turf/boolean-point-in-polygon";
import { describe, expect, it } from "vitest";
import { placeFromZip } from "@shared/temperature/places";
import {
  ATLAS_SIZE,
  MIN_VIEW_WIDTH,
  fitView,
  project,
  spreadStacked,
  stateFeatures,
  stateOutlines,
} from "./map-geometry";

const stateNamed = (name: string) => {
  const state = stateFeatures.find((f) => f.properties.name === name);
  if (!state) throw new Error(`no ${name} in the atlas`);
  return state;
};

// Places and the state each lies in: the Rosetta Code airports timeline.test.ts uses [published],
// and ZIP centres from the zipcodes package (Anchorage 99501, Honolulu 96813) [published, secondary].
const anchorage = placeFromZip("99501")!;
const honolulu = placeFromZip("96813")!;
const PLACES = [
  { name: "Nashville airport", lat: 36.12, lon: -86.67, state: "Tennessee" },
  { name: "Los Angeles airport", lat: 33.94, lon: -118.4, state: "California" },
  { name: "Anchorage", lat: anchorage.lat, lon: anchorage.lon, state: "Alaska" },
  { name: "Honolulu", lat: honolulu.lat, lon: honolulu.lon, state: "Hawaii" },
];

describe("the atlas projection", () => {
  it("has the 50 states and the District of Columbia", () => {
    // us-atlas's projected file keeps what geoAlbersUsa shows: 50 states and DC, no territories (README) [published]
    expect(stateOutlines.length).toBe(51);
    expect(stateOutlines.every((s) => s.d.startsWith("M"))).toBe(true);
  });

  it.each(PLACES)("puts $name inside $state, Alaska and Hawaii in their insets", (place) => {
    const xy = project(place);
    expect(xy).not.toBeNull();
    // d3-geo's geoAlbersUsa with us-atlas's scale and translation (README) lands on the projected outline.
    expect(booleanPointInPolygon(xy!, stateNamed(place.state))).toBe(true);
    const others = stateFeatures.filter((f) => f.properties.name !== place.state);
    expect(others.some((f) => booleanPointInPolygon(xy!, f))).toBe(false);
    expect(xy![0]).toBeGreaterThanOrEqual(0);
    expect(xy![0]).toBeLessThanOrEqual(ATLAS_SIZE.width);
  });

  it("places Alaska's inset in the lower left, as geoAlbersUsa documents", () => {
    const [x, y] = project(anchorage)!;
    expect(x).toBeLessThan(ATLAS_SIZE.width / 3);
    expect(y).toBeGreaterThan(ATLAS_SIZE.height / 2);
  });

  it("says null for a place the composite projection does not show", () => {
    // Mexico City is outside the lower 48, Alaska and Hawaii [memory]
    expect(project({ lat: 19.43, lon: -99.13 })).toBeNull();
  });
});

describe("fitView", () => {
  it("shows the whole atlas without points", () => {
    expect(fitView([])).toEqual({ x: 0, y: 0, ...ATLAS_SIZE });
  });

  it("keeps a short trip in context, at the atlas's aspect ratio, every point inside", () => {
    const points: [number, number][] = [
      [700, 300],
      [704, 306],
    ];
    const view = fitView(points);
    expect(view.width).toBeCloseTo(MIN_VIEW_WIDTH, 6);
    expect(view.width / view.height).toBeCloseTo(ATLAS_SIZE.width / ATLAS_SIZE.height, 6);
    for (const [x, y] of points) {
      expect(x).toBeGreaterThan(view.x);
      expect(x).toBeLessThan(view.x + view.width);
      expect(y).toBeGreaterThan(view.y);
      expect(y).toBeLessThan(view.y + view.height);
    }
  });

  it("moves a view near the edge back inside the atlas", () => {
    const view = fitView([
      [960, 100],
      [950, 110],
    ]);
    expect(view.x + view.width).toBeLessThanOrEqual(ATLAS_SIZE.width + 1e-9);
    expect(view.x).toBeGreaterThanOrEqual(0);
  });

  it("takes the whole atlas for a coast-to-coast trip", () => {
    const [a, b] = [project({ lat: 40.75, lon: -74 })!, project({ lat: 33.94, lon: -118.4 })!];
    const view = fitView([a, b]);
    expect(view.width).toBeLessThanOrEqual(ATLAS_SIZE.width);
    expect(view.x).toBeLessThanOrEqual(Math.min(a[0], b[0]));
    expect(view.x + view.width).toBeGreaterThanOrEqual(Math.max(a[0], b[0]));
  });
});

describe("spreadStacked", () => {
  it("leaves marks on their own spot and lays marks sharing a spot out below it, in order", () => {
    const points: [number, number][] = [
      [100, 100],
      [200, 200],
      [200, 200],
      [200, 200],
      [300, 100],
    ];
    const spread = spreadStacked(points, 10, 2);
    expect(spread[0]).toEqual([100, 100]);
    expect(spread[4]).toEqual([300, 100]);
    // three hours at one place: two in the first row, one centred in the second, all below the place
    expect(spread[1]).toEqual([195, 218]);
    expect(spread[2]).toEqual([205, 218]);
    expect(spread[3]).toEqual([200, 228]);
    const distinct = new Set(spread.map((p) => p.join(",")));
    expect(distinct.size).toBe(points.length);
  });
});
