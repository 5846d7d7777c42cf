import type { z } from "zod";
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
