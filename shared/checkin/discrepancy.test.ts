import { describe, expect, it } from "vitest";
import { allAccountedFor, computeDiscrepancies, outcomeTotal } from "./discrepancy";

// CITES transport guideline Rp/3 1.72 and 1.82: sick, injured or dead animals found on
// arrival are recorded [published]. The counting itself is arithmetic checked by hand here.
const corn = { taxonId: "t-corn", scientificName: "Pantherophis guttatus" };
const axolotl = { taxonId: "t-axo", scientificName: "Ambystoma mexicanum" };

describe("computeDiscrepancies", () => {
  it("counts by species and sex across lines", () => {
    const rows = computeDiscrepancies(
      [
        { id: "a", ...corn, sex: "female", count: 3 },
        { id: "b", ...corn, sex: "female", count: 2 },
        { id: "c", ...corn, sex: "male", count: 1 },
        { id: "d", ...axolotl, sex: "unknown", count: 4 },
      ],
      [
        { animalId: "a", arrivedWell: 3, arrivedProblem: 0, deadOnArrival: 0, missing: 0 },
        { animalId: "b", arrivedWell: 1, arrivedProblem: 0, deadOnArrival: 1, missing: 0 },
        { animalId: "c", arrivedWell: 0, arrivedProblem: 0, deadOnArrival: 0, missing: 1 },
        { animalId: "d", arrivedWell: 3, arrivedProblem: 1, deadOnArrival: 0, missing: 0 },
      ],
      [{ ...axolotl, sex: "male", count: 1 }],
    );
    expect(rows).toEqual([
      {
        ...axolotl,
        sex: "male",
        expected: 0,
        arrivedWell: 0,
        arrivedProblem: 0,
        deadOnArrival: 0,
        missing: 0,
        extra: 1,
      },
      {
        ...axolotl,
        sex: "unknown",
        expected: 4,
        arrivedWell: 3,
        arrivedProblem: 1,
        deadOnArrival: 0,
        missing: 0,
        extra: 0,
      },
      { ...corn, sex: "male", expected: 1, arrivedWell: 0, arrivedProblem: 0, deadOnArrival: 0, missing: 1, extra: 0 },
      {
        ...corn,
        sex: "female",
        expected: 5,
        arrivedWell: 4,
        arrivedProblem: 0,
        deadOnArrival: 1,
        missing: 0,
        extra: 0,
      },
    ]);
    expect(allAccountedFor(rows)).toBe(false);
  });

  it("a line with no outcome counts as missing", () => {
    const rows = computeDiscrepancies([{ id: "a", ...corn, sex: "male", count: 2 }], [], []);
    expect(rows[0]).toMatchObject({ expected: 2, missing: 2 });
  });

  it("all well and nothing extra is accounted for", () => {
    const rows = computeDiscrepancies(
      [{ id: "a", ...corn, sex: "male", count: 2 }],
      [{ animalId: "a", arrivedWell: 2, arrivedProblem: 0, deadOnArrival: 0, missing: 0 }],
      [],
    );
    expect(allAccountedFor(rows)).toBe(true);
  });

  it("outcome totals add every category", () => {
    expect(outcomeTotal({ animalId: "x", arrivedWell: 1, arrivedProblem: 2, deadOnArrival: 3, missing: 4 })).toBe(10);
  });
});
