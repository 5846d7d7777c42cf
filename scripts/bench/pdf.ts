/**
 * Benchmark of the PDF renderers: the packing manifest for 100 animals in 10 boxes and the
 * labels for those 10 boxes (invented demo data from the fixture). Targets for the manifest:
 * median ≤ 400 ms and ≤ 250 KB.
 * Run standalone: node --import tsx scripts/bench/pdf.ts
 */
import { pathToFileURL } from "node:url";
import { renderLabelsPdf } from "../../server/pdf/labels.pdf";
import { renderManifestPdf } from "../../server/pdf/manifest.pdf";
import { buildBoxes, buildManifestInput } from "../../server/pdf/manifest-input.fixture";
import type { ManifestInput } from "../../server/pdf/manifest-input";

const WARMUP_RUNS = 3;
const TIMED_RUNS = 20;
export const MANIFEST_TARGET = { medianMs: 400, bytes: 250 * 1024 };

export interface PdfBenchResult {
  name: string;
  medianMs: number;
  p95Ms: number;
  bytes: number;
}

const round = (ms: number): number => Math.round(ms * 100) / 100;

async function measure(
  name: string,
  render: (input: ManifestInput) => Promise<Uint8Array>,
  input: ManifestInput,
): Promise<PdfBenchResult> {
  for (let i = 0; i < WARMUP_RUNS; i++) await render(input);
  const timesMs: number[] = [];
  let bytes = 0;
  for (let i = 0; i < TIMED_RUNS; i++) {
    const start = performance.now();
    bytes = (await render(input)).length;
    timesMs.push(performance.now() - start);
  }
  timesMs.sort((a, b) => a - b);
  const at = (q: number): number =>
    timesMs[Math.min(timesMs.length - 1, Math.ceil(q * timesMs.length) - 1)] ?? Number.NaN;
  return { name, medianMs: round(at(0.5)), p95Ms: round(at(0.95)), bytes };
}

/** Median and p95 wall time (ms) and output size (bytes) of one manifest and one label set. */
export async function benchPdf(): Promise<PdfBenchResult[]> {
  const input = buildManifestInput({ boxes: buildBoxes(10, 10) });
  return [
    await measure("pdf: manifest, 100 animals in 10 boxes", renderManifestPdf, input),
    await measure("pdf: labels, 10 boxes", renderLabelsPdf, input),
  ];
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  const results = await benchPdf();
  for (const { name, medianMs, p95Ms, bytes } of results) {
    process.stdout.write(`${name}: median ${medianMs} ms, p95 ${p95Ms} ms, ${(bytes / 1024).toFixed(1)} KB\n`);
  }
  const manifest = results[0];
  if (manifest) {
    const ok = manifest.medianMs <= MANIFEST_TARGET.medianMs && manifest.bytes <= MANIFEST_TARGET.bytes;
    process.stdout.write(`manifest target (≤ ${MANIFEST_TARGET.medianMs} ms, ≤ 250 KB): ${ok ? "met" : "MISSED"}\n`);
  }
}
