import { describe, expect, it } from "vitest";
import {
  ICE_LATENT_HEAT_J_PER_KG,
  ICE_SPECIFIC_HEAT_J_PER_KGK,
  PACK_SPECS,
  boxThermal,
  heatPackPowerW,
  simulateInterior,
  thermalResistanceKPerW,
  wallAreaM2,
  type BoxSpec,
  type HeatPackSpec,
} from "./box-model";

const styrofoamBox: BoxSpec = {
  wall: "eps",
  wallThicknessMm: 25,
  lengthMm: 300,
  widthMm: 300,
  heightMm: 300,
  contentsG: 800,
  pack: "none",
};

const constant = (tempC: number) => () => tempC;

describe("Çengel, Heat Transfer, Example 4-1 (lumped capacitance)", () => {
  // Sphere D = 1 mm, k = 35 W/(m·K), ρ = 8500 kg/m³, c = 320 J/(kg·K), h = 210 W/(m²·K):
  // Bi ≈ 0.001 and the junction covers 99 % of the initial difference in ≈ 9.94 s [published]
  const diameterM = 0.001;
  const areaM2 = Math.PI * diameterM ** 2;
  const volumeM3 = (Math.PI * diameterM ** 3) / 6;
  const resistanceKPerW = thermalResistanceKPerW({
    areaM2,
    outsideFilmWPerM2K: 210,
    wallThicknessM: 0,
    conductivityWPerMK: 35,
  });
  const capacitanceJPerK = 8500 * volumeM3 * 320;

  it("is a lumped body (Bi = h·Lc/k ≤ 0.1)", () => {
    expect((210 * (volumeM3 / areaM2)) / 35).toBeCloseTo(0.001, 4);
  });

  it("reaches 99 % of the initial difference after 9.94 s", () => {
    const run = simulateInterior({
      resistanceKPerW,
      capacitanceJPerK,
      initialInsideC: 25,
      ambientC: constant(200),
      durationS: 15,
      pack: PACK_SPECS.none,
      stepS: 0.001,
      sampleEveryS: 0.01,
    });
    const remaining = run.insideC.map((t) => (200 - t) / (200 - 25));
    const after = remaining.findIndex((share) => share <= 0.01);
    // crossing time between the two samples that straddle 1 % left
    const [a, b] = [remaining[after - 1]!, remaining[after]!];
    const crossingS = (after - 1 + (a - 0.01) / (a - b)) * 0.01;
    expect(Math.abs(crossingS - 9.94)).toBeLessThan(0.005);
  });
});

describe("box resistance and capacity", () => {
  it("adds the film and wall resistances over the mid-plane area", () => {
    // series resistances 1/(hA) + L/(kA) (Çengel, ch. 3, plane wall) [published]; by hand for a
    // 300 mm cube with 25 mm EPS: A = 6 × 0.275² = 0.45375 m²,
    // R = 1/(10 × 0.45375) + 0.025/(0.0375 × 0.45375) = 0.22039 + 1.46924 K/W
    expect(wallAreaM2(styrofoamBox)).toBeCloseTo(0.45375, 9);
    const thermal = boxThermal(styrofoamBox);
    expect(thermal.resistanceKPerW).toBeCloseTo(0.22039 + 1.46924, 4);
    // C = 0.8 kg × 4.186 kJ/(kg·K) (specific heat of water, handbook tables) [published]
    expect(thermal.capacitanceJPerK).toBeCloseTo(3348.8, 6);
  });

  it("refuses a box whose walls leave no room inside", () => {
    expect(() => boxThermal({ ...styrofoamBox, wallThicknessMm: 150 })).toThrow(RangeError);
    expect(() => boxThermal({ ...styrofoamBox, contentsG: 0 })).toThrow(RangeError);
  });
});

describe("simulateInterior", () => {
  const thermal = boxThermal(styrofoamBox);
  const base = {
    resistanceKPerW: thermal.resistanceKPerW,
    capacitanceJPerK: thermal.capacitanceJPerK,
    initialInsideC: 22,
    pack: PACK_SPECS.none,
  };

  it("approaches a constant outside temperature monotonically, without overshoot", () => {
    // first-order system: T − T∞ = (T0 − T∞)·exp(−t/RC) (Çengel, eq. 4-4) [published]
    const run = simulateInterior({ ...base, ambientC: constant(2), durationS: 24 * 3600 });
    const steps = run.insideC.slice(1).map((t, i) => t - run.insideC[i]!);
    expect(steps.every((d) => d <= 0)).toBe(true);
    expect(run.minC).toBeGreaterThanOrEqual(2);
    const tauS = thermal.resistanceKPerW * thermal.capacitanceJPerK;
    expect(run.insideC[3]! - 2).toBeCloseTo(20 * Math.exp((-3 * 3600) / tauS), 6);
  });

  it("settles at ΔT = P·R above the outside air with a steady heat source", () => {
    // steady state of C·dT/dt = ΔT/R + P: ΔT = P·R (Çengel, thermal resistance network) [published]
    const steady: HeatPackSpec = { kind: "heat", ratedH: 1e9, peakW: 2, warmUpH: 0 };
    const run = simulateInterior({ ...base, ambientC: constant(5), durationS: 72 * 3600, pack: steady });
    expect(run.insideC.at(-1)! - 5).toBeCloseTo(2 * thermal.resistanceKPerW, 4);
  });

  it("changes more slowly behind a thicker wall", () => {
    // R grows with L/(kA), so τ = RC grows (Çengel, ch. 3 and 4) [published]
    const after3h = (wallThicknessMm: number) => {
      const t = boxThermal({ ...styrofoamBox, wallThicknessMm });
      return simulateInterior({ ...base, ...t, ambientC: constant(35), durationS: 3 * 3600 }).insideC.at(-1)!;
    };
    expect(after3h(50)).toBeLessThan(after3h(25));
    expect(after3h(25)).toBeLessThan(after3h(10));
  });

  it("melts the ice after absorbing m·L at a steady draw", () => {
    // latent heat of fusion 333.55 kJ/kg (NIST) [published, secondary]: with the interior held at
    // 20 °C by a huge capacity, 0.45 kg of ice at 0 °C drawing 0.3 W/K × 20 K melts after m·L / 6 W
    const run = simulateInterior({
      resistanceKPerW: 1,
      capacitanceJPerK: 1e15,
      initialInsideC: 20,
      ambientC: constant(20),
      durationS: 30 * 3600,
      pack: { kind: "cold", iceKg: 0.45, startC: 0, conductanceWPerK: 0.3 },
    });
    expect(run.iceMeltedAtS).toBeCloseTo((0.45 * ICE_LATENT_HEAT_J_PER_KG) / 6, -1);
    expect(run.iceMeltedAtS! / 3600).toBeCloseTo(6.949, 2);
  });

  it("warms frozen ice first, at the specific heat of ice", () => {
    // ice at −18 °C warms as a first-order body, τ = m·c_ice/U, until 0 °C:
    // t = τ·ln((20 + 18)/20) (c_ice = 2.10 kJ/(kg·K), handbook tables) [published], then melts as above
    const tauS = (0.45 * ICE_SPECIFIC_HEAT_J_PER_KGK) / 0.3;
    const run = simulateInterior({
      resistanceKPerW: 1,
      capacitanceJPerK: 1e15,
      initialInsideC: 20,
      ambientC: constant(20),
      durationS: 30 * 3600,
      pack: { kind: "cold", iceKg: 0.45, startC: -18, conductanceWPerK: 0.3 },
    });
    const expectedS = tauS * Math.log(38 / 20) + (0.45 * ICE_LATENT_HEAT_J_PER_KG) / 6;
    expect(Math.abs(run.iceMeltedAtS! - expectedS)).toBeLessThan(60);
  });

  it("conserves energy between the contents and a melting pack, whatever the step", () => {
    // closed box (no exchange with the outside): 3 kg of water-equivalent contents at 40 °C and
    // 0.1 kg of ice at 0 °C end at the common temperature of the energy balance
    // C·(40 − T) = m·L + m·c_w·T, with L = 333.55 kJ/kg (NIST) and c_w = 4.186 kJ/(kg·K) [published]
    const capacitanceJPerK = 3 * 4186;
    const expectedC = (capacitanceJPerK * 40 - 0.1 * ICE_LATENT_HEAT_J_PER_KG) / (capacitanceJPerK + 0.1 * 4186);
    const run = simulateInterior({
      resistanceKPerW: 1e12,
      capacitanceJPerK,
      initialInsideC: 40,
      ambientC: constant(40),
      durationS: 48 * 3600,
      pack: { kind: "cold", iceKg: 0.1, startC: 0, conductanceWPerK: 5 },
      stepS: 600,
    });
    expect(expectedC).toBeCloseTo(36.14, 2);
    expect(run.insideC.at(-1)!).toBeCloseTo(expectedC, 2);
    expect(run.iceMeltedAtS).not.toBeNull();
  });

  it("keeps a hot day's box cooler with the default cold pack than without", () => {
    const hot = { ...base, ambientC: constant(33), durationS: 12 * 3600 };
    const withPack = simulateInterior({ ...hot, pack: PACK_SPECS.cold });
    const without = simulateInterior(hot);
    expect(withPack.maxC).toBeLessThan(without.maxC - 3);
  });

  it("counts the time spent outside the safe range", () => {
    // from 22 °C toward 2 °C, the box passes 12 °C at t = τ·ln(20/10) (Çengel, eq. 4-4) [published]
    const tauS = thermal.resistanceKPerW * thermal.capacitanceJPerK;
    const run = simulateInterior({
      ...base,
      ambientC: constant(2),
      durationS: 12 * 3600,
      safeRangeC: { min: 12, max: 30 },
    });
    expect(Math.abs(run.secondsOutsideRange - (12 * 3600 - tauS * Math.log(2)))).toBeLessThanOrEqual(60);
  });
});

describe("heatPackPowerW", () => {
  const pack = PACK_SPECS.heat_40h as HeatPackSpec;

  it("is spent at its rated life and falls after warming up", () => {
    // rated life as sold (40 h) [practice]; a falling output over the life [memory]
    expect(heatPackPowerW(pack, 40 * 3600)).toBe(0);
    expect(heatPackPowerW(pack, 50 * 3600)).toBe(0);
    const outputs = [2, 10, 20, 30, 39].map((h) => heatPackPowerW(pack, h * 3600));
    outputs.slice(1).forEach((w, i) => expect(w).toBeLessThan(outputs[i]!));
    expect(heatPackPowerW(pack, 0.5 * 3600)).toBeLessThan(heatPackPowerW(pack, 1 * 3600));
  });
});
