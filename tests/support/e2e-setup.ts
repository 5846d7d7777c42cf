/**
 * Browser tests: a migrated and seeded database, the built client, the local fakes, and
 * the real server as its own process on a free port — the same pieces `npm start` runs.
 */
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { mkdirSync } from "node:fs";
import path from "node:path";
import type { TestProject } from "vitest/node";
import { dropDatabase, ensureDatabase, PROJECT_ROOT, startCluster, stopCluster } from "../../scripts/lib/postgres";
import { prepareDatabase } from "../../scripts/lib/prepare-db";
import { startAllFakes } from "../../fakes/index";
import { TEST_PG_PORT, OUTPUT_DIR } from "./constants";

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
    e2eDatabaseUrl: string;
    mailInboxUrl: string;
  }
}

async function freePort(): Promise<number> {
  const net = await import("node:net");
  return new Promise((resolve) => {
    const srv = net.createServer();
    srv.listen(0, "127.0.0.1", () => {
      const port = (srv.address() as { port: number }).port;
      srv.close(() => resolve(port));
    });
  });
}

export default async function setup(project: TestProject) {
  const cluster = await startCluster("test", TEST_PG_PORT);
  const db = "hatchway_e2e";
  await dropDatabase(cluster, db);
  await ensureDatabase(cluster, db);
  const databaseUrl = cluster.url(db, "app");
  const port = await freePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  await prepareDatabase(cluster.url(db, "owner"), { seed: true, publicUrl: baseUrl });

  const dist = path.join(OUTPUT_DIR, "dist-e2e");
  const build = spawnSync(
    path.join(PROJECT_ROOT, "node_modules/.bin/vite"),
    ["build", "--logLevel", "error", "--outDir", dist, "--emptyOutDir"],
    // The build users get: vitest sets NODE_ENV=test, which would give React's development build.
    { cwd: PROJECT_ROOT, stdio: "inherit", env: { ...process.env, NODE_ENV: "production" } },
  );
  if (build.status !== 0) throw new Error("the client build for the browser tests failed");

  mkdirSync(path.join(OUTPUT_DIR, "e2e-data"), { recursive: true });
  const fakes = await startAllFakes({ dataDir: path.join(OUTPUT_DIR, "e2e-data") });
  const server: ChildProcess = spawn(process.execPath, ["--import", "tsx", "server/index.ts"], {
    cwd: PROJECT_ROOT,
    env: {
      ...process.env,
      ...fakes.env,
      NODE_ENV: "test",
      PORT: String(port),
      HOST: "127.0.0.1",
      PUBLIC_URL: baseUrl,
      DATABASE_URL: databaseUrl,
      SESSION_SECRET: "e2e-secret-e2e-secret-e2e-secret-0123456789",
      CLIENT_DIST: dist,
      WORKERS: "true",
    },
    stdio: ["ignore", "inherit", "inherit"],
  });

  const deadline = Date.now() + 30_000;
  for (;;) {
    try {
      const res = await fetch(`${baseUrl}/api/health`);
      if (res.ok) break;
    } catch {
      // not up yet
    }
    if (server.exitCode !== null) throw new Error(`the server exited with ${server.exitCode} before it was ready`);
    if (Date.now() > deadline) throw new Error("the server did not become ready within 30 s");
    await new Promise((r) => setTimeout(r, 200));
  }

  project.provide("baseUrl", baseUrl);
  project.provide("e2eDatabaseUrl", databaseUrl);
  project.provide("mailInboxUrl", fakes.smtp.inboxUrl);

  return async () => {
    server.kill("SIGTERM");
    await new Promise((r) => (server.exitCode !== null ? r(null) : server.once("exit", r)));
    await fakes.close();
    if (cluster.startedByUs) stopCluster(cluster);
  };
}
