import { randomBytes, timingSafeEqual } from "node:crypto";
import type { RequestHandler } from "express";
import helmet from "helmet";
import { HttpError } from "./errors";

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * Helmet with the tightened policy of our trust baseline. Served over HTTPS, browsers are also
 * told to use nothing else for a year, subdomains included (HSTS; RFC 6797 §6.1).
 */
export function securityHeaders({ https }: { https: boolean }): RequestHandler {
  return helmet({
    contentSecurityPolicy: {
      useDefaults: true,
      directives: {
        "default-src": ["'self'"],
        "script-src": ["'self'"],
        "style-src": ["'self'", "'unsafe-inline'"],
        "img-src": ["'self'", "data:", "blob:"],
        "font-src": ["'self'"],
        "connect-src": ["'self'"],
        "object-src": ["'none'"],
        "base-uri": ["'none'"],
        "frame-ancestors": ["'none'"],
        "form-action": ["'self'"],
        "upgrade-insecure-requests": null,
      },
    },
    crossOriginEmbedderPolicy: false,
    strictTransportSecurity: https ? { maxAge: 365 * 24 * 3600, includeSubDomains: true, preload: false } : false,
  });
}

/**
 * For files we serve that are not pages of ours (scans, the manifest and labels PDFs): load
 * nothing, run nothing, and be a unique origin even when the browser renders it.
 */
export const SANDBOX_CSP = "default-src 'none'; sandbox";

/** A 404 for any source map (`*.map`, however the path is written), before the static files are looked at. */
export const noSourceMaps: RequestHandler = (req, res, next) => {
  let decoded = req.path;
  try {
    decoded = decodeURIComponent(req.path);
  } catch {
    // A malformed path finds no file either.
  }
  if (/\.map$/i.test(decoded.replace(/[/\\.\s]+$/, ""))) {
    res.status(404).type("text/plain").send("Not found");
    return;
  }
  next();
};

/** API answers are records: never cached by the browser or a proxy. */
export const noStore: RequestHandler = (_req, res, next) => {
  res.setHeader("Cache-Control", "no-store");
  next();
};

/**
 * JSON routes take JSON only: a form or text body could be a cross-site request in
 * disguise. Routes that take files opt in to their own types.
 */
export function requireJsonBody(allowed: string[] = []): RequestHandler {
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    const length = Number(req.headers["content-length"] ?? 0);
    const hasBody = length > 0 || req.headers["transfer-encoding"] !== undefined;
    if (!hasBody) return next();
    if (req.is("application/json") || allowed.some((type) => req.is(type))) return next();
    next(new HttpError(415, "unsupported_media_type", "Send the request body as application/json."));
  };
}

declare module "express-session" {
  interface SessionData {
    csrfToken?: string;
    createdAt?: number;
  }
}

/** Returns the session's synchronizer token, creating it on first use. */
export function csrfTokenFor(session: { csrfToken?: string }): string {
  if (!session.csrfToken) session.csrfToken = randomBytes(32).toString("base64url");
  return session.csrfToken;
}

/**
 * CSRF defence: the synchronizer token (bound to the session) in `X-CSRF-Token` on every
 * state-changing request, plus a same-origin check of `Origin` / `Sec-Fetch-Site`.
 */
export function csrfProtection(publicOrigins: string[]): RequestHandler {
  const allowed = new Set(publicOrigins);
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    const site = req.headers["sec-fetch-site"];
    if (site === "cross-site") return next(new HttpError(403, "csrf", "Cross-site requests are not accepted."));
    const origin = req.headers.origin;
    if (origin && origin !== "null" && !allowed.has(origin)) {
      return next(new HttpError(403, "csrf", "This request came from another site and was refused."));
    }
    const expected = req.session?.csrfToken;
    const given = req.headers["x-csrf-token"];
    if (!expected || typeof given !== "string" || !sameToken(expected, given)) {
      return next(
        new HttpError(403, "csrf", "The security token is missing or out of date. Reload the page and try again."),
      );
    }
    next();
  };
}

function sameToken(a: string, b: string): boolean {
  const x = Buffer.from(a);
  const y = Buffer.from(b);
  return x.length === y.length && timingSafeEqual(x, y);
}
