import { describe, expect, it } from "vitest";
import { ADVICE_CODES, adviceMessage, classifyAmbientF, guidelineCall, verdictOf } from "./advice";
import { GUIDELINE_BANDS_F } from "./profiles";

const reptile = GUIDELINE_BANDS_F.reptile;
const amphibian = GUIDELINE_BANDS_F.amphibian;

describe("classifyAmbientF at the band edges", () => {
  // Every expectation below is a row edge of the SOURCES.md table, REPTILES magazine,
  // "How to ship your reptiles, amphibians, fish and invertebrates" [practice]:
  // <38 no | 38–59 heat | 60–69 heat (reptiles) / none (amphibians) | 70–79 none |
  // 80–91 none (reptiles) / cold pack (amphibians) | 92–95 hold | >95 no
  it.each([
    [37.9, "do_not_ship_cold", "do_not_ship_cold"],
    [38, "heat_pack", "heat_pack"],
    [59.9, "heat_pack", "heat_pack"],
    [60, "heat_pack", "none"],
    [69.9, "heat_pack", "none"],
    [70, "none", "none"],
    [79.9, "none", "none"],
    [80, "none", "cold_pack"],
    [91.9, "none", "cold_pack"],
    [92, "hold", "hold"],
    [95, "hold", "hold"],
    [95.1, "do_not_ship_hot", "do_not_ship_hot"],
  ] as const)("%s °F → reptiles %s, amphibians %s", (tempF, forReptiles, forAmphibians) => {
    expect(classifyAmbientF(tempF, reptile)).toBe(forReptiles);
    expect(classifyAmbientF(tempF, amphibian)).toBe(forAmphibians);
  });
});

describe("guidelineCall", () => {
  it("lets a do-not-ship band anywhere on the route win", () => {
    // SOURCES.md: daytime highs at origin, destination and hubs all count [practice]
    expect(guidelineCall(36, 75, reptile)).toEqual({ gate: "do_not_ship" });
    expect(guidelineCall(70, 96, reptile)).toEqual({ gate: "do_not_ship" });
    expect(guidelineCall(50, 93, amphibian)).toEqual({ gate: "hold" });
  });

  it("names the pack of the band, or leaves a split route to the model", () => {
    expect(guidelineCall(45, 65, reptile)).toEqual({ gate: "pack", pack: "heat" });
    expect(guidelineCall(72, 85, amphibian)).toEqual({ gate: "pack", pack: "cold" });
    expect(guidelineCall(50, 85, amphibian)).toEqual({ gate: "pack", pack: "either" });
    expect(guidelineCall(72, 88, reptile)).toEqual({ gate: "pack", pack: "none" });
  });
});

describe("advice vocabulary", () => {
  it("maps every advice to a verdict and a sentence", () => {
    expect(verdictOf("ship_as_planned")).toBe("ship");
    expect(verdictOf("add_heat_pack")).toBe("pack");
    expect(verdictOf("hold_at_staffed_facility")).toBe("hold");
    expect(verdictOf("postpone")).toBe("do_not_ship");
    expect(verdictOf("retry_when_forecast_available")).toBe("forecast_unavailable");
    for (const code of ADVICE_CODES) expect(adviceMessage(code, "heat_40h").length).toBeGreaterThan(10);
    // heat packs must never touch an animal's container (SOURCES.md) [practice]
    expect(adviceMessage("add_heat_pack", "heat_72h")).toMatch(/72 h.*away from/);
  });
});
