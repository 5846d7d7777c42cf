/**
 * The app cannot rewrite its own evidence (D18): it connects as a role that owns nothing, is
 * not a superuser, and may only read and write rows — and on the append-only tables only add
 * them. Each refusal below is PostgreSQL's own (SQLSTATE 42501, insufficient_privilege, or
 * 42809/42501 "must be owner"), from the privilege rules of the PostgreSQL 15 manual, "5.7.
 * Privileges" and "ALTER TABLE" [published].
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import pg from "pg";
import { buildTransfer } from "../factories";
import { createTestApp, databaseUrlAs, signIn, withDatabaseAs, type TestApp } from "../support/app";
import { APP_ROLE, OWNER_ROLE } from "../../server/db/roles";
import { privilegeProblems } from "../../server/db/least-privilege";

let t: TestApp;
let app: pg.Client;
beforeAll(async () => {
  t = await createTestApp();
  app = new pg.Client({ connectionString: t.env.DATABASE_URL });
  await app.connect();
});
afterAll(async () => {
  await app.end();
  await t.close();
});

/** Runs one statement as the app role inside a transaction that is always rolled back. */
async function asApp(sql: string, values: unknown[] = []) {
  await app.query("BEGIN");
  try {
    return await app.query(sql, values);
  } finally {
    await app.query("ROLLBACK");
  }
}

const refused = /permission denied|must be owner|must be superuser/;

describe("the app's database role", () => {
  it("is the role the test app and the server connect as, not a superuser, and owns nothing", async () => {
    const { rows } = await app.query<{ user: string; superuser: boolean; createdb: boolean; createrole: boolean }>(
      `SELECT current_user AS user, rolsuper AS superuser, rolcreatedb AS createdb, rolcreaterole AS createrole
         FROM pg_roles WHERE rolname = current_user`,
    );
    expect(rows[0]).toEqual({ user: APP_ROLE, superuser: false, createdb: false, createrole: false });
    const owned = await app.query<{ n: number }>(
      `SELECT (SELECT count(*) FROM pg_class WHERE relowner = r.oid)
            + (SELECT count(*) FROM pg_proc WHERE proowner = r.oid)
            + (SELECT count(*) FROM pg_namespace WHERE nspowner = r.oid)
            + (SELECT count(*) FROM pg_type WHERE typowner = r.oid)
            + (SELECT count(*) FROM pg_database WHERE datdba = r.oid) AS n
         FROM pg_roles r WHERE r.rolname = current_user`,
    );
    expect(Number(owned.rows[0]!.n)).toBe(0);
    // The pool the test app's routes use is the same role.
    expect((await t.ctx.pool.query("SELECT current_user AS u")).rows[0].u).toBe(APP_ROLE);
  });

  it("cannot change, delete or empty the custody log or the edit history", async () => {
    const cast = await buildTransfer(t.orm.em.fork(), { status: "awaiting_receiver" });
    for (const table of ["custody_entry", "transfer_change"]) {
      await expect(
        asApp(`UPDATE ${table} SET transfer_id = transfer_id WHERE transfer_id = $1`, [cast.transfer.id]),
      ).rejects.toThrow(refused);
      await expect(asApp(`DELETE FROM ${table} WHERE transfer_id = $1`, [cast.transfer.id])).rejects.toThrow(refused);
      await expect(asApp(`TRUNCATE ${table}`)).rejects.toThrow(refused);
    }
    // It can still add entries and read them: the log grows through the app.
    expect(
      Number(
        (await app.query("SELECT count(*) FROM custody_entry WHERE transfer_id = $1", [cast.transfer.id])).rows[0]
          .count,
      ),
    ).toBeGreaterThan(0);
  });

  it("cannot switch the triggers off, neither per table nor per session", async () => {
    await expect(asApp("ALTER TABLE custody_entry DISABLE TRIGGER ALL")).rejects.toThrow(refused);
    await expect(asApp("ALTER TABLE custody_entry DISABLE TRIGGER custody_entry_no_update_delete")).rejects.toThrow(
      refused,
    );
    await expect(asApp("SET session_replication_role = replica")).rejects.toThrow(refused);
    await expect(asApp("SET LOCAL session_replication_role = replica")).rejects.toThrow(refused);
    await expect(asApp("DROP TRIGGER custody_entry_no_update_delete ON custody_entry")).rejects.toThrow(refused);
    await expect(
      asApp(
        "CREATE OR REPLACE FUNCTION hatchway_append_only() RETURNS trigger LANGUAGE plpgsql AS $$ BEGIN RETURN NEW; END $$",
      ),
    ).rejects.toThrow(refused);
  });

  it("cannot create, alter or drop anything, nor make temporary tables", async () => {
    await expect(asApp("CREATE TABLE shadow_log (id int)")).rejects.toThrow(refused);
    await expect(asApp("CREATE TEMPORARY TABLE shadow_log (id int)")).rejects.toThrow(refused);
    await expect(asApp("CREATE SCHEMA shadow")).rejects.toThrow(refused);
    await expect(asApp("CREATE FUNCTION shadow() RETURNS int LANGUAGE sql AS 'SELECT 1'")).rejects.toThrow(refused);
    await expect(asApp("ALTER TABLE transfer ADD COLUMN shadow text")).rejects.toThrow(refused);
    await expect(asApp("DROP TABLE custody_entry")).rejects.toThrow(refused);
    await expect(asApp("ALTER TABLE custody_entry OWNER TO hatchway_app")).rejects.toThrow(refused);
    await expect(asApp(`SET ROLE ${OWNER_ROLE}`)).rejects.toThrow(refused);
    await expect(asApp("SELECT * FROM mikro_orm_migrations")).rejects.toThrow(refused);
  });

  it("holds no TRUNCATE, TRIGGER or REFERENCES anywhere, and only adds rows where a table guards against change", async () => {
    const { rows } = await app.query<{ table: string; guarded: boolean; privileges: string[] }>(
      `SELECT c.relname AS table,
              EXISTS (SELECT 1 FROM pg_trigger g WHERE g.tgrelid = c.oid AND NOT g.tgisinternal
                        AND (g.tgtype & 32) <> 0) AS guarded,
              ARRAY(SELECT p FROM unnest(ARRAY['SELECT','INSERT','UPDATE','DELETE','TRUNCATE','REFERENCES','TRIGGER']) p
                     WHERE has_table_privilege(current_user, c.oid, p)) AS privileges
         FROM pg_class c JOIN pg_namespace n ON n.oid = c.relnamespace
        WHERE n.nspname = 'public' AND c.relkind IN ('r', 'p')
        ORDER BY 1`,
    );
    expect(rows.length).toBeGreaterThan(20);
    for (const row of rows) {
      expect(row.privileges, row.table).not.toContain("TRUNCATE");
      expect(row.privileges, row.table).not.toContain("TRIGGER");
      expect(row.privileges, row.table).not.toContain("REFERENCES");
      // A table with a BEFORE TRUNCATE guard is append-only (D6): no table-wide UPDATE or DELETE.
      if (row.guarded) expect(row.privileges, row.table).not.toContain("UPDATE");
      if (row.guarded) expect(row.privileges, row.table).not.toContain("DELETE");
    }
    const guarded = rows.filter((row) => row.guarded).map((row) => row.table);
    expect(guarded).toEqual(expect.arrayContaining(["custody_entry", "transfer_change"]));
    const plain = rows.find((row) => row.table === "transfer")!;
    expect(plain.privileges).toEqual(["SELECT", "INSERT", "UPDATE", "DELETE"]);
  });

  it("a table the owner adds in a later migration gets row privileges, and nothing more", async () => {
    await withDatabaseAs("owner", async (owner) => {
      await owner.query("BEGIN");
      try {
        await owner.query("CREATE TABLE later_table (id int primary key)");
        const { rows } = await owner.query<{ privileges: string[] }>(
          `SELECT ARRAY(SELECT p FROM unnest(ARRAY['SELECT','INSERT','UPDATE','DELETE','TRUNCATE','REFERENCES','TRIGGER']) p
                         WHERE has_table_privilege($1, 'later_table', p)) AS privileges`,
          [APP_ROLE],
        );
        expect(rows[0]!.privileges).toEqual(["SELECT", "INSERT", "UPDATE", "DELETE"]);
      } finally {
        await owner.query("ROLLBACK");
      }
    });
  });

  it("the test database is a copy of the template that kept the owner and the grants", async () => {
    const { rows } = await app.query<{ owner: string; acl: string }>(
      `SELECT pg_get_userbyid(datdba) AS owner, datacl::text AS acl FROM pg_database WHERE datname = current_database()`,
    );
    expect(rows[0]!.owner).toBe(OWNER_ROLE);
    // PUBLIC ("=…" in the ACL) may not even connect; the app may connect and nothing else.
    expect(rows[0]!.acl).not.toMatch(/[{,]=/);
    expect(rows[0]!.acl).toContain(`${APP_ROLE}=c/`);
    const tables = await app.query<{ n: number }>(
      `SELECT count(*) AS n FROM pg_tables WHERE schemaname = 'public' AND tableowner <> $1`,
      [OWNER_ROLE],
    );
    expect(Number(tables.rows[0]!.n)).toBe(0);
  });

  it("sessions, the outbox, idempotency keys and the forecast cache work under it", async () => {
    const cast = await buildTransfer(t.orm.em.fork(), { status: "awaiting_receiver" });
    const sender = await signIn(t.app, cast.sender.email);
    expect((await sender.get("/api/auth/me")).status).toBe(200);
    expect(Number((await app.query("SELECT count(*) FROM session")).rows[0].count)).toBeGreaterThan(0);
    // Each of these the app writes, changes and clears in normal work.
    for (const sql of [
      "UPDATE outbox_message SET attempts = attempts WHERE false",
      "DELETE FROM outbox_message WHERE false",
      "SELECT id FROM outbox_message FOR UPDATE SKIP LOCKED",
      "DELETE FROM idempotency_key WHERE false",
      "UPDATE idempotency_key SET status = status WHERE false",
      "INSERT INTO forecast_hour (lat_e2, lon_e2, hour, temp_f, fetched_at) VALUES (1, 2, now(), 70, now())",
      "DELETE FROM forecast_hour WHERE false",
      "DELETE FROM auth_throttle WHERE false",
      "SELECT id FROM transfer FOR UPDATE",
    ])
      await expect(asApp(sql), sql).resolves.toBeDefined();
  });

  it("the server's start-up check finds nothing to complain about in it, and refuses the owner and the superuser", async () => {
    expect(await privilegeProblems(t.ctx.pool)).toEqual([]);
    for (const role of ["owner", "admin"] as const) {
      const pool = new pg.Pool({ connectionString: databaseUrlAs(role), max: 1 });
      try {
        const problems = await privilegeProblems(pool);
        expect(problems.join("\n")).toMatch(role === "owner" ? /owns custody_entry/ : /is a superuser/);
        expect(problems.join("\n")).toMatch(/may truncate custody_entry/);
      } finally {
        await pool.end();
      }
    }
  });
});
