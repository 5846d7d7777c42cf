import { describe, expect, it } from "vitest";
import { diffTransferDocuments, topLevelField, type EditableDocument } from "./diff";

const labels = {
  container: (c: Record<string, unknown>) => String(c.label),
  animal: (a: Record<string, unknown>) => String(a.name),
};

const base = (): EditableDocument => ({
  mode: "ground_courier",
  origin: { city: "Knoxville", zip: "37917" },
  containers: [{ id: "c1", label: "Box A", pack: "none" }],
  animals: [{ id: "a1", name: "Pantherophis guttatus", count: 3 }],
});

// 21 CFR 11.10(e): changes shall not obscure previously recorded information — every edit
// keeps the old value beside the new one [published, used as a model].
describe("diffTransferDocuments", () => {
  it("finds nothing between equal versions", () => {
    expect(diffTransferDocuments(base(), base(), labels)).toEqual([]);
  });
  it("keeps old and new values of scalars and nested fields", () => {
    const after = { ...base(), mode: "overnight_air", origin: { city: "Knoxville", zip: "37919" } };
    expect(diffTransferDocuments(base(), after, labels)).toEqual([
      { field: "mode", oldValue: "ground_courier", newValue: "overnight_air" },
      { field: "origin.zip", oldValue: "37917", newValue: "37919" },
    ]);
  });
  it("shows added, removed and changed lines", () => {
    const after = {
      ...base(),
      containers: [{ id: "c2", label: "Box B", pack: "heat_40h" }],
      animals: [{ id: "a1", name: "Pantherophis guttatus", count: 2 }],
    };
    const d = diffTransferDocuments(base(), after, labels);
    expect(d).toContainEqual({
      field: "containers[Box A]",
      oldValue: { id: "c1", label: "Box A", pack: "none" },
      newValue: null,
    });
    expect(d).toContainEqual({
      field: "containers[Box B]",
      oldValue: null,
      newValue: { id: "c2", label: "Box B", pack: "heat_40h" },
    });
    expect(d).toContainEqual({ field: "animals[Pantherophis guttatus].count", oldValue: 3, newValue: 2 });
    expect(d.map((c) => topLevelField(c.field))).toEqual(["containers", "containers", "animals"]);
  });
});
