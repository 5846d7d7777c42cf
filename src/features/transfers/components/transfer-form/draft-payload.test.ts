import { describe, expect, it } from "vitest";
import { transferInputSchema, type AnimalInput, type TransferDto } from "@shared/schemas/transfer";
import { blankTransfer, nextAnimal, nextBox } from "./form-values";
import { draftPayload, savedIds } from "./draft-payload";

// Invented demo parties; the species id stands for a real taxon in the catalogue (corn snake,
// Pantherophis guttatus, The Reptile Database [published]).
const RECEIVER = "00000000-0000-4000-8000-0000000000a2";
const CORN_SNAKE = "00000000-0000-4000-8000-0000000000b1";

function routeChosen() {
  const values = blankTransfer({ street: "12 Ash Lane", city: "Knoxville", state: "TN", zip: "37917" });
  return {
    ...values,
    receiverOrganizationId: RECEIVER,
    destination: { street: "400 Marsh Road", city: "Eugene", state: "OR" as const, zip: "97401" },
    mode: "overnight_air" as const,
    purpose: "education_exhibition" as const,
    plannedDepartureAt: "2027-03-09T16:00:00-05:00",
    expectedArrivalAt: "2027-03-10T12:00:00-08:00",
  };
}

const completeBox = (position: number) => ({
  ...nextBox(undefined, position),
  lengthMm: 380,
  widthMm: 280,
  heightMm: 230,
  wallThicknessMm: 25,
});
const completeLine = (boxKey: string): AnimalInput => ({
  ...nextAnimal(undefined, boxKey),
  taxonId: CORN_SNAKE,
  origin: "captive_bred",
});

describe("what the new-transfer form keeps on the server", () => {
  it("sends only the route and parties while the first box is still empty", () => {
    const { route, lists } = draftPayload(routeChosen());
    expect(lists).toBeNull();
    expect(route).not.toHaveProperty("containers");
    expect(route).not.toHaveProperty("animals");
    // The server's own schema (shared/schemas/transfer.ts) accepts it with empty lists, as POST /api/transfers does.
    expect(transferInputSchema.safeParse({ ...route, containers: [], animals: [] }).success).toBe(true);
  });

  it("sends the boxes with the complete lines only, and says which form lines they were", () => {
    const box = completeBox(1);
    const values = {
      ...routeChosen(),
      containers: [box],
      animals: [nextAnimal(undefined, box.key), completeLine(box.key), { ...completeLine("box-gone"), count: 2 }],
    };
    const { route, lists } = draftPayload(values);
    expect(lists?.containers).toEqual([box]);
    expect(lists?.animalIndexes).toEqual([1]); // line 0 has no species, line 2 names no box of the transfer
    const { animalIndexes: _, ...sent } = lists!;
    expect(transferInputSchema.safeParse({ ...route, ...sent }).success).toBe(true);
  });

  it("keeps the boxes back while any of them is incomplete (boxes and lines travel together)", () => {
    const values = { ...routeChosen(), containers: [completeBox(1), nextBox(undefined, 2)] };
    expect(draftPayload(values).lists).toBeNull();
  });

  it("gives each saved box its id by key and each saved line its id by the order sent", () => {
    const [first, second] = [completeBox(1), completeBox(2)];
    const form = {
      containers: [first, second],
      animals: [completeLine(first.key), nextAnimal(undefined, second.key), completeLine(second.key)],
    };
    const saved = {
      containers: [
        { id: "c-2", key: second.key },
        { id: "c-1", key: first.key },
      ],
      animals: [
        { id: "a-second-sent", position: 1 },
        { id: "a-first-sent", position: 0 },
      ],
    } as unknown as Pick<TransferDto, "containers" | "animals">;
    expect(savedIds(saved, { animalIndexes: [0, 2] }, form)).toEqual({
      containers: ["c-1", "c-2"],
      animals: ["a-first-sent", undefined, "a-second-sent"],
    });
  });
});
