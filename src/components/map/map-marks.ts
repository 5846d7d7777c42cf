import type { AirBand } from "@shared/temperature/air-band";

/**
 * The colours of the bands: Okabe and Ito's palette for colour vision deficiencies ("Color
 * Universal Design", 2008) [published], cold in blues, the safe range in bluish green, warm in
 * orange and vermillion. Shape says the same (triangle down: colder, circle: in range, triangle
 * up: warmer; larger: far past the range), and every dot's title says the value.
 */
export const AIR_BAND_MARKS: Readonly<
  Record<AirBand, { fill: string; shape: "down" | "circle" | "up"; size: number }>
> = {
  well_below: { fill: "#0072B2", shape: "down", size: 1.35 },
  below: { fill: "#56B4E9", shape: "down", size: 1 },
  within: { fill: "#009E73", shape: "circle", size: 1 },
  above: { fill: "#E69F00", shape: "up", size: 1 },
  well_above: { fill: "#D55E00", shape: "up", size: 1.35 },
  unknown: { fill: "#ffffff", shape: "circle", size: 1 },
};

/** SVG path data of a band's mark centred on (x, y), `r` its radius in SVG units. */
export function markPath(band: AirBand, x: number, y: number, r: number): string {
  const { shape, size } = AIR_BAND_MARKS[band];
  const s = r * size;
  if (shape === "circle") return `M${x - s},${y}a${s},${s} 0 1,0 ${2 * s},0a${s},${s} 0 1,0 ${-2 * s},0Z`;
  const h = s * 1.25;
  return shape === "up"
    ? `M${x},${y - h}L${x + h},${y + h * 0.8}L${x - h},${y + h * 0.8}Z`
    : `M${x},${y + h}L${x + h},${y - h * 0.8}L${x - h},${y - h * 0.8}Z`;
}
