import express, { type Request, type RequestHandler } from "express";
import { LIMITS } from "@shared/constants";
import { SCAN_UPLOAD_DECLARED_TYPES } from "@shared/compliance/scan-type";
import { HttpError } from "../../http/errors";

/** The one API route that takes a file instead of JSON: `POST /api/documents/:id/scans`. */
export function isScanUpload(req: Request): boolean {
  return req.method === "POST" && /^\/documents\/[^/]+\/scans\/?$/.test(req.path);
}

/** Body types the scan upload may declare (the bytes decide the real type). */
export const SCAN_UPLOAD_TYPES: string[] = [...SCAN_UPLOAD_DECLARED_TYPES];

const raw = express.raw({ type: SCAN_UPLOAD_TYPES, limit: LIMITS.uploadBytesMax });

/** Reads the raw file body, at most 10 MB; a larger one is a 413 that says the limit. */
export const scanBody: RequestHandler = (req, res, next) =>
  raw(req, res, (err?: { type?: string }) => {
    if (err?.type === "entity.too.large") {
      return next(
        new HttpError(
          413,
          "too_large",
          `The file is larger than ${LIMITS.uploadBytesMax / (1024 * 1024)} MB. Scan it at a lower resolution or split it.`,
        ),
      );
    }
    next(err);
  });
