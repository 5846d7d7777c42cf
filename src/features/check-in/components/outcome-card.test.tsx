import { describe, expect, it } from "vitest";
import { useState } from "react";
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import type { AnimalDto, CheckInItemInput } from "@shared/schemas/transfer";
import { OutcomeCard } from "./outcome-card";
import { outcomeMismatch } from "./outcome-sum";

// A real species (The Reptile Database [published]); the line itself is invented demo data.
const line: AnimalDto = {
  id: "00000000-0000-4000-8000-000000000001",
  position: 0,
  taxon: {
    id: "00000000-0000-4000-8000-0000000000aa",
    scientificName: "Terrapene carolina",
    commonName: "Common box turtle",
    venomous: false,
    profileGroup: null,
    rank: "species",
  },
  count: 5,
  sex: "unknown",
  identifier: null,
  identifierKind: null,
  origin: "captive_bred",
  lengthMm: null,
  lengthKind: null,
  weightG: null,
  hatchDate: null,
  notes: null,
  containerId: null,
  containerKey: null,
};

function Harness() {
  const [value, setValue] = useState<CheckInItemInput>({
    animalId: line.id,
    arrivedWell: 0,
    arrivedProblem: 0,
    deadOnArrival: 0,
    missing: 0,
  });
  return <OutcomeCard animal={line} boxLabel="Box 1" value={value} onChange={setValue} />;
}

const more = (label: string) => userEvent.click(screen.getByRole("button", { name: `One more: ${label}` }));

// CITES transport guideline Rp/3 1.72 and 1.82 [published]: sick, injured and dead animals found on arrival are
// recorded; [practice] every animal on the manifest is accounted for, so the four outcomes add up to the line's count.
describe("OutcomeCard", () => {
  it("warns while the outcomes fall short of the count, and clears when they add up", async () => {
    render(<Harness />);
    expect(screen.getByText(/5 of 5 not accounted for yet/)).toBeInTheDocument();
    await more("Arrived well");
    await more("Arrived well");
    await more("Arrived well");
    expect(screen.getByText(/2 of 5 not accounted for yet/)).toBeInTheDocument();
    await more("Dead on arrival");
    await more("Missing");
    expect(screen.getByText("All 5 accounted for.")).toBeInTheDocument();
    expect(screen.queryByText(/not accounted for/)).not.toBeInTheDocument();
  });

  it("warns when the outcomes add up to more than the line lists", async () => {
    render(<Harness />);
    await userEvent.click(screen.getByRole("button", { name: "All 5 arrived well" }));
    expect(screen.getByText("All 5 accounted for.")).toBeInTheDocument();
    await more("Missing");
    expect(screen.getByText(/These add up to 6, but the line lists 5/)).toBeInTheDocument();
  });

  it("asks what was wrong only when an animal arrived with a problem", async () => {
    render(<Harness />);
    expect(screen.queryByLabelText("What was wrong?")).not.toBeInTheDocument();
    await more("Arrived with a problem");
    expect(screen.getByLabelText("What was wrong?")).toBeInTheDocument();
  });

  it("lets no single outcome exceed the line's count", async () => {
    render(<Harness />);
    await userEvent.click(screen.getByRole("button", { name: "All 5 arrived well" }));
    expect(screen.getByRole("button", { name: "One more: Arrived well" })).toBeDisabled();
    expect(screen.getByLabelText("Arrived well")).toHaveValue(5);
  });
});

describe("outcomeMismatch", () => {
  it("is silent only for an exact account", () => {
    // Same sources as above: well + problem + dead + missing = count.
    expect(outcomeMismatch(3, { arrivedWell: 1, arrivedProblem: 1, deadOnArrival: 0, missing: 1 })).toBeNull();
    expect(outcomeMismatch(3, { arrivedWell: 1, arrivedProblem: 0, deadOnArrival: 0, missing: 1 })).toMatch(
      /1 of 3 not accounted for/,
    );
    expect(outcomeMismatch(1, { arrivedWell: 1, arrivedProblem: 0, deadOnArrival: 1, missing: 0 })).toMatch(
      /add up to 2/,
    );
  });
});
