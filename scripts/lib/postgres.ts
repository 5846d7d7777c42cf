/**
 * A private PostgreSQL cluster for development and tests, on 127.0.0.1 and a non-default
 * port, with no Unix socket (socket paths are limited to ~107 bytes). Uses Debian's server
 * binaries and installs them when they are missing and we are root.
 */
import { execFileSync, spawnSync } from "node:child_process";
import { createHash } from "node:crypto";
import { accessSync, constants, existsSync, mkdirSync, readdirSync, chownSync, writeFileSync } from "node:fs";
import path from "node:path";
import pg from "pg";
import { APP_ROLE, OWNER_ROLE, ROLE_ATTRIBUTES } from "../../server/db/roles";

export const PROJECT_ROOT = path.resolve(import.meta.dirname, "../..");
const isRoot = process.getuid?.() === 0;
/** The cluster's superuser (created by initdb): sets up roles and databases, nothing else. */
const DB_USER = "hatchway";

/**
 * Who connects (D18): `admin` the cluster's superuser (roles, databases, tests that tamper on
 * purpose), `owner` the role that owns the schema and runs the migrations and seeders, `app`
 * the server's login, which owns nothing.
 */
export type DatabaseRole = "admin" | "owner" | "app";
const ROLE_NAMES: Record<DatabaseRole, string> = { admin: DB_USER, owner: OWNER_ROLE, app: APP_ROLE };

export type Cluster = {
  name: string;
  port: number;
  dataDir: string;
  url: (db: string, role: DatabaseRole) => string;
  startedByUs: boolean;
};

const urlFor = (port: number) => (db: string, role: DatabaseRole) =>
  `postgres://${ROLE_NAMES[role]}@127.0.0.1:${port}/${db}`;

function log(message: string) {
  process.stdout.write(`[postgres] ${message}\n`);
}

function findBinDir(): string | null {
  const base = "/usr/lib/postgresql";
  if (!existsSync(base)) return null;
  const versions = readdirSync(base)
    .filter((v) => existsSync(path.join(base, v, "bin", "initdb")))
    .sort((a, b) => Number(b) - Number(a));
  return versions[0] ? path.join(base, versions[0], "bin") : null;
}

/** Returns the server's bin folder, installing Debian's `postgresql` package when allowed. */
export function ensurePostgresInstalled(): string {
  const found = findBinDir();
  if (found) return found;
  if (!isRoot) {
    throw new Error(
      "PostgreSQL server binaries were not found in /usr/lib/postgresql/*/bin.\n" +
        "Install them with: sudo apt-get install -y postgresql  (then run this command again).",
    );
  }
  log("installing Debian's postgresql package (first run only)…");
  const env = { ...process.env, DEBIAN_FRONTEND: "noninteractive" };
  const update = spawnSync("apt-get", ["update"], { stdio: "inherit", env });
  if (update.status !== 0) log("apt-get update failed; trying the install with the cached package lists");
  const install = spawnSync("apt-get", ["install", "-y", "--no-install-recommends", "postgresql"], {
    stdio: "inherit",
    env,
  });
  const bin = findBinDir();
  if (install.status !== 0 || !bin) throw new Error("Installing PostgreSQL with apt-get failed; see the output above.");
  return bin;
}

function ensureOsUser(): void {
  if (!isRoot) return;
  const probe = spawnSync("id", ["-u", "postgres"]);
  if (probe.status === 0) return;
  execFileSync("useradd", ["--system", "--home-dir", "/var/lib/postgresql", "--shell", "/bin/bash", "postgres"]);
}

function canPostgresReach(dir: string): boolean {
  if (!isRoot) {
    try {
      accessSync(dir, constants.W_OK);
      return true;
    } catch {
      return false;
    }
  }
  return spawnSync("runuser", ["-u", "postgres", "--", "test", "-x", dir]).status === 0;
}

function dataDirFor(name: string): string {
  const inProject = path.join(PROJECT_ROOT, ".data");
  mkdirSync(inProject, { recursive: true });
  if (canPostgresReach(inProject)) return path.join(inProject, `pg-${name}`);
  const hash = createHash("sha256").update(PROJECT_ROOT).digest("hex").slice(0, 12);
  return path.join("/tmp", `hatchway-${hash}`, `pg-${name}`);
}

function run(bin: string, tool: string, args: string[], opts: { allowFail?: boolean } = {}) {
  const cmd = path.join(bin, tool);
  const [file, argv] = isRoot ? ["runuser", ["-u", "postgres", "--", cmd, ...args]] : [cmd, args];
  const result = spawnSync(file, argv, { encoding: "utf8" });
  if (result.status !== 0 && !opts.allowFail) {
    throw new Error(`${tool} failed (exit ${result.status}):\n${result.stdout}\n${result.stderr}`);
  }
  return result;
}

function isReady(bin: string, port: number): boolean {
  return spawnSync(path.join(bin, "pg_isready"), ["-h", "127.0.0.1", "-p", String(port), "-q"]).status === 0;
}

/** Initialises (first time) and starts the named cluster; safe to call when it already runs. */
export async function startCluster(name: string, port: number): Promise<Cluster> {
  const bin = ensurePostgresInstalled();
  ensureOsUser();
  const dataDir = dataDirFor(name);
  const cluster: Cluster = {
    name,
    port,
    dataDir,
    url: urlFor(port),
    startedByUs: false,
  };

  if (!existsSync(path.join(dataDir, "PG_VERSION"))) {
    log(`creating cluster "${name}" in ${dataDir}`);
    mkdirSync(dataDir, { recursive: true, mode: 0o700 });
    if (isRoot) {
      const uid = Number(execFileSync("id", ["-u", "postgres"]).toString().trim());
      const gid = Number(execFileSync("id", ["-g", "postgres"]).toString().trim());
      chownSync(dataDir, uid, gid);
      chownSync(path.dirname(dataDir), uid, gid);
    }
    // Trust on loopback only: this is a private, per-checkout cluster with no socket file.
    run(bin, "initdb", ["-D", dataDir, "-U", DB_USER, "-A", "trust", "-E", "UTF8", "--locale=C.UTF-8"]);
    writeFileSync(
      path.join(dataDir, "postgresql.auto.conf"),
      [
        `listen_addresses = '127.0.0.1'`,
        `port = ${port}`,
        `unix_socket_directories = ''`,
        `fsync = ${name === "dev" ? "on" : "off"}`,
        "",
      ].join("\n"),
    );
    if (isRoot) run(bin, "pg_ctl", ["--version"]); // sanity: the OS user can run the tools
  }

  const pidFile = path.join(dataDir, "postmaster.pid");
  if (isReady(bin, port)) {
    if (!existsSync(pidFile)) {
      throw new Error(
        `Port ${port} already has a PostgreSQL server that is not Hatchway's "${name}" cluster. Stop it or free the port.`,
      );
    }
    await ensureRoles(cluster);
    return cluster;
  }
  const logFile = path.join(dataDir, "server.log");
  run(bin, "pg_ctl", ["-D", dataDir, "-l", logFile, "-w", "-t", "30", "start"]);
  for (let i = 0; i < 50 && !isReady(bin, port); i++) await new Promise((r) => setTimeout(r, 100));
  if (!isReady(bin, port)) throw new Error(`PostgreSQL did not become ready on port ${port}; see ${logFile}`);
  cluster.startedByUs = true;
  log(`cluster "${name}" listening on 127.0.0.1:${port}`);
  await ensureRoles(cluster);
  return cluster;
}

export function stopCluster(cluster: Cluster): void {
  const bin = findBinDir();
  if (!bin) return;
  run(bin, "pg_ctl", ["-D", cluster.dataDir, "-m", "fast", "-w", "stop"], { allowFail: true });
}

async function withAdmin<T>(cluster: Cluster, fn: (client: pg.Client) => Promise<T>, db = "postgres"): Promise<T> {
  const client = new pg.Client({ connectionString: cluster.url(db, "admin") });
  await client.connect();
  try {
    return await fn(client);
  } finally {
    await client.end();
  }
}

const ident = (name: string) => {
  if (!/^[a-z_][a-z0-9_]*$/.test(name)) throw new Error(`bad database name ${name}`);
  return `"${name}"`;
};

/**
 * The owner and app logins (D18), created once per cluster and held to no attribute beyond
 * logging in. Safe when two processes start at once: a role the other one created is fine.
 */
export async function ensureRoles(cluster: Cluster): Promise<void> {
  await withAdmin(cluster, async (client) => {
    for (const role of [OWNER_ROLE, APP_ROLE]) {
      await client.query(`DO $$ BEGIN
          CREATE ROLE ${ident(role)} ${ROLE_ATTRIBUTES};
        EXCEPTION WHEN duplicate_object OR unique_violation THEN NULL;
        END $$`);
      await client.query(`ALTER ROLE ${ident(role)} ${ROLE_ATTRIBUTES}`);
    }
    // The app inherits nothing from any role it might be made a member of by mistake.
    await client.query(`ALTER ROLE ${ident(APP_ROLE)} NOINHERIT`);
  });
}

/**
 * A database belongs to the owner role; the app may connect to it and nothing else at the
 * database level (no CREATE, no TEMPORARY). Also adopts a database made before the roles
 * existed: its tables and functions pass from the superuser to the owner.
 */
async function secureDatabase(cluster: Cluster, db: string): Promise<void> {
  await withAdmin(cluster, async (client) => {
    await client.query(`ALTER DATABASE ${ident(db)} OWNER TO ${ident(OWNER_ROLE)}`);
    await client.query(`REVOKE ALL ON DATABASE ${ident(db)} FROM PUBLIC`);
    await client.query(`GRANT CONNECT ON DATABASE ${ident(db)} TO ${ident(APP_ROLE)}`);
  });
  await withAdmin(
    cluster,
    async (client) => {
      await client.query(`DO $$
        DECLARE object record;
        BEGIN
          FOR object IN
            SELECT c.oid::regclass AS name, c.relkind FROM pg_class c
              JOIN pg_namespace n ON n.oid = c.relnamespace
             WHERE n.nspname = 'public' AND c.relkind IN ('r', 'p', 'v', 'm', 'f', 'S')
               AND c.relowner <> '${OWNER_ROLE}'::regrole
               -- extension members and sequences that belong to a column follow their owner
               AND NOT EXISTS (SELECT 1 FROM pg_depend d WHERE d.classid = 'pg_class'::regclass
                                  AND d.objid = c.oid AND d.deptype IN ('e', 'a', 'i'))
          LOOP
            EXECUTE format('ALTER %s %s OWNER TO ${OWNER_ROLE}',
              CASE object.relkind WHEN 'S' THEN 'SEQUENCE' WHEN 'v' THEN 'VIEW'
                WHEN 'm' THEN 'MATERIALIZED VIEW' WHEN 'f' THEN 'FOREIGN TABLE' ELSE 'TABLE' END,
              object.name);
          END LOOP;
          FOR object IN
            SELECT p.oid::regprocedure AS name FROM pg_proc p
              JOIN pg_namespace n ON n.oid = p.pronamespace
             WHERE n.nspname = 'public' AND p.proowner <> '${OWNER_ROLE}'::regrole
               AND NOT EXISTS (SELECT 1 FROM pg_depend d WHERE d.classid = 'pg_proc'::regclass
                                  AND d.objid = p.oid AND d.deptype = 'e')
          LOOP
            EXECUTE format('ALTER ROUTINE %s OWNER TO ${OWNER_ROLE}', object.name);
          END LOOP;
        END $$`);
    },
    db,
  );
}

export async function ensureDatabase(cluster: Cluster, db: string): Promise<void> {
  await withAdmin(cluster, async (client) => {
    const { rowCount } = await client.query("SELECT 1 FROM pg_database WHERE datname = $1", [db]);
    if (!rowCount) await client.query(`CREATE DATABASE ${ident(db)} OWNER ${ident(OWNER_ROLE)}`);
  });
  await secureDatabase(cluster, db);
}

/**
 * Drops and re-creates `db` as a copy of `template` (fast: a file copy inside the server). The
 * copy keeps the template's objects with their owners and grants; the database-level owner and
 * privileges are set again, since they are not part of the copy.
 */
export async function recreateFromTemplate(cluster: Cluster, db: string, template: string): Promise<void> {
  await withAdmin(cluster, async (client) => {
    await client.query(`DROP DATABASE IF EXISTS ${ident(db)} WITH (FORCE)`);
    await client.query(`CREATE DATABASE ${ident(db)} TEMPLATE ${ident(template)} OWNER ${ident(OWNER_ROLE)}`);
    await client.query(`REVOKE ALL ON DATABASE ${ident(db)} FROM PUBLIC`);
    await client.query(`GRANT CONNECT ON DATABASE ${ident(db)} TO ${ident(APP_ROLE)}`);
  });
}

export async function dropDatabase(cluster: Cluster, db: string): Promise<void> {
  await withAdmin(cluster, (client) =>
    client.query(`DROP DATABASE IF EXISTS ${ident(db)} WITH (FORCE)`).then(() => undefined),
  );
}

/** A handle on a cluster some other process started (test workers use the global setup's). */
export function clusterOnPort(name: string, port: number): Cluster {
  return { name, port, dataDir: "", url: urlFor(port), startedByUs: false };
}
