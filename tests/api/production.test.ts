/**
 * Production settings, tested on the real server process started with NODE_ENV=production
 * behind an HTTPS proxy (X-Forwarded-Proto, as a TLS-terminating proxy sends it). What is
 * checked: cookie prefixes and attributes, RFC 6265bis §4.1.3.2 ("__Host-": Secure, Path=/,
 * no Domain) [published]; HSTS, RFC 6797 §6.1 [published]; Clear-Site-Data, W3C Clear Site
 * Data §3.1 [published]; no source maps served (OWASP ASVS 5.0 V13.4 [memory]).
 */
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { spawn, type ChildProcess } from "node:child_process";
import { mkdirSync, mkdtempSync, writeFileSync } from "node:fs";
import { createServer } from "node:net";
import { tmpdir } from "node:os";
import path from "node:path";
import { buildUser, DEMO_PASSWORD } from "../factories";
import { createTestApp, databaseUrlAs, type TestApp } from "../support/app";
import { PROJECT_ROOT } from "../../scripts/lib/postgres";

let t: TestApp;
const dist = mkdtempSync(path.join(tmpdir(), "hatchway-dist-"));
beforeAll(async () => {
  t = await createTestApp();
  mkdirSync(path.join(dist, "assets"));
  writeFileSync(path.join(dist, "index.html"), "<!doctype html><title>Hatchway</title>");
  writeFileSync(path.join(dist, "assets", "app.js"), "console.log(1);\n//# sourceMappingURL=app.js.map\n");
  writeFileSync(path.join(dist, "assets", "app.js.map"), '{"version":3,"sources":["src/secret.ts"]}');
});
afterAll(() => t.close());

async function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const server = createServer();
    server.listen(0, "127.0.0.1", () => {
      const { port } = server.address() as { port: number };
      server.close(() => resolve(port));
    });
  });
}

type Started = { base: string; process: ChildProcess; output: () => string; stop(): Promise<void> };

/** `node --import tsx server/index.ts` with a production environment; resolves when it answers or exits. */
async function startProduction(databaseUrl: string): Promise<Started & { exitCode: number | null }> {
  const port = await freePort();
  let output = "";
  const child = spawn(process.execPath, ["--import", "tsx", "server/index.ts"], {
    cwd: PROJECT_ROOT,
    env: {
      PATH: process.env.PATH,
      NODE_ENV: "production",
      HOST: "127.0.0.1",
      PORT: String(port),
      PUBLIC_URL: "https://hatchway.example.test",
      DATABASE_URL: databaseUrl,
      SESSION_SECRET: "production-test-secret-production-test-secret",
      SMTP_URL: "smtp://127.0.0.1:9",
      S3_ENDPOINT: "http://127.0.0.1:9",
      S3_BUCKET: "hatchway-test",
      S3_ACCESS_KEY_ID: "x",
      S3_SECRET_ACCESS_KEY: "x",
      WEATHER_URL: "http://127.0.0.1:9",
      WORKERS: "false",
      CLIENT_DIST: dist,
    },
    stdio: ["ignore", "pipe", "pipe"],
  });
  child.stdout!.on("data", (chunk) => (output += chunk));
  child.stderr!.on("data", (chunk) => (output += chunk));
  const base = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 40_000;
  while (Date.now() < deadline && child.exitCode === null) {
    try {
      if ((await fetch(`${base}/api/health`)).ok) break;
    } catch {
      // starting
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  return {
    base,
    process: child,
    exitCode: child.exitCode,
    output: () => output,
    async stop() {
      if (child.exitCode === null) {
        child.kill("SIGTERM");
        await new Promise((r) => child.once("exit", r));
      }
    },
  };
}

/** What an HTTPS proxy in front of the server adds to every request it forwards. */
const viaHttps = { "X-Forwarded-Proto": "https", "X-Forwarded-For": "203.0.113.7" };

describe("NODE_ENV=production behind HTTPS", () => {
  it("sets __Host- Secure cookies and HSTS, clears the site on sign-out, and serves no source map", async () => {
    const user = await buildUser(t.orm.em.fork());
    const server = await startProduction(t.env.DATABASE_URL);
    try {
      expect(server.exitCode, server.output()).toBeNull();
      const csrf = await fetch(`${server.base}/api/auth/csrf`, { headers: viaHttps });
      expect(csrf.status).toBe(200);
      const cookie = csrf.headers.get("set-cookie") ?? "";
      expect(cookie).toMatch(/^__Host-hatchway=/);
      expect(cookie).toMatch(/;\s*Secure/i);
      expect(cookie).toMatch(/;\s*Path=\/(;|$)/i);
      expect(cookie).toMatch(/;\s*HttpOnly/i);
      expect(cookie).not.toMatch(/Domain=/i);
      expect(csrf.headers.get("strict-transport-security")).toBe("max-age=31536000; includeSubDomains");
      const { csrfToken } = (await csrf.json()) as { csrfToken: string };

      const sessionCookie = cookie.split(";")[0]!;
      const login = await fetch(`${server.base}/api/auth/login`, {
        method: "POST",
        headers: {
          ...viaHttps,
          "Content-Type": "application/json",
          "X-CSRF-Token": csrfToken,
          Cookie: sessionCookie,
          Origin: "https://hatchway.example.test",
        },
        body: JSON.stringify({ email: user.email, password: DEMO_PASSWORD }),
      });
      expect(login.status).toBe(200);
      const signedIn = (login.headers.get("set-cookie") ?? "").split(";")[0]!;
      expect(signedIn).toMatch(/^__Host-hatchway=/);

      const logout = await fetch(`${server.base}/api/auth/logout`, {
        method: "POST",
        headers: { ...viaHttps, "X-CSRF-Token": csrfToken, Cookie: signedIn, Origin: "https://hatchway.example.test" },
      });
      expect(logout.status).toBe(204);
      expect(logout.headers.get("clear-site-data")).toBe('"cache", "cookies", "storage"');
      const me = await fetch(`${server.base}/api/auth/me`, { headers: { ...viaHttps, Cookie: signedIn } });
      expect(me.status).toBe(401);

      expect((await fetch(`${server.base}/assets/app.js`)).status).toBe(200);
      for (const map of [
        "/assets/app.js.map",
        "/assets/APP.JS.MAP",
        "/assets/app.js%2Emap",
        "/assets/app.js.map/",
        "/missing.map",
      ]) {
        const res = await fetch(`${server.base}${map}`);
        expect(res.status, map).toBe(404);
        expect(await res.text(), map).not.toContain("sources");
      }
    } finally {
      await server.stop();
    }
  }, 60_000);

  it("refuses to start with a database login that could rewrite the evidence", async () => {
    const server = await startProduction(databaseUrlAs("owner"));
    try {
      await new Promise((r) => (server.process.exitCode !== null ? r(null) : server.process.once("exit", r)));
      expect(server.process.exitCode).toBe(1);
      expect(server.output()).toMatch(/Hatchway cannot start: the database login can do more than the app needs/);
    } finally {
      await server.stop();
    }
  }, 60_000);

  it("refuses to start with cookies meant for HTTPS and an http:// public address", async () => {
    const { parseEnv } = await import("../../server/env");
    expect(() =>
      parseEnv({
        NODE_ENV: "production",
        PUBLIC_URL: "http://hatchway.example.test",
        DATABASE_URL: "postgres://x@127.0.0.1/x",
        SESSION_SECRET: "x".repeat(40),
        SMTP_URL: "smtp://127.0.0.1:9",
        S3_ENDPOINT: "http://127.0.0.1:9",
        S3_BUCKET: "bucket",
        S3_ACCESS_KEY_ID: "x",
        S3_SECRET_ACCESS_KEY: "x",
        WEATHER_URL: "http://127.0.0.1:9",
      }),
    ).toThrow(/PUBLIC_URL: must be an https:\/\/ address/);
  });
});
