import type { z } from "zod";
import { describeIssues } from "@shared/schemas/common";
import { HttpError } from "./errors";

/** Parses untrusted input with a strict schema; a failure is a 400 that names the field. */
export function parse<S extends z.ZodType>(schema: S, value: unknown): z.output<S> {
  const result = schema.safeParse(value);
  if (!result.success) {
    const { field, message } = describeIssues(result.error);
    throw new HttpError(400, "invalid", message, { field });
  }
  return result.data;
}
