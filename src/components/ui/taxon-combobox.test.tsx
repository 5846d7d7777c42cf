import { describe, expect, it, vi } from "vitest";
import { useState } from "react";
import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import type { TaxonBriefDto, TaxonSearchHitDto } from "@shared/schemas/transfer";
import { TaxonCombobox } from "./taxon-combobox";

// Real taxa and their common names (The Reptile Database [published]); ids are invented.
const TAXA: TaxonSearchHitDto[] = [
  hit("1", "Pogona vitticeps", "Central bearded dragon"),
  hit("2", "Pogona henrylawsoni", "Rankin's dragon"),
  hit("3", "Python regius", "Ball python"),
];

function hit(id: string, scientificName: string, commonName: string): TaxonSearchHitDto {
  return {
    id: `00000000-0000-4000-8000-00000000000${id}`,
    scientificName,
    commonName,
    venomous: false,
    profileGroup: null,
    rank: "species",
    commonNames: [commonName],
    synonyms: [],
    matched: { name: scientificName, kind: "scientific" },
  };
}

/** A stand-in for GET /api/taxa: plain substring matching over the three taxa. */
function fakeSearch() {
  return vi.fn(async (q: string) =>
    TAXA.filter((t) => `${t.scientificName} ${t.commonName}`.toLowerCase().includes(q.toLowerCase())),
  );
}

function Harness({
  search,
  onChange,
  onSubmit = () => {},
}: {
  search: ReturnType<typeof fakeSearch>;
  onChange?: (t: TaxonBriefDto | null) => void;
  onSubmit?: () => void;
}) {
  const [value, setValue] = useState<TaxonBriefDto | null>(null);
  return (
    <form
      onSubmit={(e) => {
        e.preventDefault();
        onSubmit();
      }}
    >
      <TaxonCombobox
        label="Species"
        value={value}
        onChange={(t) => {
          setValue(t);
          onChange?.(t);
        }}
        search={search}
        debounceMs={0}
      />
    </form>
  );
}

// WAI-ARIA Authoring Practices 1.2, "Editable Combobox With List Autocomplete" [published]:
// Down/Up move the active option (wrapping), aria-activedescendant names it, Enter accepts, Escape closes then clears.
describe("TaxonCombobox", () => {
  it("names its list and opens it with suggestions", async () => {
    const search = fakeSearch();
    render(<Harness search={search} />);
    const input = screen.getByRole("combobox", { name: "Species" });
    expect(input).toHaveAttribute("aria-expanded", "false");
    expect(input).toHaveAttribute("aria-autocomplete", "list");

    await userEvent.type(input, "pog");
    const list = await screen.findByRole("listbox");
    expect(input).toHaveAttribute("aria-expanded", "true");
    expect(input.getAttribute("aria-controls")).toBe(list.id);
    expect(
      within(list)
        .getAllByRole("option")
        .map((o) => o.textContent),
    ).toEqual(["Pogona vitticeps — Central bearded dragon", "Pogona henrylawsoni — Rankin's dragon"]);
    expect(within(list).getAllByRole("option")[0]!.querySelector("i")).toHaveTextContent("Pogona vitticeps");
  });

  it("moves through the options with the arrows, wrapping at both ends", async () => {
    render(<Harness search={fakeSearch()} />);
    const input = screen.getByRole("combobox", { name: "Species" });
    await userEvent.type(input, "pog");
    const options = within(await screen.findByRole("listbox")).getAllByRole("option");
    expect(input).not.toHaveAttribute("aria-activedescendant");

    await userEvent.keyboard("{ArrowDown}");
    expect(input).toHaveAttribute("aria-activedescendant", options[0]!.id);
    expect(options[0]).toHaveAttribute("aria-selected", "true");
    await userEvent.keyboard("{ArrowDown}");
    expect(input).toHaveAttribute("aria-activedescendant", options[1]!.id);
    expect(options[0]).toHaveAttribute("aria-selected", "false");
    await userEvent.keyboard("{ArrowDown}");
    expect(input).toHaveAttribute("aria-activedescendant", options[0]!.id);
    await userEvent.keyboard("{ArrowUp}");
    expect(input).toHaveAttribute("aria-activedescendant", options[1]!.id);
  });

  it("takes the active option with Enter, without submitting the form", async () => {
    const onChange = vi.fn();
    const onSubmit = vi.fn();
    render(<Harness search={fakeSearch()} onChange={onChange} onSubmit={onSubmit} />);
    const input = screen.getByRole("combobox", { name: "Species" });
    await userEvent.type(input, "pog");
    await screen.findByRole("listbox");
    await userEvent.keyboard("{ArrowDown}{ArrowDown}{Enter}");

    expect(onChange).toHaveBeenLastCalledWith(expect.objectContaining({ scientificName: "Pogona henrylawsoni" }));
    expect(onSubmit).not.toHaveBeenCalled();
    expect(input).toHaveValue("Pogona henrylawsoni");
    expect(input).toHaveAttribute("aria-expanded", "false");
    expect(input).not.toHaveAttribute("aria-activedescendant");
  });

  it("closes with Escape, then clears the text with a second Escape", async () => {
    const onChange = vi.fn();
    render(<Harness search={fakeSearch()} onChange={onChange} />);
    const input = screen.getByRole("combobox", { name: "Species" });
    await userEvent.type(input, "ball");
    await screen.findByRole("listbox");
    await userEvent.keyboard("{ArrowDown}{Escape}");
    expect(input).toHaveAttribute("aria-expanded", "false");
    expect(input).toHaveValue("ball");
    expect(onChange).not.toHaveBeenCalled();
    await userEvent.keyboard("{Escape}");
    expect(input).toHaveValue("");
  });

  it("drops the choice as soon as its name is edited", async () => {
    const onChange = vi.fn();
    render(<Harness search={fakeSearch()} onChange={onChange} />);
    const input = screen.getByRole("combobox", { name: "Species" });
    await userEvent.type(input, "ball");
    await screen.findByRole("listbox");
    await userEvent.keyboard("{ArrowDown}{Enter}");
    expect(onChange).toHaveBeenLastCalledWith(expect.objectContaining({ scientificName: "Python regius" }));
    await userEvent.type(input, "x");
    expect(onChange).toHaveBeenLastCalledWith(null);
    expect(input).toHaveValue("Python regiusx");
  });

  it("waits for two letters before asking", async () => {
    const search = fakeSearch();
    render(<Harness search={search} />);
    const input = screen.getByRole("combobox", { name: "Species" });
    await userEvent.type(input, "p");
    expect(search).not.toHaveBeenCalled();
    await userEvent.type(input, "y");
    await screen.findByRole("listbox");
    expect(search).toHaveBeenLastCalledWith("py", expect.any(AbortSignal));
  });

  it("says so when nothing matches", async () => {
    render(<Harness search={fakeSearch()} />);
    await userEvent.type(screen.getByRole("combobox", { name: "Species" }), "zzz");
    expect(await screen.findByText(/No species match/)).toBeVisible();
    expect(screen.getByRole("combobox", { name: "Species" })).toHaveAttribute("aria-expanded", "false");
  });
});
