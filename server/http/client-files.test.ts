import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { brotliCompressSync, brotliDecompressSync, gunzipSync, gzipSync } from "node:zlib";
import { get as httpGet, type IncomingHttpHeaders, type Server } from "node:http";
import express from "express";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { clientFiles } from "./client-files";

// A build as Vite and vite-plugin-compression2 lay it out: hashed files under assets/ with .br
// and .gz copies beside them, a hidden source map, and index.html.
const script = "export const hello = 'the courier page';\n".repeat(200);
let dist = "";
let server: Server;
let port = 0;

beforeAll(() => {
  dist = mkdtempSync(path.join(tmpdir(), "hatchway-dist-"));
  mkdirSync(path.join(dist, "assets"));
  writeFileSync(path.join(dist, "index.html"), "<!doctype html><title>Hatchway</title>");
  writeFileSync(path.join(dist, "assets", "app-BX7c1d2E.js"), script);
  writeFileSync(path.join(dist, "assets", "app-BX7c1d2E.js.gz"), gzipSync(script));
  writeFileSync(path.join(dist, "assets", "app-BX7c1d2E.js.br"), brotliCompressSync(script));
  writeFileSync(path.join(dist, "assets", "app-BX7c1d2E.js.map"), '{"version":3}');
  const app = express();
  app.use(clientFiles(dist)!);
  return new Promise<void>((resolve) => {
    server = app.listen(0, "127.0.0.1", () => {
      port = (server.address() as { port: number }).port;
      resolve();
    });
  });
});
afterAll(() => {
  server?.close();
  rmSync(dist, { recursive: true, force: true });
});

type Answer = { status: number; headers: IncomingHttpHeaders; body: Buffer; text: string };

/** Node's own HTTP client: it does not decompress, so each test sees the bytes on the wire. */
function get(url: string, acceptEncoding = "identity"): Promise<Answer> {
  return new Promise((resolve, reject) => {
    httpGet({ host: "127.0.0.1", port, path: url, headers: { "Accept-Encoding": acceptEncoding } }, (res) => {
      const chunks: Buffer[] = [];
      res.on("data", (chunk: Buffer) => chunks.push(chunk));
      res.on("end", () => {
        const body = Buffer.concat(chunks);
        resolve({ status: res.statusCode ?? 0, headers: res.headers, body, text: body.toString() });
      });
    }).on("error", reject);
  });
}

describe("the built client", () => {
  // Content-Encoding and Vary: RFC 9110 §8.4 and §12.5.5 [published]; "immutable": RFC 8246 [published].
  it("sends the brotli copy to a browser that accepts it, marked so caches keep encodings apart", async () => {
    const res = await get("/assets/app-BX7c1d2E.js", "gzip, deflate, br");
    expect(res.status).toBe(200);
    expect(res.headers["content-encoding"]).toBe("br");
    expect(res.headers["vary"]).toMatch(/Accept-Encoding/i);
    expect(res.headers["content-type"]).toMatch(/javascript/);
    expect(brotliDecompressSync(res.body).toString()).toBe(script);
    expect(res.body.length).toBeLessThan(script.length / 10);
  });

  it("falls back to gzip, then to the plain file", async () => {
    const gz = await get("/assets/app-BX7c1d2E.js", "gzip");
    expect(gz.headers["content-encoding"]).toBe("gzip");
    expect(gunzipSync(gz.body).toString()).toBe(script);
    const plain = await get("/assets/app-BX7c1d2E.js");
    expect(plain.headers["content-encoding"]).toBeUndefined();
    expect(plain.body.toString()).toBe(script);
  });

  it("lets browsers keep hashed assets for a year without asking again", async () => {
    const res = await get("/assets/app-BX7c1d2E.js", "br");
    expect(res.headers["cache-control"]).toBe("public, max-age=31536000, immutable");
  });

  it("has the browser check index.html on every load, for any client route", async () => {
    for (const url of ["/", "/transfers/0197d3c2-7a1b-7c3d-8e4f-5a6b7c8d9e0f", "/index.html"]) {
      const res = await get(url);
      expect(res.status).toBe(200);
      expect(res.headers["cache-control"]).toBe("no-cache");
      expect(res.text).toContain("<title>Hatchway</title>");
    }
  });

  it("never serves source maps", async () => {
    expect((await get("/assets/app-BX7c1d2E.js.map")).status).toBe(404);
    expect((await get("/anything.js.map")).status).toBe(404);
  });

  it("answers 404 for an asset that is not there, not the page in its place", async () => {
    const res = await get("/assets/app-OLDHASH1.js");
    expect(res.status).toBe(404);
    expect(res.text).not.toContain("<title>");
  });
});

describe("without a build", () => {
  it("serves nothing (Vite serves the client in development)", () => {
    expect(clientFiles(path.join(tmpdir(), "hatchway-no-such-build"))).toBeNull();
  });
});
