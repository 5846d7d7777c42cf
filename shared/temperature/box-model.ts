import type { PackKind, WallMaterial } from "../constants";

/**
 * Lumped-capacitance model of an insulated shipping box:
 *   C · dT_in/dt = (T_out − T_in) / R + P(t)
 * R: outside air film in series with the wall; C: the contents as water; P: a heat pack's
 * output, or the heat a cold pack draws while its ice warms and melts. SI units inside
 * (°C, W, J, s); the assessment converts to °F at its edge.
 */

/** Thermal conductivity of the box wall, W/(m·K). */
export const WALL_CONDUCTIVITY_W_PER_MK: Readonly<Record<WallMaterial, number>> = {
  // ASTM C578 Type I EPS, 0.26 BTU·in/(h·ft²·°F) = 0.0375 W/(m·K) at 75 °F: the top of the
  // EN 12667 range 0.032–0.038, so the model errs toward faster change [published, secondary]
  eps: 0.0375,
  // Čekon et al. 2017 (J. Renew. Mater. 5 suppl. 1) measured 0.05–0.12 W/(m·K); midpoint [published]
  corrugated: 0.085,
};

/**
 * Outside film coefficient, W/(m²·K): still air around a parcel, free convection plus
 * radiation; free convection of gases spans 2–25 W/(m²·K) (Çengel, Heat Transfer, Table 1-5)
 * [memory]. No inside film: the contents are packed against the walls, and leaving it out
 * errs toward faster change.
 */
export const OUTSIDE_FILM_W_PER_M2K = 10;

/** Specific heat of liquid water, J/(kg·K) (handbook tables) [published]. */
export const WATER_SPECIFIC_HEAT_J_PER_KGK = 4186;
/** Specific heat of ice, J/(kg·K) (handbook tables) [published]. */
export const ICE_SPECIFIC_HEAT_J_PER_KGK = 2100;
/** Latent heat of fusion of ice, J/kg (NIST) [published, secondary]. */
export const ICE_LATENT_HEAT_J_PER_KG = 333_550;

/** The box as the sender describes it. `contentsG` is the water-equivalent mass of what is inside. */
export type BoxSpec = {
  wall: WallMaterial;
  wallThicknessMm: number;
  lengthMm: number;
  widthMm: number;
  heightMm: number;
  contentsG: number;
  pack: PackKind;
};

/** An air-activated heat pack: warms up, then its output falls linearly to zero at its rated life. */
export type HeatPackSpec = { kind: "heat"; ratedH: number; peakW: number; warmUpH: number };
/** A frozen gel pack: ice at `startC`, exchanging heat with the interior through its wrapping. */
export type ColdPackSpec = { kind: "cold"; iceKg: number; startC: number; conductanceWPerK: number };
export type PackSpec = { kind: "none" } | HeatPackSpec | ColdPackSpec;

/**
 * Default packs. Heat packs: rated lives of 40 h and 72 h as sold for shipping [practice]; the
 * peaks (4 W and 3 W, means about half) are estimates from iron-oxidation warmers of this size,
 * to be calibrated against box loggers [memory]. Cold pack: a 1 lb (0.45 kg) gel pack from a
 * −18 °C (0 °F) freezer [practice], wrapped so it exchanges 0.3 W/K with the interior
 * (≈ 0.06 m² of face at ≈ 5 W/(m²·K)) [memory].
 */
export const PACK_SPECS: Readonly<Record<PackKind, PackSpec>> = {
  none: { kind: "none" },
  heat_40h: { kind: "heat", ratedH: 40, peakW: 4, warmUpH: 1 },
  heat_72h: { kind: "heat", ratedH: 72, peakW: 3, warmUpH: 1 },
  cold: { kind: "cold", iceKg: 0.45, startC: -18, conductanceWPerK: 0.3 },
};

const S_PER_H = 3600;

/** Area of the wall's mid-plane (outside dimensions less one wall thickness), m². */
export function wallAreaM2(box: Pick<BoxSpec, "lengthMm" | "widthMm" | "heightMm" | "wallThicknessMm">): number {
  const [l, w, h] = [box.lengthMm, box.widthMm, box.heightMm].map((d) => (d - box.wallThicknessMm) / 1000) as [
    number,
    number,
    number,
  ];
  return 2 * (l * w + l * h + w * h);
}

/** Series resistance of the outside film and a plane wall, K/W: 1/(h·A) + L/(k·A). */
export function thermalResistanceKPerW(input: {
  areaM2: number;
  outsideFilmWPerM2K: number;
  wallThicknessM: number;
  conductivityWPerMK: number;
}): number {
  const { areaM2, outsideFilmWPerM2K, wallThicknessM, conductivityWPerMK } = input;
  return 1 / (outsideFilmWPerM2K * areaM2) + wallThicknessM / (conductivityWPerMK * areaM2);
}

/** Heat capacity of the contents taken as water, J/K. */
export function contentsCapacitanceJPerK(contentsG: number): number {
  return (contentsG / 1000) * WATER_SPECIFIC_HEAT_J_PER_KGK;
}

export type BoxThermal = { areaM2: number; resistanceKPerW: number; capacitanceJPerK: number };

/** R (K/W) and C (J/K) of a box. Throws RangeError when the walls leave no room inside. */
export function boxThermal(box: BoxSpec, outsideFilmWPerM2K: number = OUTSIDE_FILM_W_PER_M2K): BoxThermal {
  const smallestMm = Math.min(box.lengthMm, box.widthMm, box.heightMm);
  if (!(box.wallThicknessMm > 0) || !(smallestMm > 2 * box.wallThicknessMm)) {
    throw new RangeError("each box dimension must exceed twice the wall thickness");
  }
  if (!(box.contentsG > 0)) throw new RangeError("contentsG must be positive");
  const areaM2 = wallAreaM2(box);
  return {
    areaM2,
    resistanceKPerW: thermalResistanceKPerW({
      areaM2,
      outsideFilmWPerM2K,
      wallThicknessM: box.wallThicknessMm / 1000,
      conductivityWPerMK: WALL_CONDUCTIVITY_W_PER_MK[box.wall],
    }),
    capacitanceJPerK: contentsCapacitanceJPerK(box.contentsG),
  };
}

/** Output of a heat pack `elapsedS` after opening, W: a linear warm-up, then a linear fall to zero. */
export function heatPackPowerW(pack: HeatPackSpec, elapsedS: number): number {
  const ratedS = pack.ratedH * S_PER_H;
  if (elapsedS <= 0 || elapsedS >= ratedS) return 0;
  const warmUp = pack.warmUpH > 0 ? Math.min(1, elapsedS / (pack.warmUpH * S_PER_H)) : 1;
  return pack.peakW * warmUp * (1 - elapsedS / ratedS);
}

/** Enthalpy bookkeeping of a cold pack, measured from ice at its start temperature. */
class IceState {
  private readonly sensibleJ: number;
  private readonly meltedJ: number;
  absorbedJ = 0;

  constructor(private readonly pack: ColdPackSpec) {
    this.sensibleJ = pack.iceKg * ICE_SPECIFIC_HEAT_J_PER_KGK * -pack.startC;
    this.meltedJ = this.sensibleJ + pack.iceKg * ICE_LATENT_HEAT_J_PER_KG;
  }

  get tempC(): number {
    if (this.absorbedJ < this.sensibleJ)
      return this.pack.startC + this.absorbedJ / (this.pack.iceKg * ICE_SPECIFIC_HEAT_J_PER_KGK);
    if (this.absorbedJ < this.meltedJ) return 0;
    return (this.absorbedJ - this.meltedJ) / (this.pack.iceKg * WATER_SPECIFIC_HEAT_J_PER_KGK);
  }

  /** Adds heat; returns the fraction of it taken before the last ice melted, or null if not this time. */
  absorb(heatJ: number): number | null {
    const before = this.absorbedJ;
    this.absorbedJ += heatJ;
    if (before < this.meltedJ && this.absorbedJ >= this.meltedJ && heatJ > 0) return (this.meltedJ - before) / heatJ;
    return null;
  }
}

export type SimulationInput = {
  resistanceKPerW: number;
  capacitanceJPerK: number;
  initialInsideC: number;
  /** Outside air temperature at `elapsedS` after the start, °C. */
  ambientC: (elapsedS: number) => number;
  durationS: number;
  pack: PackSpec;
  /** Integration step, s (default 60). */
  stepS?: number;
  /** Sampling interval of `insideC`, s (default 3600). */
  sampleEveryS?: number;
  /** Safe range for `secondsOutsideRange`, °C. */
  safeRangeC?: { min: number; max: number };
};

export type SimulationResult = {
  /** Inside temperature at 0, sampleEveryS, 2·sampleEveryS … durationS, °C. */
  insideC: number[];
  minC: number;
  maxC: number;
  /** When the inside was coldest and warmest, s after the start. */
  minAtS: number;
  maxAtS: number;
  secondsOutsideRange: number;
  /** When the cold pack's last ice melted, s after the start; null if it lasted (or no cold pack). */
  iceMeltedAtS: number | null;
};

/**
 * Inside temperature of the box over time, °C. Each step solves the interior exactly for the
 * step's mid-point forcing (exponential approach to the step's equilibrium), so it stays stable
 * however small the contents' heat capacity; the heat a cold pack takes is the heat the
 * contents give up in that step, so energy is conserved whatever the step.
 */
export function simulateInterior(input: SimulationInput): SimulationResult {
  const { resistanceKPerW: r, capacitanceJPerK: c, pack, durationS } = input;
  if (!(r > 0) || !(c > 0) || !(durationS >= 0)) throw new RangeError("R, C must be positive and the duration ≥ 0");
  if (pack.kind === "cold" && !(pack.startC <= 0 && pack.iceKg > 0))
    throw new RangeError("a cold pack starts as ice at ≤ 0 °C");
  const sampleEveryS = input.sampleEveryS ?? S_PER_H;
  // The pack's own temperature steps explicitly: stable only for steps under half its time
  // constant (m·c_ice/U, the shorter of its ice and water phases).
  const packTauS = pack.kind === "cold" ? (pack.iceKg * ICE_SPECIFIC_HEAT_J_PER_KGK) / pack.conductanceWPerK : Infinity;
  const stepsPerSample = Math.max(1, Math.ceil(sampleEveryS / Math.min(input.stepS ?? 60, packTauS / 2)));
  const dt = sampleEveryS / stepsPerSample;
  const totalSteps = Math.round(durationS / dt);
  const ice = pack.kind === "cold" ? new IceState(pack) : undefined;
  const conductance = pack.kind === "cold" ? pack.conductanceWPerK : 0;
  const range = input.safeRangeC;

  // The conductances are constant, so the step's decay factor is too: one exp per run.
  const totalConductance = 1 / r + conductance;
  const tau = c / totalConductance;
  const decay = Math.exp(-dt / tau);
  const meanShare = (tau / dt) * (1 - decay);

  let inside = input.initialInsideC;
  const result: SimulationResult = {
    insideC: [inside],
    minC: inside,
    maxC: inside,
    minAtS: 0,
    maxAtS: 0,
    secondsOutsideRange: 0,
    iceMeltedAtS: null,
  };
  for (let step = 0; step < totalSteps; step++) {
    const midS = (step + 0.5) * dt;
    const packC = ice?.tempC ?? 0;
    const heatW = pack.kind === "heat" ? heatPackPowerW(pack, midS) : 0;
    const equilibrium = (input.ambientC(midS) / r + conductance * packC + heatW) / totalConductance;
    const meanInside = equilibrium + (inside - equilibrium) * meanShare;
    inside = equilibrium + (inside - equilibrium) * decay;
    if (ice) {
      const meltShare = ice.absorb(conductance * (meanInside - packC) * dt);
      if (meltShare !== null && result.iceMeltedAtS === null) result.iceMeltedAtS = step * dt + meltShare * dt;
    }
    if (inside < result.minC) [result.minC, result.minAtS] = [inside, (step + 1) * dt];
    if (inside > result.maxC) [result.maxC, result.maxAtS] = [inside, (step + 1) * dt];
    if (range && (inside < range.min || inside > range.max)) result.secondsOutsideRange += dt;
    if ((step + 1) % stepsPerSample === 0) result.insideC.push(inside);
  }
  return result;
}
