/** Starts the real server on the test cluster's bench database for load tests. */
import { spawn, type ChildProcess } from "node:child_process";
import { dropDatabase, ensureDatabase, PROJECT_ROOT, startCluster, stopCluster, type Cluster } from "./postgres";
import { prepareDatabase } from "./prepare-db";

export type BenchServer = { baseUrl: string; databaseUrl: string; cluster: Cluster; stop(): Promise<void> };

/** The server connects as the app role (D18); the data is loaded as the owner, like the migrations. */

export async function startBenchServer(
  options: {
    port?: number;
    beforeStart?: (ownerUrl: string, baseUrl: string) => Promise<void>;
    /** More environment for the server, e.g. CLIENT_DIST for a built client. */
    env?: Record<string, string>;
  } = {},
): Promise<BenchServer> {
  const cluster = await startCluster("test", Number(process.env.HATCHWAY_TEST_PG_PORT ?? 54329));
  const db = "hatchway_bench";
  await dropDatabase(cluster, db);
  await ensureDatabase(cluster, db);
  const ownerUrl = cluster.url(db, "owner");
  const databaseUrl = cluster.url(db, "app");
  const port = options.port ?? Number(process.env.PORT ?? 3901);
  const baseUrl = `http://127.0.0.1:${port}`;
  await prepareDatabase(ownerUrl, { seed: true, publicUrl: baseUrl });
  await options.beforeStart?.(ownerUrl, baseUrl);

  // BENCH_CPU_PROF=<folder> writes a V8 CPU profile of the server when it stops (for chrome://inspect or speedscope).
  const profiling = process.env.BENCH_CPU_PROF ? ["--cpu-prof", "--cpu-prof-dir", process.env.BENCH_CPU_PROF] : [];
  const server: ChildProcess = spawn(process.execPath, [...profiling, "--import", "tsx", "server/index.ts"], {
    cwd: PROJECT_ROOT,
    env: {
      ...process.env,
      NODE_ENV: "production",
      // Plain HTTP on loopback: the one production run without Secure cookies, said out loud.
      SECURE_COOKIES: "false",
      PORT: String(port),
      PUBLIC_URL: baseUrl,
      DATABASE_URL: databaseUrl,
      SESSION_SECRET: "bench-secret-bench-secret-bench-secret-0123",
      SMTP_URL: "smtp://127.0.0.1:9",
      S3_ENDPOINT: "http://127.0.0.1:9",
      S3_BUCKET: "bench",
      S3_ACCESS_KEY_ID: "x",
      S3_SECRET_ACCESS_KEY: "x",
      WEATHER_URL: "http://127.0.0.1:9",
      WORKERS: "false",
      BENCH_ROUTES: "true",
      ...options.env,
    },
    stdio: ["ignore", "inherit", "inherit"],
  });
  for (let i = 0; i < 150; i++) {
    try {
      if ((await fetch(`${baseUrl}/api/health`)).ok) break;
    } catch {
      // starting
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  return {
    baseUrl,
    databaseUrl,
    cluster,
    async stop() {
      server.kill("SIGTERM");
      await new Promise((r) => (server.exitCode !== null ? r(null) : server.once("exit", r)));
      if (cluster.startedByUs) stopCluster(cluster);
    },
  };
}

/** Signs in over HTTP like a browser and returns the cookie header. */
export async function benchSignIn(baseUrl: string, email: string, password = "hatchway-demo"): Promise<string> {
  const csrfRes = await fetch(`${baseUrl}/api/auth/csrf`);
  const cookie = (csrfRes.headers.get("set-cookie") ?? "").split(";")[0]!;
  const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
  const login = await fetch(`${baseUrl}/api/auth/login`, {
    method: "POST",
    headers: { "Content-Type": "application/json", "X-CSRF-Token": csrfToken, Cookie: cookie },
    body: JSON.stringify({ email, password }),
  });
  if (!login.ok) throw new Error(`bench sign-in failed: ${login.status}`);
  return (login.headers.get("set-cookie") ?? "").split(";")[0]!;
}
