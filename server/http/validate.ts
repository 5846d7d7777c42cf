import type { z } from "zod";
import type { Request } from "express";
import { idSchema } from "@shared/schemas/common";
import { describeIssues } from "@shared/validation/messages";
import { HttpError } from "./errors";

/**
 * Parses untrusted input with a strict schema; a failure is a 400 that names the field in the
 * words the form shows. The error handler tells a measurement's limit in the units the request
 * asks for (`Hatchway-Units` header, see errors.ts).
 */
export function parse<S extends z.ZodType>(schema: S, value: unknown): z.output<S> {
  const result = schema.safeParse(value);
  if (!result.success) {
    const error = result.error;
    const { field, message } = describeIssues(error);
    throw new HttpError(400, "invalid", message, { field }, undefined, (units) => describeIssues(error, units).message);
  }
  return result.data;
}

/**
 * A value taken from the address (`/api/transfers/:id`): a failure names the path parameter,
 * not the body — "The transfer id in the address is not valid." with `field: "id"` — and never
 * repeats what was sent.
 */
export function pathParam<S extends z.ZodType>(req: Request, name: string, what: string, schema: S): z.output<S> {
  const result = schema.safeParse(req.params[name]);
  if (!result.success)
    throw new HttpError(400, "invalid_path", `The ${what} in the address is not valid.`, { field: name });
  return result.data;
}

/** An id taken from the address; `record` names what it is the id of ("transfer", "document"). */
export const pathId = (req: Request, name: string, record: string): string =>
  pathParam(req, name, `${record} id`, idSchema);
