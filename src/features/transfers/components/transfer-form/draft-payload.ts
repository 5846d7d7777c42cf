import {
  animalInputSchema,
  containerInputSchema,
  type TransferDto,
  type TransferInput,
} from "@shared/schemas/transfer";

type Lists = Pick<TransferInput, "containers" | "animals">;
export type RouteAndParties = Omit<TransferInput, "containers" | "animals">;

/**
 * What of the form can be kept as the server's draft once the route and parties are chosen:
 * the route step's fields (checked by the form before this is asked), the boxes when every box
 * is complete, and the animal lines that are complete and name one of those boxes. The rest stays
 * in the browser until it is complete. `animalIndexes` maps each sent line back to the form.
 */
export function draftPayload(values: TransferInput): {
  route: RouteAndParties;
  lists: (Lists & { animalIndexes: number[] }) | null;
} {
  const { containers, animals, ...route } = values;
  if (containers.length === 0 || !containers.every((c) => containerInputSchema.safeParse(c).success))
    return { route, lists: null };
  const keys = new Set(containers.map((c) => c.key));
  const animalIndexes = animals.flatMap((a, index) =>
    animalInputSchema.safeParse(a).success && (a.containerKey === null || keys.has(a.containerKey)) ? [index] : [],
  );
  return { route, lists: { containers, animals: animalIndexes.map((i) => animals[i]!), animalIndexes } };
}

/**
 * The ids the server gave the boxes and lines it saved, by form position: boxes by their key,
 * lines by their order among those sent. A line that was not sent has no id on the server (any it
 * had was removed with the replaced list), so it gets none.
 */
export function savedIds(
  saved: Pick<TransferDto, "containers" | "animals">,
  lists: { animalIndexes: number[] },
  form: Lists,
): { containers: (string | undefined)[]; animals: (string | undefined)[] } {
  const boxIdByKey = new Map(saved.containers.map((c) => [c.key, c.id]));
  const lineIds = [...saved.animals].sort((a, b) => a.position - b.position).map((a) => a.id);
  const lineIdByFormIndex = new Map(lists.animalIndexes.map((formIndex, sent) => [formIndex, lineIds[sent]]));
  return {
    containers: form.containers.map((c) => boxIdByKey.get(c.key)),
    animals: form.animals.map((_, index) => lineIdByFormIndex.get(index)),
  };
}
