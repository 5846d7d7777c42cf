/**
 * Benchmark of a courier's run (issue 16): ordering 40 stops (20 transfers at seeded random places
 * in the contiguous US) and planning their rests, target median ≤ 50 ms; and rendering the run
 * sheet for 40 stops and 120 boxes from its input (the database reads and compliance evaluations
 * that gather the input are not in it), target ≤ 800 ms.
 * Run standalone: node --import tsx scripts/bench/runs.ts
 */
import { pathToFileURL } from "node:url";
import { orderStops, scheduleRun, type RunRequest } from "../../shared/runs/plan";
import { renderRunSheetPdf } from "../../server/pdf/run-sheet.pdf";
import { buildRunSheetInput } from "../../server/pdf/run-sheet-input.fixture";

export const RUN_TARGETS = { planMedianMs: 50, sheetMedianMs: 800 };

const round = (ms: number): number => Math.round(ms * 100) / 100;

async function measure(name: string, runs: number, work: () => unknown) {
  for (let i = 0; i < 3; i++) await work();
  const timesMs: number[] = [];
  let bytes: number | undefined;
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    const out = await work();
    timesMs.push(performance.now() - start);
    if (out instanceof Uint8Array) bytes = out.length;
  }
  timesMs.sort((a, b) => a - b);
  const at = (q: number) => timesMs[Math.min(timesMs.length - 1, Math.ceil(q * timesMs.length) - 1)] ?? Number.NaN;
  return { name, medianMs: round(at(0.5)), p95Ms: round(at(0.95)), ...(bytes ? { bytes } : {}) };
}

/** mulberry32, seeded: the same 20 transfers every run. */
function seeded(seed: number) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export async function benchRuns() {
  const random = seeded(16);
  const place = () => ({ lat: 25 + random() * 24, lon: -124 + random() * 57 });
  const requests: RunRequest[] = Array.from({ length: 20 }, (_, i) => ({
    transferId: `t${i}`,
    pickup: place(),
    dropoff: place(),
  }));
  const byId = new Map(requests.map((r) => [r.transferId, r]));
  const departMs = Date.parse("2026-12-14T13:00:00Z");
  const sheet = buildRunSheetInput(40, 120);
  return [
    await measure("runs: order 40 stops and plan their rests", 50, () => {
      const order = orderStops(requests);
      return scheduleRun(
        order.map((s) => ({
          ...s,
          position: s.kind === "pickup" ? byId.get(s.transferId)!.pickup : byId.get(s.transferId)!.dropoff,
        })),
        departMs,
      );
    }),
    await measure("pdf: run sheet, 40 stops and 120 boxes", 10, () => renderRunSheetPdf(sheet)),
  ];
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  for (const r of await benchRuns()) process.stdout.write(`${r.name}: median ${r.medianMs} ms, p95 ${r.p95Ms} ms\n`);
}
