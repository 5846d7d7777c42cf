/**
 * `npm start`: a private PostgreSQL on loopback, migrations, the demo data when the
 * database is empty, the client build, the local fakes, and one Express process serving
 * app and API on http://127.0.0.1:3000. Ctrl-C stops everything this started.
 */
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import path from "node:path";
import { ensureDatabase, PROJECT_ROOT, startCluster, stopCluster, type Cluster } from "./lib/postgres";
import { prepareDatabase } from "./lib/prepare-db";
import { localSecret } from "./lib/secrets";
import { startAllFakes, type Fakes } from "../fakes/index";
import { announceRuntime } from "./lib/runtime";

const PORT = Number(process.env.PORT ?? 3000);
/** Where the app is reached, and so where the demo's e-mails link to. */
const PUBLIC_URL = `http://127.0.0.1:${PORT}`;
const PG_PORT = Number(process.env.HATCHWAY_PG_PORT ?? 54328);
/** The fakes listen on four ports from here (SMTP, its inbox, weather, S3). */
const FAKES_PORT = Number(process.env.HATCHWAY_FAKES_PORT ?? 4100);

function step(message: string) {
  process.stdout.write(`[start] ${message}\n`);
}

async function main() {
  announceRuntime("start");
  let cluster: Cluster | null = null;
  let fakes: Fakes | null = null;
  let server: ChildProcess | null = null;
  let stopping = false;

  const stop = async (code = 0) => {
    if (stopping) return;
    stopping = true;
    step("stopping…");
    if (server && server.exitCode === null) {
      server.kill("SIGTERM");
      await new Promise((r) => server!.once("exit", r));
    }
    await fakes?.close();
    if (cluster?.startedByUs) stopCluster(cluster);
    process.exit(code);
  };
  process.on("SIGINT", () => void stop(0));
  process.on("SIGTERM", () => void stop(0));

  try {
    cluster = await startCluster("dev", PG_PORT);
    await ensureDatabase(cluster, "hatchway");
    // Migrations and demo data as the owner role; the server as the app role, which owns nothing (D18).
    const { seeded } = await prepareDatabase(cluster.url("hatchway", "owner"), { seed: true, publicUrl: PUBLIC_URL });
    step(seeded ? "database migrated and demo scenario seeded" : "database migrated (existing data kept)");

    step("building the client…");
    const build = spawnSync(path.join(PROJECT_ROOT, "node_modules/.bin/vite"), ["build", "--logLevel", "warn"], {
      cwd: PROJECT_ROOT,
      stdio: "inherit",
    });
    if (build.status !== 0) throw new Error("The client build failed; see the output above.");

    fakes = await startAllFakes({
      dataDir: path.join(PROJECT_ROOT, ".data"),
      ports: { smtp: FAKES_PORT, smtpHttp: FAKES_PORT + 1, weather: FAKES_PORT + 2, s3: FAKES_PORT + 3 },
    });
    step(
      `local fakes up: SMTP ${fakes.smtp.smtpUrl}, caught mail ${fakes.smtp.inboxUrl}, S3 ${fakes.s3.endpoint}, weather ${fakes.weather.url}`,
    );

    const env = {
      ...process.env,
      ...fakes.env,
      NODE_ENV: "development",
      HOST: "127.0.0.1",
      PORT: String(PORT),
      PUBLIC_URL,
      DATABASE_URL: cluster.url("hatchway", "app"),
      SESSION_SECRET: localSecret("session"),
      CLIENT_DIST: path.join(PROJECT_ROOT, "dist"),
    };
    server = spawn(process.execPath, ["--import", "tsx", "server/index.ts"], {
      cwd: PROJECT_ROOT,
      env,
      stdio: "inherit",
    });
    server.on("exit", (code) => {
      if (!stopping) {
        step(`the server stopped (exit ${code})`);
        void stop(code ?? 1);
      }
    });
    step(
      `open http://127.0.0.1:${PORT} — demo accounts are listed in README.md (password hatchway-demo). Ctrl-C stops everything.`,
    );
  } catch (err) {
    console.error(`[start] ${(err as Error).message}`);
    await stop(1);
  }
}

void main();
