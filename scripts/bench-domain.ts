/**
 * `npm run bench:domain`: the pure computations on their own — the compliance evaluation,
 * the temperature assessment, the PDFs and a courier's run — each repeated and summarised as median and p95.
 */
import { benchCompliance } from "./bench/compliance";
import { benchTemperature } from "./bench/temperature";
import { benchPdf } from "./bench/pdf";
import { benchRuns } from "./bench/runs";
import { announceRuntime } from "./lib/runtime";

type Row = { name: string; medianMs: number; p95Ms: number; bytes?: number };

async function main() {
  announceRuntime("bench");
  const rows: Row[] = [
    ...(await benchCompliance()),
    ...(await benchTemperature()),
    ...(await benchPdf()),
    ...(await benchRuns()),
  ];
  console.log("\n" + "benchmark".padEnd(64) + "median ms".padStart(11) + "p95 ms".padStart(9) + "size".padStart(10));
  for (const r of rows) {
    console.log(
      r.name.padEnd(64) +
        r.medianMs.toFixed(2).padStart(11) +
        r.p95Ms.toFixed(2).padStart(9) +
        (r.bytes ? `${(r.bytes / 1024).toFixed(1)} KB` : "").padStart(10),
    );
  }
  console.log(
    "\nTargets: compliance 500 animals × 10,000 rules median ≤ 20 ms; 96 h ground trip with stops and exposures (heated van) median ≤ 5 ms; manifest 100 animals ≤ 400 ms and ≤ 250 KB; ordering a run of 40 stops and planning its rests median ≤ 50 ms; run sheet for 40 stops and 120 boxes ≤ 800 ms.",
  );
}

void main();
