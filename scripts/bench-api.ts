/**
 * `npm run bench:api`: the real server process on its own database, loaded with autocannon
 * (50 connections). Each route is measured in alternating rounds with the bare `SELECT 1` route
 * (A B A B …, 5 rounds of 3 s each by default) and the median of the per-round ratios is printed
 * with the median requests/s and p99 of both, and SQL statements per request. Pairing each run
 * with a bare run made just before it keeps the machine's slow moments off the ratio.
 */
import autocannon from "autocannon";
import { benchSignIn, startBenchServer } from "./lib/bench-server";
import { BENCH_REPORT_PERIOD, seedBenchData } from "./lib/bench-data";
import { announceRuntime } from "./lib/runtime";
import { median, summariseRounds, type RoundsSummary, type RunFigures } from "./lib/alternating-rounds";

/** Rounds per route (each a bare run then a route run) and seconds per run. */
const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 5);
const ROUND_S = Number(process.env.BENCH_ROUND_S ?? 3);
const CONNECTIONS = 50;

type Route = { name: string; path: string; cookie?: boolean; target?: (r: RoundsSummary) => string };

/** SQL statements per request, as the server counts them (the most seen in a few quiet requests). */
async function queriesPerRequest(url: string, cookie: string | undefined): Promise<string> {
  let most = 0;
  for (let i = 0; i < 5; i++) {
    const res = await fetch(url, { headers: { "X-Count-Queries": "1", ...(cookie ? { Cookie: cookie } : {}) } });
    await res.arrayBuffer();
    if (!res.ok) throw new Error(`${url} answered ${res.status}`);
    most = Math.max(most, Number(res.headers.get("x-query-count") ?? 0));
  }
  return String(most);
}

async function run(url: string, cookie: string | undefined, durationS: number): Promise<RunFigures> {
  const result = await autocannon({
    url,
    connections: CONNECTIONS,
    duration: durationS,
    headers: cookie ? { Cookie: cookie } : {},
  });
  return { rps: result.requests.average, p99Ms: result.latency.p99, errors: result.non2xx + result.errors };
}

/** A B A B …: a bare run, then the route, ROUNDS times; each route run is compared with the bare run before it. */
async function alternate(bareUrl: string, url: string, cookie: string | undefined): Promise<RoundsSummary> {
  const pairs: { baseline: RunFigures; route: RunFigures }[] = [];
  for (let round = 0; round < ROUNDS; round++) {
    const baseline = await run(bareUrl, undefined, ROUND_S);
    const route = await run(url, cookie, ROUND_S);
    pairs.push({ baseline, route });
  }
  return summariseRounds(pairs);
}

/** Taxa search answer time: one request at a time (no queueing), typed names, misspellings and synonyms. */
async function taxaSearchTimes(
  baseUrl: string,
  cookie: string,
): Promise<{ medianMs: number; p95Ms: number; n: number }> {
  const queries = [
    "corn snake",
    "Pantherofis gutatus",
    "axolotel",
    "Geochelone pardalis",
    "ball python",
    "box turtle",
    "tiger salamander",
    "leopard gecko",
    "Crotalus",
    "dart frog",
  ];
  const times: number[] = [];
  for (let round = 0; round < 30; round++) {
    for (const q of queries) {
      const started = performance.now();
      const res = await fetch(`${baseUrl}/api/taxa?q=${encodeURIComponent(q)}`, { headers: { Cookie: cookie } });
      await res.arrayBuffer();
      if (!res.ok) throw new Error(`taxa search for ${q} answered ${res.status}`);
      if (round > 0) times.push(performance.now() - started); // round 0 warms up
    }
  }
  times.sort((a, b) => a - b);
  const at = (q: number) => times[Math.min(times.length - 1, Math.floor(q * times.length))]!;
  return { medianMs: at(0.5), p95Ms: at(0.95), n: times.length };
}

/** Answer times one request at a time (no queueing), after one warm-up request. */
async function sequentialTimes(
  url: string,
  cookie: string,
  n: number,
): Promise<{ medianMs: number; p95Ms: number; n: number }> {
  const times: number[] = [];
  for (let i = 0; i <= n; i++) {
    const started = performance.now();
    const res = await fetch(url, { headers: { Cookie: cookie } });
    await res.arrayBuffer();
    if (!res.ok) throw new Error(`${url} answered ${res.status}`);
    if (i > 0) times.push(performance.now() - started);
  }
  times.sort((a, b) => a - b);
  const at = (q: number) => times[Math.min(times.length - 1, Math.floor(q * times.length))]!;
  return { medianMs: at(0.5), p95Ms: at(0.95), n: times.length };
}

async function main() {
  announceRuntime("bench");
  let detailId = "";
  let reportPermitId = "";
  const server = await startBenchServer({
    beforeStart: async (ownerUrl, baseUrl) => {
      process.stdout.write(
        "[bench] seeding a 50-animal transfer, 100,000 list rows, 100,000 register entries and a permit's 20,000 events…\n",
      );
      ({ detailId, reportPermitId } = await seedBenchData(ownerUrl, baseUrl));
    },
  });
  try {
    const cookie = await benchSignIn(server.baseUrl, "sender@demo.hatchway.test");
    const pct = (ratio: number) => `${(ratio * 100).toFixed(0)} %`;
    const bare: Route = { name: "bare SELECT 1", path: "/api/__bench/select1" };
    const routes: Route[] = [
      { name: "GET /api/health", path: "/api/health" },
      {
        name: "GET /api/auth/me (signed in)",
        path: "/api/auth/me",
        cookie: true,
        target: (r) => `≥ 50 % of bare: ${r.ratio >= 0.5 ? "met" : "MISSED"} (${pct(r.ratio)})`,
      },
      {
        name: "GET /api/transfers/:id (50 animals, 11 custody)",
        path: `/api/transfers/${detailId}`,
        cookie: true,
        target: (r) => `≥ 25 % of bare: ${r.ratio >= 0.25 ? "met" : "MISSED"} (${pct(r.ratio)})`,
      },
      {
        name: "GET /api/transfers (page 1 of 100,001)",
        path: "/api/transfers?limit=50",
        cookie: true,
        target: (r) => `p99 ≤ 4 × bare p99: ${r.p99Ratio <= 4 ? "met" : "MISSED"} (${r.p99Ratio.toFixed(1)} ×)`,
      },
      {
        name: "GET /api/register (page 1 of 100,500)",
        path: "/api/register?limit=50",
        cookie: true,
        target: (r) => `p99 ≤ 4 × bare p99: ${r.p99Ratio <= 4 ? "met" : "MISSED"} (${r.p99Ratio.toFixed(1)} ×)`,
      },
    ];
    // Warm-up: JIT, pool connections, PostgreSQL caches.
    for (const r of [bare, ...routes]) await run(server.baseUrl + r.path, r.cookie ? cookie : undefined, 2);
    // Counted on a quiet server: under load, pooled connections pass between requests.
    const queries = new Map<Route, string>();
    for (const r of [bare, ...routes])
      queries.set(r, await queriesPerRequest(server.baseUrl + r.path, r.cookie ? cookie : undefined));

    const bareUrl = server.baseUrl + bare.path;
    const results = new Map<Route, RoundsSummary>();
    for (const r of routes) {
      process.stdout.write(`[bench] ${r.name}: ${ROUNDS} rounds of bare ${ROUND_S} s, route ${ROUND_S} s …\n`);
      results.set(r, await alternate(bareUrl, server.baseUrl + r.path, r.cookie ? cookie : undefined));
    }

    console.log(
      `\nautocannon, ${CONNECTIONS} connections; each route in ${ROUNDS} alternating rounds with the bare route ` +
        `(A B A B …, ${ROUND_S} s per run); medians over the rounds; server, PostgreSQL and load generator share this machine\n`,
    );
    console.log(
      "route".padEnd(50) +
        "req/s".padStart(8) +
        "p99 ms".padStart(8) +
        "bare/s".padStart(8) +
        "bare p99".padStart(9) +
        "ratio".padStart(7) +
        "  (min–max)".padEnd(14) +
        "p99 ×".padStart(7) +
        "SQL/req".padStart(9) +
        "errors".padStart(8) +
        "  target",
    );
    const allBare = [...results.values()];
    console.log(
      bare.name.padEnd(50) +
        Math.round(median(allBare.map((x) => x.baselineRps)))
          .toString()
          .padStart(8) +
        median(allBare.map((x) => x.baselineP99Ms))
          .toFixed(0)
          .padStart(8) +
        "".padStart(8 + 9) +
        "100 %".padStart(7) +
        "".padEnd(14) +
        "1.0".padStart(7) +
        queries.get(bare)!.padStart(9),
    );
    for (const r of routes) {
      const x = results.get(r)!;
      console.log(
        r.name.padEnd(50) +
          x.rps.toFixed(0).padStart(8) +
          x.p99Ms.toFixed(0).padStart(8) +
          x.baselineRps.toFixed(0).padStart(8) +
          x.baselineP99Ms.toFixed(0).padStart(9) +
          pct(x.ratio).padStart(7) +
          `  (${(x.ratioMin * 100).toFixed(0)}–${(x.ratioMax * 100).toFixed(0)} %)`.padEnd(14) +
          x.p99Ratio.toFixed(1).padStart(7) +
          queries.get(r)!.padStart(9) +
          String(x.errors).padStart(8) +
          "  " +
          (r.target?.(x) ?? ""),
      );
    }
    const taxa = await taxaSearchTimes(server.baseUrl, cookie);
    console.log(
      `\nGET /api/taxa?q=… (${taxa.n} sequential searches, typos and synonyms included): median ${taxa.medianMs.toFixed(1)} ms, p95 ${taxa.p95Ms.toFixed(1)} ms` +
        `  target median < 20 ms: ${taxa.medianMs < 20 ? "met" : "MISSED"} (time through HTTP, session and JSON included)`,
    );
    const reportPath = `/api/register/report?permitId=${reportPermitId}&from=${BENCH_REPORT_PERIOD.from}&to=${BENCH_REPORT_PERIOD.to}`;
    const report = await sequentialTimes(server.baseUrl + reportPath, cookie, 40);
    console.log(
      `GET /api/register/report (one permit, 500 animals, 20,000 events; ${report.n} sequential requests): median ${report.medianMs.toFixed(1)} ms, p95 ${report.p95Ms.toFixed(1)} ms` +
        `  target median ≤ 150 ms: ${report.medianMs <= 150 ? "met" : "MISSED"} (SQL/req ${await queriesPerRequest(server.baseUrl + reportPath, cookie)})`,
    );
  } finally {
    await server.stop();
  }
}

void main();
