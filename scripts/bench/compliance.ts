/**
 * Benchmark of the compliance evaluation: a 500-animal transfer against 10,000 SYNTHETIC rules
 * (generated here from a fixed seed; none is a real or demo rule), and against the seed rules.
 * Run standalone: node --import tsx scripts/bench/compliance.ts
 */
import { pathToFileURL } from "node:url";
import { ANIMAL_ORIGINS, DOCUMENT_KINDS, PURPOSES, SEXES, US_STATES } from "@shared/constants";
import { DEMO_TAXA } from "@shared/compliance/demo-taxa";
import { evaluateCompliance, type EvaluationDocument, type EvaluationInput } from "@shared/compliance/evaluate";
import { buildAnimal, buildCvi, buildFacts, buildInput } from "@shared/compliance/evaluate-fixtures";
import { FEDERAL, JURISDICTIONS } from "@shared/compliance/jurisdiction";
import { DEMO_RULE_NOTICE, GOVERNS, type Rule, type RuleConditions, type RuleEffect } from "@shared/compliance/rule";

const RULE_COUNT = 10_000;
const ANIMAL_COUNT = 500;
const WARMUP_RUNS = 10;
const TIMED_RUNS = 60;

export interface BenchResult {
  name: string;
  medianMs: number;
  p95Ms: number;
}

/** mulberry32: a small seeded generator, so every run measures the same rules. */
function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
}

const TAXA = Object.values(DEMO_TAXA);
/** Names real animals go by (any rank), so that a share of the synthetic rules hit. */
const REAL_NAMES = [...new Set(TAXA.flatMap((t) => [...t.lineage.map((e) => e.scientificName), ...t.synonyms]))];

function syntheticRules(count: number, random: () => number): Rule[] {
  const pick = <T>(items: readonly T[]): T => items[Math.floor(random() * items.length)] as T;
  const effects: RuleEffect[] = [
    { kind: "prohibited" },
    {
      kind: "permit_required",
      permit: { documentKinds: ["state_import_permit"], holder: "receiver", namesSpecies: true },
    },
    {
      kind: "certificate_required",
      withinDays: 30,
      statements: ["examined and found free of ticks"],
      accreditedVeterinarian: true,
      namesSpecies: true,
    },
    { kind: "packing" },
    { kind: "advisory" },
  ];
  return Array.from({ length: count }, (_, i) => {
    const jurisdiction = random() < 0.05 ? FEDERAL : pick(JURISDICTIONS.slice(1));
    const conditions: RuleConditions = {};
    if (random() < 0.3) conditions.lengthBelowMm = 50 + Math.floor(random() * 500);
    if (random() < 0.2) conditions.origins = [pick(ANIMAL_ORIGINS)];
    if (random() < 0.2) conditions.sale = random() < 0.5;
    if (random() < 0.1) conditions.countAbove = Math.floor(random() * 20);
    const taxa = random() < 0.6 ? [pick(REAL_NAMES)] : [`Synthgenus${i % 997} synthspecies${i}`];
    return {
      id: `synthetic-${String(i).padStart(5, "0")}`,
      version: 1 + (i % 3),
      jurisdiction,
      governs: jurisdiction === FEDERAL ? pick(["interstate", "movement"] as const) : pick(GOVERNS),
      selector: { taxa },
      conditions,
      effect: pick(effects),
      summary: `Synthetic benchmark rule ${i}.`,
      citation: { text: `Synthetic benchmark rule: ${DEMO_RULE_NOTICE}.`, url: null },
      effectiveFrom: random() < 0.1 ? "2027-01-01" : null,
      effectiveTo: null,
      reviewedOn: "2026-12-01",
      reviewedBy: "benchmark",
      demo: true,
    };
  });
}

function syntheticTransfer(rules: readonly Rule[], random: () => number): EvaluationInput {
  const pick = <T>(items: readonly T[]): T => items[Math.floor(random() * items.length)] as T;
  const animals = Array.from({ length: ANIMAL_COUNT }, () =>
    // A fresh copy per line, as the server resolves each line's name on its own.
    buildAnimal(structuredClone(pick(TAXA)), {
      count: 1 + Math.floor(random() * 5),
      lengthMm: random() < 0.2 ? null : 40 + Math.floor(random() * 2000),
      origin: pick(ANIMAL_ORIGINS),
      sex: pick(SEXES),
    }),
  );
  const documents: EvaluationDocument[] = Array.from({ length: 20 }, (_, i) => ({
    ...buildCvi({ number: `BENCH-${i}`, speciesCovered: [pick(REAL_NAMES)] }),
    kind: pick(DOCUMENT_KINDS),
    jurisdiction: pick(US_STATES),
    validFrom: "2026-01-01",
    validTo: "2026-12-31",
  }));
  return buildInput({
    facts: buildFacts({
      originState: "TX",
      destinationState: "OH",
      transitStates: ["AR", "MO", "IL", "IN"],
      purpose: pick(PURPOSES),
      sale: true,
    }),
    animals,
    documents,
    rules,
  });
}

function measure(name: string, input: EvaluationInput): BenchResult {
  for (let i = 0; i < WARMUP_RUNS; i++) evaluateCompliance(input);
  const timesMs = Array.from({ length: TIMED_RUNS }, () => {
    const start = performance.now();
    evaluateCompliance(input);
    return performance.now() - start;
  }).sort((a, b) => a - b);
  const at = (q: number) => timesMs[Math.min(timesMs.length - 1, Math.ceil(q * timesMs.length) - 1)] as number;
  return { name, medianMs: round(at(0.5)), p95Ms: round(at(0.95)) };
}

const round = (ms: number) => Math.round(ms * 100) / 100;

/** Median and p95 wall time of one evaluation, for the synthetic and the seed rule sets. */
export async function benchCompliance(): Promise<BenchResult[]> {
  const random = seededRandom(20_261_201);
  const synthetic = syntheticTransfer(syntheticRules(RULE_COUNT, random), random);
  return [
    measure(`compliance: ${ANIMAL_COUNT} animals x ${RULE_COUNT} synthetic rules`, synthetic),
    measure(`compliance: ${ANIMAL_COUNT} animals x seed rules`, { ...synthetic, rules: buildInput().rules }),
  ];
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  for (const { name, medianMs, p95Ms } of await benchCompliance()) {
    process.stdout.write(`${name}: median ${medianMs} ms, p95 ${p95Ms} ms\n`);
  }
}
