import { beforeEach, describe, expect, it } from "vitest";
import { forgetAllWork, forgetWork, keepWork, readKeptWork } from "./kept-work";

beforeEach(() => localStorage.clear());

describe("work kept in the browser", () => {
  it("comes back as it was typed, numbers not filled in yet included", () => {
    const work = { step: 1, values: { lengthMm: Number.NaN, label: "Box 1", notes: "" } };
    expect(keepWork("new-transfer", "user-1", work)).toBe(true);
    const kept = readKeptWork<typeof work>("new-transfer", "user-1");
    expect(kept?.work.values.label).toBe("Box 1");
    expect(Number.isNaN(kept?.work.values.lengthMm)).toBe(true); // JSON alone would give null
  });

  it("belongs to one person", () => {
    keepWork("new-transfer", "user-1", { a: 1 });
    expect(readKeptWork("new-transfer", "user-2")).toBeNull();
  });

  it("is forgotten after two weeks", () => {
    const written = new Date("2027-03-01T12:00:00Z");
    keepWork("new-transfer", "user-1", { a: 1 }, written);
    const day = 24 * 3600_000;
    expect(readKeptWork("new-transfer", "user-1", written.getTime() + 13 * day)).not.toBeNull();
    expect(readKeptWork("new-transfer", "user-1", written.getTime() + 15 * day)).toBeNull();
    expect(readKeptWork("new-transfer", "user-1", written.getTime() + 13 * day)).toBeNull(); // removed, not hidden
  });

  it("is removed for everyone on sign-out, and leaves other settings alone", () => {
    localStorage.setItem("hatchway.units", "metric");
    keepWork("new-transfer", "user-1", { a: 1 });
    keepWork("new-transfer", "user-2", { a: 2 });
    forgetWork("new-transfer", "user-1");
    expect(readKeptWork("new-transfer", "user-1")).toBeNull();
    forgetAllWork();
    expect(readKeptWork("new-transfer", "user-2")).toBeNull();
    expect(localStorage.getItem("hatchway.units")).toBe("metric");
  });

  it("ignores a copy it cannot read", () => {
    localStorage.setItem("hatchway.kept.new-transfer.user-1", "{not json");
    expect(readKeptWork("new-transfer", "user-1")).toBeNull();
  });
});
