import { beforeEach, describe, expect, it, vi } from "vitest";
import { fireEvent, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import {
  transferInputSchema,
  type DirectoryOrganizationDto,
  type TaxonSearchHitDto,
  type TransferInputParsed,
} from "@shared/schemas/transfer";
import { blankTransfer } from "./form-values";
import { TransferForm } from "./transfer-form";

// Invented demo organisations (the demo scenario's names); the species is real (The Reptile Database [published]).
const sender: DirectoryOrganizationDto = {
  id: "00000000-0000-4000-8000-0000000000a1",
  name: "Cinder Ridge Herps",
  kind: "breeder",
  street: "12 Ash Lane",
  city: "Nashville",
  state: "TN",
  zip: "37201",
  contacts: [],
  pending: false,
  listed: false,
};
const receiver: DirectoryOrganizationDto = {
  id: "00000000-0000-4000-8000-0000000000a2",
  name: "Willow Marsh Nature Centre",
  kind: "nature_centre",
  street: "400 Marsh Road",
  city: "Portland",
  state: "OR",
  zip: "97201",
  contacts: [{ id: "00000000-0000-4000-8000-0000000000c1", displayName: "Milo Faraday", email: "milo@example.org" }],
  pending: false,
  listed: true,
};
const boxTurtle: TaxonSearchHitDto = {
  id: "00000000-0000-4000-8000-0000000000b1",
  scientificName: "Terrapene carolina",
  commonName: "Common box turtle",
  venomous: false,
  profileGroup: null,
  rank: "species",
  commonNames: ["Common box turtle"],
  synonyms: [],
  matched: { name: "Terrapene carolina", kind: "scientific" },
};
const search = vi.fn(async () => [boxTurtle]);

function renderForm(onSave: (v: TransferInputParsed) => Promise<unknown>) {
  render(
    <TransferForm
      mode="create"
      defaultValues={blankTransfer({ street: sender.street, city: sender.city, state: sender.state, zip: sender.zip })}
      initialTaxa={{}}
      organizations={[sender, receiver]}
      senderOrganizationId={sender.id}
      onSave={onSave}
      submitLabel="Save the draft"
      search={search}
    />,
  );
}

const STEP_OF = { Boxes: 2, Animals: 3, "Check and save": 4 } as const;
/** Clicks Next and waits for the step's heading (validation before it is asynchronous). */
async function next(label: keyof typeof STEP_OF) {
  await userEvent.click(screen.getByRole("button", { name: `Next: ${label}` }));
  await screen.findByRole("heading", { name: `Step ${STEP_OF[label]} of 4: ${label}` });
}

beforeEach(() => localStorage.clear());

describe("TransferForm", () => {
  it("keeps the user on a step until its fields pass the shared schema", async () => {
    renderForm(vi.fn());
    await userEvent.click(screen.getByRole("button", { name: "Next: Boxes" }));
    // Messages from the shared message map (shared/validation/messages.ts), the same the server answers with.
    expect(await screen.findByText("Purpose: choose one from the list.")).toBeInTheDocument();
    expect(screen.getByText("How it travels: choose one from the list.")).toBeInTheDocument();
    expect(screen.getByRole("heading", { name: /Step 1 of 4/ })).toBeInTheDocument();
  });

  it("produces a transfer the schema accepts, sizes typed in inches stored in mm", async () => {
    const onSave = vi.fn(async () => undefined);
    renderForm(onSave);

    await userEvent.selectOptions(screen.getByLabelText("Receiving organisation"), receiver.id);
    // The destination follows the receiver's address until the sender edits it.
    const goesTo = screen.getByRole("group", { name: "Goes to" });
    expect(within(goesTo).getByLabelText("City")).toHaveValue("Portland");
    await userEvent.selectOptions(screen.getByLabelText("How it travels"), "ground_courier");
    await userEvent.selectOptions(screen.getByLabelText("Purpose"), "education_exhibition");
    fireEvent.change(screen.getByLabelText("Planned departure"), { target: { value: "2030-03-12T08:00" } });
    fireEvent.change(screen.getByLabelText("Expected arrival"), { target: { value: "2030-03-13T10:00" } });
    await next("Boxes");

    // NIST SP 811 [published]: 12 in = 304.8 mm, 8 in = 203.2 mm, 6 in = 152.4 mm, 1 in = 25.4 mm.
    await userEvent.type(screen.getByLabelText("Length (in)"), "12");
    await userEvent.type(screen.getByLabelText("Width (in)"), "8");
    await userEvent.type(screen.getByLabelText("Height (in)"), "6");
    await userEvent.type(screen.getByLabelText("Wall thickness (in)"), "1");
    await next("Animals");

    await userEvent.type(screen.getByRole("combobox", { name: "Species" }), "terr");
    await screen.findByRole("listbox");
    await userEvent.keyboard("{ArrowDown}{Enter}");
    await userEvent.selectOptions(screen.getByLabelText("Origin"), "captive_bred");
    await userEvent.clear(screen.getByLabelText("How many"));
    await userEvent.type(screen.getByLabelText("How many"), "2");
    await next("Check and save");

    expect(screen.getByText("Every animal is in a box, and no box mixes species.")).toBeInTheDocument();
    await userEvent.click(screen.getByRole("button", { name: "Save the draft" }));

    expect(onSave).toHaveBeenCalledTimes(1);
    const saved = (onSave.mock.calls[0] as unknown as [TransferInputParsed])[0];
    expect(transferInputSchema.safeParse(saved).success).toBe(true);
    expect(saved.receiverOrganizationId).toBe(receiver.id);
    expect(saved.destination).toEqual({ street: "400 Marsh Road", city: "Portland", state: "OR", zip: "97201" });
    const box = saved.containers[0]!;
    expect([box.lengthMm, box.widthMm, box.heightMm, box.wallThicknessMm]).toEqual([304.8, 203.2, 152.4, 25.4]);
    expect(saved.animals).toHaveLength(1);
    expect(saved.animals[0]).toMatchObject({
      taxonId: boxTurtle.id,
      count: 2,
      origin: "captive_bred",
      containerKey: box.key,
    });
    // RFC 3339 [published]: the instant carries its offset.
    expect(saved.plannedDepartureAt).toMatch(/^2030-03-12T08:00:00[+-]\d{2}:\d{2}$/);
  });

  it("duplicates an animal line without its identifier", async () => {
    renderForm(vi.fn());
    // Skip ahead through the steps is not allowed on a new transfer, so fill just enough.
    await userEvent.selectOptions(screen.getByLabelText("Receiving organisation"), receiver.id);
    await userEvent.selectOptions(screen.getByLabelText("How it travels"), "hand_delivery");
    await userEvent.selectOptions(screen.getByLabelText("Purpose"), "breeding");
    fireEvent.change(screen.getByLabelText("Planned departure"), { target: { value: "2030-03-12T08:00" } });
    fireEvent.change(screen.getByLabelText("Expected arrival"), { target: { value: "2030-03-12T18:00" } });
    await next("Boxes");
    for (const [label, value] of [
      ["Length (in)", "10"],
      ["Width (in)", "10"],
      ["Height (in)", "10"],
      ["Wall thickness (in)", "1"],
    ]) {
      await userEvent.type(screen.getByLabelText(label!), value!);
    }
    await next("Animals");
    await userEvent.click(screen.getByRole("button", { name: "Add identifier, size, weight…" }));
    await userEvent.type(screen.getByLabelText("Identifier (optional)"), "985112000123456");
    await userEvent.selectOptions(screen.getByLabelText("Kind of identifier"), "microchip");
    await userEvent.click(screen.getByRole("button", { name: "Duplicate line" }));

    const lines = screen.getAllByRole("group", { name: /Animal line/ });
    expect(lines).toHaveLength(2);
    // [practice] a microchip number belongs to one animal, so the copy starts without it.
    expect(within(lines[0]!).getByLabelText("Identifier (optional)")).toHaveValue("985112000123456");
    expect(within(lines[1]!).getByLabelText("Identifier (optional)")).toHaveValue("");
    expect(within(lines[1]!).getByLabelText("Kind of identifier")).toHaveValue("microchip");
  });

  it("says a limit in the units the field shows: 99 in of wall is over 7.9 in, not 200 mm", async () => {
    renderForm(vi.fn());
    await userEvent.selectOptions(screen.getByLabelText("Receiving organisation"), receiver.id);
    await userEvent.selectOptions(screen.getByLabelText("How it travels"), "hand_delivery");
    await userEvent.selectOptions(screen.getByLabelText("Purpose"), "breeding");
    fireEvent.change(screen.getByLabelText("Planned departure"), { target: { value: "2030-03-12T08:00" } });
    fireEvent.change(screen.getByLabelText("Expected arrival"), { target: { value: "2030-03-12T18:00" } });
    await next("Boxes");
    for (const [label, value] of [
      ["Length (in)", "10"],
      ["Width (in)", "10"],
      ["Height (in)", "10"],
      ["Wall thickness (in)", "99"],
    ]) {
      await userEvent.type(screen.getByLabelText(label!), value!);
    }
    await userEvent.click(screen.getByRole("button", { name: "Next: Animals" }));
    // NIST SP 811 B.8 [published]: the limit of 200 mm is 7.874 in, shown to one decimal.
    expect(await screen.findByText("Box 1 wall thickness: use at most 7.9 in.")).toBeInTheDocument();
    expect(screen.queryByText(/200 mm/)).not.toBeInTheDocument();
    expect(screen.getByRole("heading", { name: /Step 2 of 4/ })).toBeInTheDocument();
  });
});
