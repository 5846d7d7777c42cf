import type { ErrorRequestHandler, RequestHandler } from "express";
import { NotFoundError, DriverException, ConnectionException } from "@mikro-orm/core";
import { randomUUID } from "node:crypto";
import { DEFAULT_UNIT_SYSTEM, UNIT_SYSTEMS, type UnitSystem } from "@shared/units";
import { sentence } from "@shared/validation/messages";

/** An error with a status and a message meant for the person using the app. */
export class HttpError extends Error {
  constructor(
    public readonly status: number,
    public readonly code: string,
    message: string,
    public readonly details?: Record<string, unknown>,
    public readonly headers?: Record<string, string>,
    /** The message in another unit system, where it names a measurement (see validate.ts). */
    public readonly messageIn?: (units: UnitSystem) => string,
  ) {
    super(message);
  }
}

export const badRequest = (message: string, details?: Record<string, unknown>) =>
  new HttpError(400, "bad_request", message, details);
/**
 * A 400 about one field, in the words the forms use: invalidField(["animals", 2, "taxonId"],
 * "this species is not in the catalogue") says "Animal line 3 species: this species is not in the
 * catalogue." and names the field `animals.2.taxonId` for the form.
 */
export const invalidField = (
  path: readonly (string | number)[],
  instruction: string,
  details?: Record<string, unknown>,
  code = "bad_request",
) => new HttpError(400, code, sentence(path, instruction), { field: path.join(".") || "body", ...details });
export const forbidden = (message = "You do not have access to this.") => new HttpError(403, "forbidden", message);
export const notFound = (what = "That record") => new HttpError(404, "not_found", `${what} was not found.`);
export const conflict = (message: string, details?: Record<string, unknown>) =>
  new HttpError(409, "conflict", message, details);
export const unavailable = (message: string) => new HttpError(503, "unavailable", message);

/** The unit system a request asks for in the `Hatchway-Units` header; °F and inches when it names none. */
export function unitsOf(req: { get(name: string): string | undefined }): UnitSystem {
  const asked = req.get("Hatchway-Units")?.trim().toLowerCase();
  return UNIT_SYSTEMS.find((system) => system === asked) ?? DEFAULT_UNIT_SYSTEM;
}

/** Every response carries a correlation id; a person reporting a problem can quote it. */
export const correlationId: RequestHandler = (req, res, next) => {
  const id = randomUUID();
  res.locals.correlationId = id;
  res.setHeader("X-Correlation-Id", id);
  next();
};

function isDatabaseDown(err: unknown): boolean {
  if (err instanceof ConnectionException) return true;
  const code = (err as { code?: string })?.code;
  return ["ECONNREFUSED", "ECONNRESET", "57P01", "57P03", "08006", "08001", "ETIMEDOUT"].includes(code ?? "");
}

/** Turns anything thrown into `{"error":{"code","message"}}`; never leaks stacks, SQL or paths. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  const correlation = res.locals.correlationId as string | undefined;
  let status = 500;
  let body: { code: string; message: string; [k: string]: unknown } = {
    code: "internal",
    message: `Something went wrong on our side. Quote reference ${correlation} if you contact us.`,
  };

  if (err instanceof HttpError) {
    status = err.status;
    body = { code: err.code, message: err.messageIn?.(unitsOf(req)) ?? err.message, ...(err.details ?? {}) };
    for (const [k, v] of Object.entries(err.headers ?? {})) res.setHeader(k, v);
  } else if (err instanceof NotFoundError) {
    status = 404;
    body = { code: "not_found", message: "That record was not found." };
  } else if (err?.type === "entity.parse.failed") {
    status = 400;
    body = { code: "malformed_json", message: "The request body is not valid JSON." };
  } else if (err?.type === "entity.too.large") {
    status = 413;
    body = { code: "too_large", message: "The request body is too large." };
  } else if (typeof err?.status === "number" && err.status >= 400 && err.status < 500) {
    // body-parser and friends: charset or encoding problems, aborted requests.
    status = err.status;
    body = { code: "bad_request", message: "The request could not be read." };
  } else if (isDatabaseDown(err) || (err instanceof DriverException && isDatabaseDown(err.cause ?? err))) {
    status = 503;
    body = {
      code: "db_unavailable",
      message: "The database is not answering right now. Nothing was saved; please try again in a minute.",
    };
  }

  if (status >= 500) {
    console.error(`[${correlation}] ${req.method} ${req.originalUrl}`, err);
  }
  if (res.headersSent) return;
  res.status(status).json({ error: body });
};

export const notFoundApi: RequestHandler = (_req, _res, next) =>
  next(new HttpError(404, "not_found", "There is no such API route."));
