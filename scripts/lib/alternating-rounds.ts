/**
 * Alternating rounds for load benchmarks: the baseline (A) and the route under test (B) are
 * measured A B A B …, and each B is compared with the A just before it. Noise that lasts longer
 * than a round (another process, a thermal throttle, a checkpoint) lands on both sides of a
 * pair, and the median over the rounds drops the pair it spoiled.
 */

/** One load run: throughput and tail latency. */
export type RunFigures = { rps: number; p99Ms: number; errors: number };

export type RoundsSummary = {
  rounds: number;
  /** Medians of the route's own runs and of the baseline's runs it was paired with. */
  rps: number;
  p99Ms: number;
  baselineRps: number;
  baselineP99Ms: number;
  /** Median over the rounds of route ÷ baseline (req/s), and its lowest and highest round. */
  ratio: number;
  ratioMin: number;
  ratioMax: number;
  /** Median over the rounds of route p99 ÷ baseline p99. */
  p99Ratio: number;
  errors: number;
};

/** The median: the middle value, or the mean of the two middle values of an even count. */
export function median(values: readonly number[]): number {
  if (values.length === 0) throw new RangeError("median of no values");
  const sorted = [...values].sort((a, b) => a - b);
  const middle = Math.floor(sorted.length / 2);
  return sorted.length % 2 === 1 ? sorted[middle]! : (sorted[middle - 1]! + sorted[middle]!) / 2;
}

/** Summarises paired rounds: `pairs[i]` is the baseline run of round i and the route's run after it. */
export function summariseRounds(pairs: readonly { baseline: RunFigures; route: RunFigures }[]): RoundsSummary {
  if (pairs.length === 0) throw new RangeError("no rounds to summarise");
  const ratios = pairs.map((p) => (p.baseline.rps > 0 ? p.route.rps / p.baseline.rps : 0));
  const p99Ratios = pairs.map((p) => (p.baseline.p99Ms > 0 ? p.route.p99Ms / p.baseline.p99Ms : Infinity));
  return {
    rounds: pairs.length,
    rps: median(pairs.map((p) => p.route.rps)),
    p99Ms: median(pairs.map((p) => p.route.p99Ms)),
    baselineRps: median(pairs.map((p) => p.baseline.rps)),
    baselineP99Ms: median(pairs.map((p) => p.baseline.p99Ms)),
    ratio: median(ratios),
    ratioMin: Math.min(...ratios),
    ratioMax: Math.max(...ratios),
    p99Ratio: median(p99Ratios),
    errors: pairs.reduce((sum, p) => sum + p.route.errors + p.baseline.errors, 0),
  };
}
