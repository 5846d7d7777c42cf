import { describe, expect, it, vi } from "vitest";
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { MemoryRouter } from "react-router";
import type { RegisterEntryDto } from "@shared/schemas/register";
import { RegisterTable } from "./register-table";

// Real species (The Reptile Database [published]); the entries are invented demo data.
const entry = (overrides: Partial<RegisterEntryDto>): RegisterEntryDto => ({
  id: "00000000-0000-4000-8000-000000000001",
  kind: "group",
  taxon: {
    id: "00000000-0000-4000-8000-0000000000aa",
    scientificName: "Pantherophis guttatus",
    commonName: "Corn snake",
    venomous: false,
  },
  sex: "unknown",
  count: 6,
  countInCare: 4,
  status: "in_care",
  identifier: null,
  identifierKind: null,
  origin: "captive_bred",
  hatchDate: null,
  dateAcquired: "2026-10-01",
  acquiredHow: "purchase",
  sourceOrganization: "Demo Exotics",
  sourcePermitNumber: null,
  transferNumber: null,
  transferId: null,
  condition: null,
  notes: null,
  weightG: null,
  lengthMm: null,
  permitIds: [],
  quarantine: { startedOn: "2026-10-01", until: "2026-11-30", daysLeft: 12 },
  previousEntryId: null,
  parentEntryId: null,
  ...overrides,
});

describe("the register table", () => {
  it("says each status and the quarantine in words, and only lets animals in care be chosen", async () => {
    const onSelect = vi.fn();
    const onSort = vi.fn();
    render(
      <MemoryRouter>
        <RegisterTable
          entries={[
            entry({}),
            entry({
              id: "00000000-0000-4000-8000-000000000002",
              countInCare: 0,
              status: "died",
              quarantine: null,
              identifier: "985112000000001",
            }),
          ]}
          sort="acquired"
          dir="desc"
          onSort={onSort}
          selected={{}}
          onSelect={onSelect}
        />
      </MemoryRouter>,
    );
    expect(screen.getByText("In our care")).toBeTruthy();
    expect(screen.getByText("12 days left of quarantine")).toBeTruthy();
    expect(screen.getByText("Died")).toBeTruthy();
    expect(document.body.textContent).not.toMatch(/in_care|_/);
    const boxes = screen.getAllByRole("checkbox");
    expect((boxes[1] as HTMLInputElement).disabled).toBe(true);
    await userEvent.click(boxes[0]!);
    expect(onSelect).toHaveBeenCalledWith({ "00000000-0000-4000-8000-000000000001": true });
    await userEvent.click(screen.getByRole("button", { name: /species/i }));
    expect(onSort).toHaveBeenCalledWith("species", "desc");
  });
});
