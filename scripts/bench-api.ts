/**
 * `npm run bench:api`: the real server on its own database, loaded with autocannon
 * (50 connections, 10 s per route). Prints requests/s, p99 and the ratio to the bare
 * `SELECT 1` route, which is the ceiling the API is measured against.
 */
import autocannon from "autocannon";
import { benchSignIn, startBenchServer } from "./lib/bench-server";

type Row = { route: string; rps: number; p99Ms: number; non2xx: number; target?: string };

const DURATION_S = Number(process.env.BENCH_DURATION_S ?? 10);

async function load(url: string, headers: Record<string, string> = {}): Promise<{ rps: number; p99Ms: number; non2xx: number }> {
  const result = await autocannon({ url, connections: 50, duration: DURATION_S, headers });
  return { rps: result.requests.average, p99Ms: result.latency.p99, non2xx: result.non2xx + result.errors };
}

async function main() {
  const server = await startBenchServer();
  try {
    const cookie = await benchSignIn(server.baseUrl, "sender@demo.hatchway.test");
    const rows: Row[] = [];
    // Warm-up: JIT, pool connections and the session row's cache, not measured.
    await autocannon({ url: `${server.baseUrl}/api/auth/me`, connections: 50, duration: 2, headers: { Cookie: cookie } });
    await autocannon({ url: `${server.baseUrl}/api/__bench/select1`, connections: 50, duration: 2 });
    const bare = await load(`${server.baseUrl}/api/__bench/select1`);
    rows.push({ route: "bare SELECT 1", ...bare });
    rows.push({ route: "GET /api/health", ...(await load(`${server.baseUrl}/api/health`)) });
    rows.push({ route: "GET /api/auth/me (signed in)", ...(await load(`${server.baseUrl}/api/auth/me`, { Cookie: cookie })), target: "≥ 50 % of bare" });

    console.log(`\nautocannon, 50 connections, ${DURATION_S} s per route, server and load generator on this machine\n`);
    console.log("route".padEnd(34) + "req/s".padStart(9) + "p99 ms".padStart(9) + "ratio".padStart(8) + "errors".padStart(8) + "  target");
    for (const r of rows) {
      const ratio = r.rps / bare.rps;
      console.log(r.route.padEnd(34) + r.rps.toFixed(0).padStart(9) + r.p99Ms.toFixed(0).padStart(9) + `${(ratio * 100).toFixed(0)}%`.padStart(8) + String(r.non2xx).padStart(8) + "  " + (r.target ?? ""));
    }
    const me = rows[2]!;
    console.log(`\n/api/auth/me at ${((me.rps / bare.rps) * 100).toFixed(0)} % of the bare route: ${me.rps / bare.rps >= 0.5 ? "meets" : "MISSES"} the 50 % target`);
  } finally {
    await server.stop();
  }
}

void main();
