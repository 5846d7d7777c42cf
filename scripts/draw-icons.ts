/**
 * Draws Hatchway's app icons (public/icon*.png, public/icon.svg): the letter H in warm paper on
 * fern green, the favicon's drawing at app-icon sizes. Our own shapes, no borrowed art.
 * Run `node --import tsx scripts/draw-icons.ts` after changing the drawing; the files are committed.
 */
import { writeFileSync } from "node:fs";
import path from "node:path";
import { PNG } from "pngjs";
import { PROJECT_ROOT } from "./lib/postgres";

const FERN = [0x2f, 0x5d, 0x3a] as const;
const PAPER = [0xf7, 0xf1, 0xe3] as const;

/** The H on a 32-unit grid (the favicon's path): two posts and the bar. */
const H_RECTS = [
  [8, 10, 11, 22],
  [21, 10, 24, 22],
  [11, 15, 21, 18],
] as const;

/**
 * One icon: a rounded square (or, for "maskable", a full square with the H inside the 80 % safe
 * zone that Android's masks keep).
 */
function drawPng(size: number, maskable: boolean): Buffer {
  const png = new PNG({ width: size, height: size });
  const unit = size / 32;
  const radius = maskable ? 0 : 6 * unit;
  const scale = maskable ? 0.7 : 1;
  const offset = (size - size * scale) / 2;
  for (let y = 0; y < size; y++) {
    for (let x = 0; x < size; x++) {
      const i = (y * size + x) * 4;
      const inside = insideRoundedSquare(x + 0.5, y + 0.5, size, radius);
      const gx = (x + 0.5 - offset) / (unit * scale);
      const gy = (y + 0.5 - offset) / (unit * scale);
      const letter = H_RECTS.some(([x0, y0, x1, y1]) => gx >= x0 && gx < x1 && gy >= y0 && gy < y1);
      const colour = letter ? PAPER : FERN;
      png.data[i] = colour[0];
      png.data[i + 1] = colour[1];
      png.data[i + 2] = colour[2];
      png.data[i + 3] = inside ? 255 : 0;
    }
  }
  return PNG.sync.write(png);
}

function insideRoundedSquare(x: number, y: number, size: number, radius: number): boolean {
  if (radius === 0) return true;
  const cx = Math.min(Math.max(x, radius), size - radius);
  const cy = Math.min(Math.max(y, radius), size - radius);
  return (x - cx) ** 2 + (y - cy) ** 2 <= radius ** 2;
}

const SVG = `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 32 32"><rect width="32" height="32" rx="6" fill="#2f5d3a"/><path d="M8 22V10h3v5h10v-5h3v12h-3v-4H11v4z" fill="#f7f1e3"/></svg>\n`;

const out = path.join(PROJECT_ROOT, "public");
writeFileSync(path.join(out, "icon.svg"), SVG);
writeFileSync(path.join(out, "icon-192.png"), drawPng(192, false));
writeFileSync(path.join(out, "icon-512.png"), drawPng(512, false));
writeFileSync(path.join(out, "icon-maskable-512.png"), drawPng(512, true));
console.log(`icons written to ${out}`);
