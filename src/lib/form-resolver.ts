import { zodResolver } from "@hookform/resolvers/zod";
import type { FieldValues, Resolver } from "react-hook-form";
import type { z } from "zod";
import { errorMapFor } from "@shared/validation/messages";
import { readUnitSystem } from "./units-preference";

/**
 * How the forms parse with a shared schema: zod with our error map in the units the person
 * reads, so "Wall thickness: use at most 7.9 in." shows under a field in inches — the same
 * sentence the server answers for the same mistake.
 */
export function parseOptions(): { error: z.core.$ZodErrorMap } {
  return { error: errorMapFor(readUnitSystem()) };
}

/** react-hook-form's resolver for a shared schema, with the keeper's messages in their units. */
export function keeperResolver<Input extends FieldValues, Output>(
  schema: z.core.$ZodType<Output, Input>,
): Resolver<Input, unknown, Output> {
  return (values, context, options) => zodResolver(schema, parseOptions())(values, context, options);
}
