import { outcomeTotal } from "@shared/checkin/discrepancy";

type Counts = { arrivedWell: number; arrivedProblem: number; deadOnArrival: number; missing: number };

/**
 * What is wrong with a line's outcome counts, or null when they account for exactly the
 * `expected` animals of the line (the server refuses anything else).
 */
export function outcomeMismatch(expected: number, counts: Counts): string | null {
  const total = outcomeTotal({ animalId: "", ...counts });
  if (total === expected) return null;
  if (total < expected) {
    const left = expected - total;
    return `${left} of ${expected} not accounted for yet: say how ${left === 1 ? "it" : "each"} arrived.`;
  }
  return `These add up to ${total}, but the line lists ${expected}. Record extra animals under “Arrived but not listed”.`;
}
