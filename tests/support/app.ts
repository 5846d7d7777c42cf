/** The real app on the worker's real database, for supertest. */
import pg from "pg";
import request from "supertest";
import type { Express } from "express";
import { parseEnv, type Env } from "../../server/env";
import { initORM, type Orm } from "../../server/db/orm";
import { createApp } from "../../server/app";
import type { AppContext } from "../../server/context";
import { composeApp, type CompositionOptions } from "../../server/composition";
import { DEMO_PASSWORD } from "../factories";
import { TEST_PUBLIC_URL } from "./constants";

/**
 * A connection to this worker's database as another role than the app's (D18): `owner` loads
 * data the way the seeders do; `admin` (the superuser) tampers with the evidence on purpose.
 */
export async function withDatabaseAs<T>(role: "owner" | "admin", fn: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: databaseUrlAs(role) });
  await client.connect();
  try {
    return await fn(client);
  } finally {
    await client.end();
  }
}

export function databaseUrlAs(role: "owner" | "admin"): string {
  const url = process.env[role === "owner" ? "TEST_OWNER_DATABASE_URL" : "TEST_ADMIN_DATABASE_URL"];
  if (!url) throw new Error("run integration tests through vitest's integration project");
  return url;
}

export type TestApp = { app: Express; ctx: AppContext; orm: Orm; env: Env; close(): Promise<void> };

export function testEnv(overrides: Record<string, string> = {}): Env {
  const url = process.env.TEST_DATABASE_URL;
  if (!url) throw new Error("TEST_DATABASE_URL is not set: run integration tests through vitest's integration project");
  return parseEnv({
    NODE_ENV: "test",
    DATABASE_URL: url,
    PUBLIC_URL: TEST_PUBLIC_URL,
    SESSION_SECRET: "test-secret-test-secret-test-secret-0123456789",
    SMTP_URL: "smtp://127.0.0.1:9",
    S3_ENDPOINT: "http://127.0.0.1:9",
    S3_BUCKET: "hatchway-test",
    S3_ACCESS_KEY_ID: "S3RVER",
    S3_SECRET_ACCESS_KEY: "S3RVER",
    WEATHER_URL: "http://127.0.0.1:9",
    WORKERS: "false",
    ...overrides,
  });
}

/**
 * The real app, assembled by the real composition root. `options` replaces adapters or gates
 * for one test; each call builds its own context, so apps in one file share nothing.
 */
export async function createTestApp(
  overrides: Record<string, string> = {},
  options: CompositionOptions = {},
): Promise<TestApp> {
  const env = testEnv(overrides);
  const orm = await initORM(env.DATABASE_URL, { poolMax: 5 });
  const pool = new pg.Pool({ connectionString: env.DATABASE_URL, max: 3 });
  const ctx = composeApp({ env, orm, pool }, options);
  const app = createApp(ctx);
  return {
    app,
    ctx,
    orm,
    env,
    async close() {
      await ctx.outbox.stop();
      ctx.adapters.mailer.close();
      await pool.end();
      await orm.close();
    },
  };
}

/** A browser-like client: keeps the cookie and sends the CSRF token on every write. */
export type Client = {
  agent: ReturnType<typeof request.agent>;
  csrf: string;
  get(path: string): request.Test;
  post(path: string, body?: unknown): request.Test;
  patch(path: string, body?: unknown): request.Test;
  put(path: string, body?: unknown): request.Test;
  del(path: string): request.Test;
};

export async function anonymousClient(app: Express): Promise<Client> {
  const agent = request.agent(app);
  const csrf = (await agent.get("/api/auth/csrf").expect(200)).body.csrfToken as string;
  const withToken = (t: request.Test) => t.set("X-CSRF-Token", csrf);
  return {
    agent,
    csrf,
    get: (path) => agent.get(path),
    post: (path, body) =>
      body === undefined ? withToken(agent.post(path)) : withToken(agent.post(path)).send(body as object),
    patch: (path, body) => withToken(agent.patch(path)).send(body as object),
    put: (path, body) => withToken(agent.put(path)).send(body as object),
    del: (path) => withToken(agent.delete(path)),
  };
}

/** Signs in through the real login route and fails the test loudly if that does not work. */
export async function signIn(app: Express, email: string, password = DEMO_PASSWORD): Promise<Client> {
  const client = await anonymousClient(app);
  const res = await client.post("/api/auth/login", { email, password });
  if (res.status !== 200) throw new Error(`sign-in as ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return client;
}
