import path from "node:path";
import { existsSync } from "node:fs";
import express, { type RequestHandler, type Router } from "express";
import expressStaticGzip from "express-static-gzip";

/** Hashed build output: a new build gets new names, so a copy may be kept for a year. */
const IMMUTABLE = "public, max-age=31536000, immutable";

/**
 * The built client: precompressed files (brotli, then gzip, by Accept-Encoding, with
 * `Vary: Accept-Encoding`), hashed assets cached for a year, index.html revalidated on every
 * load, source maps never served, and index.html for every other path (the client routes).
 * Null when there is no build (e.g. `npm run dev`, where Vite serves the client).
 */
export function clientFiles(clientDist: string): Router | null {
  const dist = path.resolve(clientDist);
  const indexHtml = path.join(dist, "index.html");
  if (!existsSync(indexHtml)) return null;

  const router = express.Router();
  // Source maps stay on the build machine: they show our source to anyone who asks.
  router.get(/\.map$/, (_req, res) => void res.sendStatus(404));
  router.use(
    expressStaticGzip(dist, {
      enableBrotli: true,
      orderPreference: ["br", "gzip"],
      index: false,
      serveStatic: {
        index: false,
        cacheControl: false,
        setHeaders: (res, filePath) => {
          const underAssets = path.relative(path.join(dist, "assets"), filePath);
          const hashed = !underAssets.startsWith("..") && !path.isAbsolute(underAssets);
          res.setHeader("Cache-Control", hashed ? IMMUTABLE : "no-cache");
        },
      },
    }) as RequestHandler,
  );
  // A file under /assets that is not there is an old build's: a 404, never the page in its place.
  router.use("/assets", (_req, res) => void res.sendStatus(404));
  router.get("/{*splat}", (_req, res) => {
    res.setHeader("Cache-Control", "no-cache");
    res.sendFile(indexHtml);
  });
  return router;
}
