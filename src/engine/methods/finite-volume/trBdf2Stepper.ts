// One time step of the finite-volume heat equation  V_i dE_i/dt = F_i(T)  (E = e(T), the volumetric enthalpy)
// by TR-BDF2, gamma = 2 - sqrt(2): a trapezoidal stage to t + gamma h, then a BDF2 stage to t + h.
// Method: Bank, Coughran, Fichtner, Grosse, Rose and Smith, Transient simulation of silicon devices and circuits,
// IEEE Trans. CAD 4 (1985); written as the ESDIRK tableau c = (0, gamma, 1), rows (d, d), (w, w, d), d = gamma/2,
// w = sqrt(2)/4, with the embedded third-order weights ((1-w)/3, (3w+1)/3, d/3): Hosea and Shampine,
// Analysis and implementation of TR-BDF2, Appl. Numer. Math. 20 (1996) (from memory).
// Validity: any step size (L-stable: no oscillation at large Bi or on the first step); second order in time.
// Convergence rule: simplified Newton per stage (the matrix of the predicted state, re-formed when a correction is
// not below NEWTON_CONTRACTION_MAX of the one before; Hairer and Wanner, Solving ODEs II, 2nd ed., Sec. IV.8, from
// memory), from a quadratic predictor, until the enthalpy residual over V C is below newtonTolK (kelvin);
// a stage that does not converge in MAX_NEWTON_ITERATIONS, or a step that leaves a cp peak unresolved, is refused.
// Error: local error estimate h * sum (bhat - b) F, filtered by (V C - d h dF/dT)^-1 as Hosea and Shampine do
// (the factorised matrix of the second stage), in kelvin per node. Both stages are written as enthalpy differences
// equal to weighted sums of the fluxes, and the converged stage enthalpy is set from that balance, so the stored
// energy changes by exactly the heat that crosses the surface (to rounding); T is within newtonTolK of e^-1(e).
// Space: fluxes through faces with the harmonic-mean conductivity 2 k_P k_E / (k_P + k_E),
// Patankar, Numerical Heat Transfer and Fluid Flow, 1980, Eq. 4.9 (from memory).
import type { SurfaceBoundary } from '../../properties/surfaceBoundary';
import { createFactoredTridiagonal, factorTridiagonal, solveFactoredTridiagonal } from './factoredTridiagonal';
import type { VolumeGrid } from './buildVolumeGrid';
import type { MaterialTable } from './tabulateMaterial';

const GAMMA = 2 - Math.SQRT2;
const INV_GAMMA = 1 / GAMMA;
const D = GAMMA / 2;
const W = Math.SQRT2 / 4;
// bhat - b for the three stages: ((1 - 4w)/3, 1/3, -2d/3); they sum to zero.
const ERR_WEIGHT_START = (1 - 4 * W) / 3;
const ERR_WEIGHT_MID = 1 / 3;
const ERR_WEIGHT_END = (-2 * D) / 3;
const MAX_NEWTON_ITERATIONS = 25;
/** Simplified Newton keeps its matrix while each correction is at most this share of the one before. Common practice. */
const NEWTON_CONTRACTION_MAX = 0.2;
/**
 * A step whose enthalpy change differs from the trapezoid of its end capacities by more than this fraction
 * has stepped over a feature of C(T) narrower than the step (a latent-heat peak): it is refused. Common practice.
 */
const CAPACITY_FEATURE_FRACTION = 0.05;

export type StepAttempt = { ok: true; errorK: number } | { ok: false; reason: 'newton' | 'capacity-peak' };

export interface TrBdf2Stepper {
  /** Accepted state: temperatures, net inflow F (W in grid units), capacities C, enthalpies e. */
  readonly temperatureK: Float64Array;
  readonly inflow: Float64Array;
  readonly capacity: Float64Array;
  readonly enthalpy: Float64Array;
  /** Trial temperatures after `attempt`. */
  readonly trialTemperatureK: Float64Array;
  /** Heat out through the surface over the trial step (grid units, J). */
  trialHeatOut(): number;
  /** Sets the accepted state (computes F, C, e). Returns false if the temperatures are not finite. */
  setState(temperatureK: Float64Array): boolean;
  attempt(stepS: number): StepAttempt;
  accept(): void;
}

export function createTrBdf2Stepper(grid: VolumeGrid, table: MaterialTable, boundary: SurfaceBoundary, lowK: number, highK: number, newtonTolK: number): TrBdf2Stepper {
  const n = grid.nodeCount;
  const { volumes: vol, faceAreaOverDistance: geo, surfaceArea } = grid;
  const arr = () => new Float64Array(n);
  let t0 = arr(), f0 = arr(), c0 = arr(), e0 = arr();
  let t1 = arr(), f1 = arr(), c1 = arr(), e1 = arr();
  const tg = arr(), fg = arr(), cg = arr(), eg = arr();
  const lower = arr(), diag = arr(), upper = arr(), rhs = arr(), delta = arr(), explicit = arr();
  const stageMatrix = createFactoredTridiagonal(n);
  const scratchF = arr(), scratchC = arr(), scratchE = arr();
  let q0 = 0, qg = 0, q1 = 0;
  let lastStepS = 0;
  // The state before the accepted one and the step between them, for the stage predictor.
  const tPrev = arr();
  /** dT/dt = F / (V C) of the accepted state, for the predictors (set with the state). */
  const rate0 = arr();
  const setRate0 = () => {
    for (let i = 0; i < n; i++) rate0[i] = (f0[i] * invVol[i]) / c0[i];
  };
  let prevStepS = 0;
  const maxNewtonMoveK = Math.max(highK - lowK, 1);
  // One interval means constant properties: e is linear in T and no capacity peak can be stepped over.
  const capacityVaries = table.intervals > 1;

  const { lowK: tableLowK, stepK: tableStepK, intervals, conductivityWPerMK: kt, heatCapacityJPerM3K: ct, enthalpyJPerM3: et, conductivitySlopeWPerMK2: kSlope, heatCapacitySlopeJPerM3K2: cSlope } = table;
  const tableInvStep = 1 / tableStepK;
  const tableHighK = tableLowK + intervals * tableStepK;
  const invVol = arr();
  for (let i = 0; i < n; i++) invVol[i] = 1 / vol[i];
  /** Set by `evaluate` when asked for the residual: true when some node is not converged (or not finite). */
  let unconverged = false;
  /** Set by `solveStage`: whether the stage factorised its matrix (else stageMatrix belongs to an earlier stage). */
  let stageFactored = false;

  /**
   * F, C, e and (with `jacobian`) the matrix V C - a dF/dT at T into (f, c, e, lower/diag/upper), in one pass over
   * the nodes (each node's k, dk/dT, C, e looked up once on the uniform table). With `residual`, also the Newton residual
   * explicit + a F - V e into rhs and the convergence flag `unconverged`. Returns the surface flux.
   */
  function evaluate(t: Float64Array, f: Float64Array, c: Float64Array, e: Float64Array, a: number, jacobian: boolean, residual: boolean, tolK: number): number {
    let inflowFromLeft = 0;
    // Derivatives of the previous face flow: P = d(phi)/dT_left, Q = d(phi)/dT_right.
    let dLeftPrev = 0;
    let dRightPrev = 0;
    let kPrev = 0, dkPrev = 0, tPrevNode = 0;
    unconverged = false;
    for (let j = 0; j <= n; j++) {
      let kj = 0, dkj = 0, tj = 0;
      if (j < n) {
        tj = t[j];
        // Table look-up as evaluateMaterial, inline.
        if (tj <= tableLowK) {
          kj = kt[0];
          c[j] = ct[0];
          e[j] = ct[0] * (tj - tableLowK);
        } else if (tj >= tableHighK) {
          kj = kt[intervals];
          c[j] = ct[intervals];
          e[j] = et[intervals] + ct[intervals] * (tj - tableHighK);
        } else {
          let m = Math.floor((tj - tableLowK) * tableInvStep);
          if (m >= intervals) m = intervals - 1;
          const sK = tj - (tableLowK + m * tableStepK);
          const slopeC = cSlope[m];
          dkj = kSlope[m];
          kj = kt[m] + dkj * sK;
          c[j] = ct[m] + slopeC * sK;
          // e = e_m + C_m s + slope s²/2: the exact integral of the linear C on the interval.
          e[j] = et[m] + sK * (ct[m] + 0.5 * slopeC * sK);
        }
      }
      if (j === 0) {
        kPrev = kj;
        dkPrev = dkj;
        tPrevNode = tj;
        continue;
      }
      // Node i = j - 1 is complete once the face to its right (i, j) is known (for the last node, the surface).
      const i = j - 1;
      let fi: number;
      if (j < n) {
        const ka = kPrev, kb = kj;
        const inv = 1 / (ka + kb);
        const kf = 2 * ka * kb * inv;
        const g = geo[i];
        const gdt = g * (tPrevNode - tj);
        const phi = gdt * kf;
        fi = inflowFromLeft - phi;
        inflowFromLeft = phi;
        if (jacobian) {
          // d(kf)/d(ka) = 2 kb² / (ka + kb)², d(kf)/d(kb) = 2 ka² / (ka + kb)².
          const inv2 = 2 * gdt * inv * inv;
          const p = g * kf + inv2 * kb * kb * dkPrev;
          const q = -g * kf + inv2 * ka * ka * dkj;
          diag[i] = vol[i] * c[i] - a * (dRightPrev - p);
          upper[i] = a * q;
          lower[i] = -a * dLeftPrev;
          dLeftPrev = p;
          dRightPrev = q;
        }
        kPrev = kj;
        dkPrev = dkj;
        tPrevNode = tj;
      } else {
        const qs = boundary.fluxOut(tPrevNode);
        fi = inflowFromLeft - surfaceArea * qs;
        if (jacobian) {
          diag[i] = vol[i] * c[i] - a * (dRightPrev - surfaceArea * boundary.fluxOutDerivative(tPrevNode));
          lower[i] = -a * dLeftPrev;
        }
        inflowFromLeft = qs; // reused below as the return value
      }
      f[i] = fi;
      if (residual) {
        const r = explicit[i] + a * fi - vol[i] * e[i];
        rhs[i] = r;
        // Scaled by the node's own capacity, not the diagonal: on long steps the conduction terms dominate the
        // diagonal and would hide a residual that still creates or destroys energy. NaN counts as unconverged.
        if (!(Math.abs(r) <= tolK * vol[i] * c[i])) unconverged = true;
      }
    }
    return inflowFromLeft;
  }

  /**
   * Newton for V e(T) - a F(T) = explicit; T holds the guess and gets the solution. Converged when the residual,
   * divided by the node's heat capacity V C (kelvin of stored energy), is below newtonTolK. The stage enthalpy is
   * then set to (explicit + a F) / V, which holds the energy balance exactly whatever the residual; T differs from
   * e^-1(e) by at most newtonTolK (the enthalpy is the carried quantity, T its Newton inverse).
   */
  function solveStage(t: Float64Array, f: Float64Array, c: Float64Array, e: Float64Array, a: number): number | null {
    let factored = false;
    stageFactored = false;
    let lastMove = Infinity;
    for (let iter = 0; iter <= MAX_NEWTON_ITERATIONS; iter++) {
      const qs = evaluate(t, f, c, e, a, !factored, true, newtonTolK);
      if (!Number.isFinite(qs)) return null;
      if (!unconverged) {
        for (let i = 0; i < n; i++) e[i] += rhs[i] * invVol[i];
        return qs;
      }
      if (iter === MAX_NEWTON_ITERATIONS) break;
      // Simplified Newton: the matrix of the first iterate is kept while the corrections shrink fast enough.
      if (!factored) {
        factorTridiagonal(stageMatrix, lower, diag, upper);
        factored = true;
        stageFactored = true;
      }
      solveFactoredTridiagonal(stageMatrix, rhs, delta);
      let move = 0;
      for (let i = 0; i < n; i++) {
        const d = Math.abs(delta[i]);
        if (d > move) move = d;
      }
      if (!(move < Infinity)) return null;
      if (move > NEWTON_CONTRACTION_MAX * lastMove) factored = false;
      lastMove = move;
      const scale = move > maxNewtonMoveK ? maxNewtonMoveK / move : 1;
      for (let i = 0; i < n; i++) t[i] += scale * delta[i];
    }
    return null;
  }

  function peakSkipped(ta: Float64Array, ca: Float64Array, ea: Float64Array, tb: Float64Array, cb: Float64Array, eb: Float64Array): boolean {
    for (let i = 0; i < n; i++) {
      const de = eb[i] - ea[i];
      const trapezoid = 0.5 * (ca[i] + cb[i]) * (tb[i] - ta[i]);
      if (Math.abs(de - trapezoid) > CAPACITY_FEATURE_FRACTION * Math.abs(de) + 1e-12 * Math.abs(ea[i]) + 2 * newtonTolK * (ca[i] + cb[i])) return true;
    }
    return false;
  }

  const stepper: TrBdf2Stepper = {
    get temperatureK() { return t0; },
    get inflow() { return f0; },
    get capacity() { return c0; },
    get enthalpy() { return e0; },
    get trialTemperatureK() { return t1; },
    // Heat out over the trial step: the same weighted sum of surface flows the enthalpy update used.
    trialHeatOut: () => lastStepS * surfaceArea * (W * q0 + W * qg + D * q1),
    setState(temperatureK) {
      t0.set(temperatureK);
      prevStepS = 0;
      q0 = evaluate(t0, f0, c0, e0, 0, false, false, 0);
      for (let i = 0; i < n; i++) if (!Number.isFinite(f0[i])) return false;
      setRate0();
      return Number.isFinite(q0);
    },
    attempt(h) {
      const a = D * h;
      // Stage 1, trapezoid to t + gamma h: V e_g - d h F_g = V e_0 + d h F_0.
      // Predictor: the quadratic with the accepted value and slope F/(V C) at t that passes through the state
      // before it (on the first step from a state: the state itself). Polynomial extrapolation of the past solution
      // as the Newton starting value: Hairer and Wanner, Solving ODEs II, 2nd ed., Sec. IV.8 (from memory).
      const tau = GAMMA * h;
      const history = prevStepS > 0;
      const invPrev2 = history ? 1 / (prevStepS * prevStepS) : 0;
      for (let i = 0; i < n; i++) {
        explicit[i] = vol[i] * e0[i] + a * f0[i];
        let guess = t0[i];
        if (history) {
          const slope = rate0[i];
          const curvature = (tPrev[i] - t0[i] + slope * prevStepS) * invPrev2;
          guess = t0[i] + tau * (slope + curvature * tau);
        }
        tg[i] = guess < lowK ? lowK : guess > highK ? highK : guess;
      }
      const qgNew = solveStage(tg, fg, cg, eg, a);
      if (qgNew === null) return { ok: false, reason: 'newton' };
      // Stage 2, BDF2 to t + h: V e_1 - d h F_1 = V e_0 + w h (F_0 + F_g).
      const wh = W * h, invTau2 = 1 / (tau * tau);
      for (let i = 0; i < n; i++) {
        explicit[i] = vol[i] * e0[i] + wh * (f0[i] + fg[i]);
        // Predictor: the quadratic with the value and slope at t through the first stage (the secant on the
        // first step from a state, where the slope at t can be that of a sudden start).
        let guess: number;
        if (history) {
          const slope = rate0[i];
          const curvature = (tg[i] - t0[i] - slope * tau) * invTau2;
          guess = t0[i] + h * (slope + curvature * h);
        } else guess = t0[i] + (tg[i] - t0[i]) * INV_GAMMA;
        t1[i] = guess < lowK ? lowK : guess > highK ? highK : guess;
      }
      const q1New = solveStage(t1, f1, c1, e1, a);
      if (q1New === null) return { ok: false, reason: 'newton' };
      if (capacityVaries && (peakSkipped(t0, c0, e0, tg, cg, eg) || peakSkipped(tg, cg, eg, t1, c1, e1))) return { ok: false, reason: 'capacity-peak' };
      qg = qgNew;
      q1 = q1New;
      // Embedded error, filtered with the matrix of the last stage (formed here if its predictor needed no Newton step).
      for (let i = 0; i < n; i++) rhs[i] = h * (ERR_WEIGHT_START * f0[i] + ERR_WEIGHT_MID * fg[i] + ERR_WEIGHT_END * f1[i]);
      if (!stageFactored) {
        evaluate(t1, scratchF, scratchC, scratchE, a, true, false, 0);
        factorTridiagonal(stageMatrix, lower, diag, upper);
      }
      solveFactoredTridiagonal(stageMatrix, rhs, delta);
      let errorK = 0;
      for (let i = 0; i < n; i++) {
        const d = Math.abs(delta[i]);
        if (d > errorK) errorK = d;
      }
      lastStepS = h;
      return { ok: true, errorK };
    },
    accept() {
      tPrev.set(t0);
      prevStepS = lastStepS;
      [t0, t1] = [t1, t0];
      [f0, f1] = [f1, f0];
      [c0, c1] = [c1, c0];
      [e0, e1] = [e1, e0];
      q0 = q1;
      setRate0();
    },
  };
  return stepper;
}
