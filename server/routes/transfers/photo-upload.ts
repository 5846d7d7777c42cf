import express, { type Request, type RequestHandler } from "express";
import { LIMITS } from "@shared/constants";
import { PHOTO_CONTENT_TYPES } from "@shared/custody/photo-type";
import { HttpError } from "../../http/errors";

/** The API route that takes a photo instead of JSON: `POST /api/transfers/:id/photos`. */
export function isPhotoUpload(req: Request): boolean {
  return req.method === "POST" && /^\/transfers\/[^/]+\/photos\/?$/.test(req.path);
}

/** Body types a photo upload may declare (the bytes decide the real type). */
export const PHOTO_UPLOAD_TYPES: string[] = [...PHOTO_CONTENT_TYPES, "application/octet-stream"];

const raw = express.raw({ type: PHOTO_UPLOAD_TYPES, limit: LIMITS.photoBytesMax });

/** Reads the raw photo, at most 10 MB; a larger one is a 413 that says the limit. */
export const photoBody: RequestHandler = (req, res, next) =>
  raw(req, res, (err?: { type?: string }) => {
    if (err?.type === "entity.too.large")
      return next(
        new HttpError(
          413,
          "too_large",
          `The photo is larger than ${LIMITS.photoBytesMax / (1024 * 1024)} MB. Take it at a lower resolution.`,
        ),
      );
    next(err);
  });
