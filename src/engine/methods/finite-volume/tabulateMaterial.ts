// The material resampled on a uniform temperature grid for O(1) look-ups inside the step loop:
// k(T) and C(T) = rho(T) cp(T) piecewise linear between grid temperatures, and the volumetric enthalpy
// e(T) = integral of C dT, integrated exactly from that piecewise-linear C (so de/dT = C holds exactly and a
// Newton iteration on e converges quadratically). The enthalpy form conserves energy through any cp peak:
// Voller and Swaminathan, General source-based method for solidification phase change, Numer. Heat Transfer B 19 (1991) (from memory).
// Validity: between lowK and highK; beyond them k and C are held at their end values (e extended linearly).
// Error against the plan's tables: at most (step/4) x the jump in slope, in the grid interval holding a table row
// (the chord of a kinked line; step <= STEP_TARGET_K).
import type { MaterialModel } from '../../properties/materialModel';

/** Spacing of the resampling grid, K: fine against any cp peak a plan can hold. */
const STEP_TARGET_K = 0.5;
const MAX_INTERVALS = 4096;

export interface MaterialTable {
  lowK: number;
  stepK: number;
  intervals: number;
  conductivityWPerMK: Float64Array;
  heatCapacityJPerM3K: Float64Array;
  /** e at the grid temperatures, J/m³, zero at lowK. */
  enthalpyJPerM3: Float64Array;
  /** Slopes of k and C on each interval (index j: from grid temperature j to j + 1), for look-ups without differences. */
  conductivitySlopeWPerMK2: Float64Array;
  heatCapacitySlopeJPerM3K2: Float64Array;
}

export function tabulateMaterial(material: MaterialModel, lowK: number, highK: number): MaterialTable {
  const constant = material.isConstant;
  const span = Math.max(highK - lowK, 1);
  const intervals = constant ? 1 : Math.min(MAX_INTERVALS, Math.max(16, Math.ceil(span / STEP_TARGET_K)));
  const stepK = span / intervals;
  const k = new Float64Array(intervals + 1);
  const c = new Float64Array(intervals + 1);
  const e = new Float64Array(intervals + 1);
  for (let j = 0; j <= intervals; j++) {
    const t = lowK + j * stepK;
    k[j] = material.conductivity.at(t);
    c[j] = material.volumetricHeatCapacity(t);
    // Trapezoid rule: exact for the piecewise-linear C between grid temperatures.
    if (j > 0) e[j] = e[j - 1] + 0.5 * stepK * (c[j - 1] + c[j]);
  }
  const dk = new Float64Array(intervals);
  const dc = new Float64Array(intervals);
  for (let j = 0; j < intervals; j++) {
    dk[j] = (k[j + 1] - k[j]) / stepK;
    dc[j] = (c[j + 1] - c[j]) / stepK;
  }
  return { lowK, stepK, intervals, conductivityWPerMK: k, heatCapacityJPerM3K: c, enthalpyJPerM3: e, conductivitySlopeWPerMK2: dk, heatCapacitySlopeJPerM3K2: dc };
}

/**
 * Evaluates k, C and e at `count` temperatures into the given arrays (no allocation).
 */
export function evaluateMaterial(
  table: MaterialTable,
  temperaturesK: Float64Array,
  count: number,
  k: Float64Array,
  c: Float64Array,
  e: Float64Array,
): void {
  const { lowK, stepK, intervals, conductivityWPerMK: kt, heatCapacityJPerM3K: ct, enthalpyJPerM3: et } = table;
  const inv = 1 / stepK;
  const highK = lowK + intervals * stepK;
  for (let i = 0; i < count; i++) {
    const t = temperaturesK[i];
    if (t <= lowK) {
      k[i] = kt[0];
      c[i] = ct[0];
      e[i] = ct[0] * (t - lowK);
    } else if (t >= highK) {
      k[i] = kt[intervals];
      c[i] = ct[intervals];
      e[i] = et[intervals] + ct[intervals] * (t - highK);
    } else {
      let j = Math.floor((t - lowK) * inv);
      if (j >= intervals) j = intervals - 1;
      const s = t - (lowK + j * stepK);
      const slopeK = (kt[j + 1] - kt[j]) * inv;
      const slopeC = (ct[j + 1] - ct[j]) * inv;
      k[i] = kt[j] + slopeK * s;
      c[i] = ct[j] + slopeC * s;
      // e = e_j + C_j s + slope s²/2: the exact integral of the linear C on the interval.
      e[i] = et[j] + s * (ct[j] + 0.5 * slopeC * s);
    }
  }
}
