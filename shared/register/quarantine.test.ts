import { describe, expect, it } from "vitest";
import { quarantineDaysFor } from "./quarantine";

// 30–90 days is common, longer for boas [practice: SOURCES.md, "Records and reports"]; the numbers
// below are a keeper's own settings, invented for the test.
const settings = [
  { name: "Boa", days: 120 },
  { name: "Boa constrictor imperator", days: 150 },
  { name: "Python regius", days: 90 },
];

describe("quarantine length for an arrival", () => {
  it("takes the genus' length for its species, the species' own before it", () => {
    expect(quarantineDaysFor("Boa constrictor", 60, settings)).toBe(120);
    expect(quarantineDaysFor("Boa constrictor imperator", 60, settings)).toBe(150);
    expect(quarantineDaysFor("Python regius", 60, settings)).toBe(90);
  });

  it("takes the species' setting for its subspecies before the genus'", () => {
    expect(quarantineDaysFor("Python regius regius", 60, [...settings, { name: "Python", days: 75 }])).toBe(90);
  });

  it("keeps the organisation's length for everything else, whatever the spelling's case or spaces", () => {
    expect(quarantineDaysFor("Pantherophis guttatus", 60, settings)).toBe(60);
    expect(quarantineDaysFor("  boa   CONSTRICTOR ", 60, settings)).toBe(120);
    expect(quarantineDaysFor("Boaedon fuliginosus", 60, settings)).toBe(60);
  });
});
