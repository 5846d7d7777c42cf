/**
 * `npm run bench:api`: the real server process on its own database, loaded with autocannon
 * (50 connections, 10 s per route). Prints requests/s, p99, the ratio to the bare
 * `SELECT 1` route (the ceiling the API is measured against) and SQL statements per request.
 */
import autocannon from "autocannon";
import { benchSignIn, startBenchServer } from "./lib/bench-server";
import { seedBenchData } from "./lib/bench-data";
import { announceRuntime } from "./lib/runtime";

const DURATION_S = Number(process.env.BENCH_DURATION_S ?? 10);

type Route = { name: string; path: string; cookie?: boolean; target?: (r: Result, bare: Result) => string };
type Result = { rps: number; p99Ms: number; errors: number; queries: string };

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

async function load(url: string, cookie?: string): Promise<Result> {
  // Counted on a quiet server: under load, pooled connections pass between requests.
  const queries = await queriesPerRequest(url, cookie);
  const result = await autocannon({
    url,
    connections: 50,
    duration: DURATION_S,
    headers: cookie ? { Cookie: cookie } : {},
  });
  return { rps: result.requests.average, p99Ms: result.latency.p99, errors: result.non2xx + result.errors, queries };
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

async function main() {
  announceRuntime("bench");
  let detailId = "";
  const server = await startBenchServer({
    beforeStart: async (databaseUrl, baseUrl) => {
      process.stdout.write("[bench] seeding a 50-animal transfer and 100,000 list rows…\n");
      ({ detailId } = await seedBenchData(databaseUrl, baseUrl));
    },
  });
  try {
    const cookie = await benchSignIn(server.baseUrl, "sender@demo.hatchway.test");
    const pct = (a: number, b: number) => `${((a / b) * 100).toFixed(0)} %`;
    const routes: Route[] = [
      { name: "bare SELECT 1", path: "/api/__bench/select1" },
      { name: "GET /api/health", path: "/api/health" },
      {
        name: "GET /api/auth/me (signed in)",
        path: "/api/auth/me",
        cookie: true,
        target: (r, b) => `≥ 50 % of bare: ${r.rps / b.rps >= 0.5 ? "met" : "MISSED"} (${pct(r.rps, b.rps)})`,
      },
      {
        name: "GET /api/transfers/:id (50 animals, 10 custody)",
        path: `/api/transfers/${detailId}`,
        cookie: true,
        target: (r, b) => `≥ 25 % of bare: ${r.rps / b.rps >= 0.25 ? "met" : "MISSED"} (${pct(r.rps, b.rps)})`,
      },
      {
        name: "GET /api/transfers (page 1 of 100,001)",
        path: "/api/transfers?limit=50",
        cookie: true,
        target: (r, b) =>
          `p99 ≤ 4 × bare p99: ${r.p99Ms <= 4 * b.p99Ms ? "met" : "MISSED"} (${(r.p99Ms / b.p99Ms).toFixed(1)} ×)`,
      },
    ];
    // Warm-up: JIT, pool connections, PostgreSQL caches.
    for (const r of routes)
      await autocannon({
        url: server.baseUrl + r.path,
        connections: 20,
        duration: 2,
        headers: r.cookie ? { Cookie: cookie } : {},
      });
    const results: Result[] = [];
    for (const r of routes) results.push(await load(server.baseUrl + r.path, r.cookie ? cookie : undefined));
    const bare = results[0]!;
    console.log(
      `\nautocannon, 50 connections, ${DURATION_S} s per route; server, PostgreSQL and load generator share this machine\n`,
    );
    console.log(
      "route".padEnd(50) +
        "req/s".padStart(8) +
        "p99 ms".padStart(8) +
        "ratio".padStart(7) +
        "SQL/req".padStart(9) +
        "errors".padStart(8) +
        "  target",
    );
    routes.forEach((r, i) => {
      const x = results[i]!;
      console.log(
        r.name.padEnd(50) +
          x.rps.toFixed(0).padStart(8) +
          x.p99Ms.toFixed(0).padStart(8) +
          pct(x.rps, bare.rps).padStart(7) +
          x.queries.padStart(9) +
          String(x.errors).padStart(8) +
          "  " +
          (r.target?.(x, bare) ?? ""),
      );
    });
    const taxa = await taxaSearchTimes(server.baseUrl, cookie);
    console.log(
      `\nGET /api/taxa?q=… (${taxa.n} sequential searches, typos and synonyms included): median ${taxa.medianMs.toFixed(1)} ms, p95 ${taxa.p95Ms.toFixed(1)} ms` +
        `  target median < 20 ms: ${taxa.medianMs < 20 ? "met" : "MISSED"} (time through HTTP, session and JSON included)`,
    );
  } finally {
    await server.stop();
  }
}

void main();
