// One implicit time step of transient conduction on a 2-D or 3-D tensor grid, split by directions.
// Method: the Douglas alternating-direction scheme on the Crank-Nicolson base,
//   (VC/dt - L1/2) d1 = sum_d F_d(u);  (VC/dt - Ld/2) dd = (VC/dt) d(d-1);  u' = u + dD,
// Douglas, Numer. Math. 4 (1962) 41 and Douglas and Gunn, Numer. Math. 6 (1964) 428 (from memory):
// unconditionally stable for constant coefficients, second order in time and space.
// Every split stage is a sum of face fluxes, so the heat through the surface equals the change of
// stored energy to rounding. The capacity is the enthalpy chord (e(u') - e(u))/(u' - u); k (the mean of
// its values at both ends of the step), h(Ts) and radiation are re-linearised about the new iterate until it moves
// less than picardToleranceK (the caller sets it well below the reported tolerance): the modified Picard iteration of Celia, Bouloutas and Zarba,
// Water Resour. Res. 26 (1990) 1483, which conserves the integral exactly at convergence (from memory).
// Convergence: a step that has not converged in PICARD_MAX_ITERATIONS is reported so the caller
// shortens it. Lines are solved in place along their stride by the Thomas algorithm (the recurrences of
// numerics/solveTridiagonal, which works on contiguous arrays; gathering each line cost a third of the step); a later
// split stage reads the previous one's result on its own line before overwriting it, so no pass forms its right-hand
// side. k, C and e at the start of a step are looked up once per field: the retries of a step and the rate at the
// same field share them (the oil benchmark's start look-ups fell from 1104 to 505).
import type { SurfaceBoundary } from '../../properties/surfaceBoundary';
import { evaluateMaterial, type MaterialTable } from '../finite-volume/tabulateMaterial';
import type { FiniteGrid } from './finiteGrid';

/** An iteration that has not settled by then is cycling (at a kink of an h table): the caller halves the step. */
const PICARD_MAX_ITERATIONS = 8;
/** Below this change the chord capacity is the mean of C at both ends (the enthalpy difference would lose digits). */
const CHORD_MIN_CHANGE_K = 1e-4;

/** Face area over spacing times the harmonic mean of the node conductivities: Patankar (1980), Eq. 4.9 (from memory). */
function faceConductance(areaPerSpacingM: number, kaWPerMK: number, kbWPerMK: number): number {
  return (areaPerSpacingM * 2 * kaWPerMK * kbWPerMK) / (kaWPerMK + kbWPerMK);
}

export interface AdiStepResult {
  /** Heat through the cooled surface over the step, J, on the solved part (positive when the part loses heat). */
  heatOutJ: number;
  /** Largest |u' - u| over the nodes, K. */
  maxChangeK: number;
  iterations: number;
  converged: boolean;
}

export interface DouglasAdiStepper {
  /**
   * Advances u by dtS seconds into out (u is not changed), the Picard iteration starting from firstIterate when given
   * (else from u plus the last converged step's rate of change times dtS).
   */
  step(u: Float64Array, dtS: number, out: Float64Array, firstIterate?: Float64Array): AdiStepResult;
  /** du/dt of the semi-discrete equations at the field u, K/s, into out: the slopes for cubic Hermite sampling. */
  rate(u: Float64Array, out: Float64Array): void;
}

export function douglasAdiStepper(grid: FiniteGrid, table: MaterialTable, constantProperties: boolean, boundary: SurfaceBoundary, picardToleranceK: number): DouglasAdiStepper {
  const { size, counts, strides, volumeM3, faceAreaPerSpacingM, surfaceAreaM2, lineStarts } = grid;
  const dims = counts.length;
  // Nothing depends on the iterate when k, rho*cp and h are constant and there is no radiation.
  const linear = constantProperties && boundary.hIsConstant && boundary.radiation === null;
  // Surface nodes and their cooled area over all faces (the rim's is on two).
  const surfaceNodes: number[] = [];
  const cooledAreaM2 = new Float64Array(size);
  for (let p = 0; p < size; p++) {
    for (const a of surfaceAreaM2) cooledAreaM2[p] += a[p];
    if (cooledAreaM2[p] > 0) surfaceNodes.push(p);
  }
  const uStar = new Float64Array(size);
  // First iterate when the caller gives none: u plus the last converged step's rate of change (none at first) times the step.
  const rateKPerS = new Float64Array(size);
  const k = new Float64Array(size);
  // k, C and e at the start of the step, and the field they were looked up at (a step and its retries, and the
  // rate at the same field, share them).
  const k0 = new Float64Array(size);
  const c0 = new Float64Array(size);
  const e0 = new Float64Array(size);
  const startField = new Float64Array(size);
  let startKnown = false;
  const kStar = new Float64Array(size);
  const cStar = new Float64Array(size);
  const eStar = new Float64Array(size);
  const capPerDt = new Float64Array(size);
  const qStar = new Float64Array(size);
  const qSlope = new Float64Array(size);
  const rhs = new Float64Array(size);
  const delta = new Float64Array(size);
  const faceG = faceAreaPerSpacingM.map(() => new Float64Array(size));
  const maxLine = Math.max(...counts);
  const work = new Float64Array(maxLine);

  const lookUpStart = (u: Float64Array) => {
    if (startKnown) {
      let same = true;
      for (let p = 0; p < size && same; p++) same = u[p] === startField[p];
      if (same) return;
    }
    evaluateMaterial(table, u, size, k0, c0, e0);
    startField.set(u);
    startKnown = true;
  };

  /** Face conductances of every axis at the node conductivities kW into faceG, and the flows they carry at u added to out. */
  const addFaceFlows = (kW: Float64Array, u: Float64Array, out: Float64Array) => {
    for (let d = 0; d < dims; d++) {
      const n = counts[d];
      const s = strides[d];
      const face = faceAreaPerSpacingM[d];
      const g = faceG[d];
      const starts = lineStarts[d];
      for (let l = 0; l < starts.length; l++) {
        let p = starts[l];
        for (let i = 0; i < n - 1; i++) {
          const conductance = faceConductance(face[p], kW[p], kW[p + s]);
          g[p] = conductance;
          const flow = conductance * (u[p + s] - u[p]);
          out[p] += flow;
          out[p + s] -= flow;
          p += s;
        }
      }
    }
  };

  /**
   * Solves (capPerDt - L_d/2) x = b along every line of axis d into delta, with b = rhs for the first axis and
   * b = capPerDt delta (the previous split stage, read before it is overwritten on the same line) for the others;
   * returns the sum over the d-surface of S q' x.
   */
  const sweep = (d: number): number => {
    const n = counts[d];
    const s = strides[d];
    const g = faceG[d];
    const area = surfaceAreaM2[d];
    const fromRhs = d === 0;
    let surfaceSum = 0;
    const starts = lineStarts[d];
    for (let l = 0; l < starts.length; l++) {
      // Thomas algorithm along the strided line (the shared solver's recurrences, Press et al. Sec. 2.4), the
      // surface node (the only one with a surface term) after the loop.
      let p = starts[l];
      let halfPrevG = 0;
      let prevW = 0;
      let prevX = 0;
      for (let i = 0; i < n - 1; i++) {
        const halfNextG = 0.5 * g[p];
        const inv = 1 / (capPerDt[p] + halfPrevG + halfNextG - halfPrevG * prevW);
        const b = fromRhs ? rhs[p] : capPerDt[p] * delta[p];
        prevW = halfNextG * inv;
        prevX = (b + halfPrevG * prevX) * inv;
        work[i] = prevW;
        delta[p] = prevX;
        halfPrevG = halfNextG;
        p += s;
      }
      const slope = area[p] * qSlope[p];
      const b = fromRhs ? rhs[p] : capPerDt[p] * delta[p];
      let x = (b + halfPrevG * prevX) / (capPerDt[p] + halfPrevG + 0.5 * slope - halfPrevG * prevW);
      delta[p] = x;
      surfaceSum += slope * x;
      for (let i = n - 2; i >= 0; i--) {
        p -= s;
        x = delta[p] + work[i] * x;
        delta[p] = x;
      }
    }
    return surfaceSum;
  };

  return {
    rate(u, out) {
      // V C(u) du/dt = sum of face flows - surface flux (Patankar, Numerical Heat Transfer and Fluid Flow, 1980, Sec. 4.2 (from memory)).
      lookUpStart(u);
      out.fill(0);
      addFaceFlows(k0, u, out);
      for (const p of surfaceNodes) out[p] -= cooledAreaM2[p] * boundary.fluxOut(u[p]);
      for (let p = 0; p < size; p++) out[p] /= volumeM3[p] * c0[p];
    },
    step(u, dtS, out, firstIterate) {
      lookUpStart(u);
      const perDt = 1 / dtS;
      if (firstIterate) uStar.set(firstIterate);
      else for (let p = 0; p < size; p++) uStar[p] = u[p] + rateKPerS[p] * dtS;
      if (constantProperties) {
        k.set(k0);
        for (let p = 0; p < size; p++) capPerDt[p] = volumeM3[p] * c0[p] * perDt;
      }
      let iterations = 0;
      let converged = false;
      let heatOutJ = 0;
      while (iterations < PICARD_MAX_ITERATIONS) {
        iterations++;
        if (!constantProperties) {
          evaluateMaterial(table, uStar, size, kStar, cStar, eStar);
          for (let p = 0; p < size; p++) {
            // k over the step by the trapezoid rule (second order, like the Crank-Nicolson base).
            k[p] = 0.5 * (k0[p] + kStar[p]);
            const change = uStar[p] - u[p];
            const chord = Math.abs(change) < CHORD_MIN_CHANGE_K ? 0.5 * (c0[p] + cStar[p]) : (eStar[p] - e0[p]) / change;
            capPerDt[p] = volumeM3[p] * chord * perDt;
          }
        }
        // Explicit residual sum_d F_d(u), the surface flux linearised about the iterate.
        rhs.fill(0);
        addFaceFlows(k, u, rhs);
        let surfaceOut = 0;
        for (const p of surfaceNodes) {
          const ts = uStar[p];
          qStar[p] = boundary.fluxOut(ts);
          qSlope[p] = boundary.fluxOutDerivative(ts);
          const q = cooledAreaM2[p] * (qStar[p] + qSlope[p] * (u[p] - ts));
          rhs[p] -= q;
          surfaceOut += q;
        }
        // Split stages; each adds half the change of its implicit surface flux to the heat out.
        let slopeSum = 0;
        for (let d = 0; d < dims; d++) slopeSum += sweep(d);
        heatOutJ = dtS * (surfaceOut + 0.5 * slopeSum);
        let moved = 0;
        for (let p = 0; p < size; p++) {
          const next = u[p] + delta[p];
          const m = Math.abs(next - uStar[p]);
          if (m > moved) moved = m;
          uStar[p] = next;
        }
        if (linear || moved < picardToleranceK) {
          converged = true;
          break;
        }
      }
      let maxChangeK = 0;
      for (let p = 0; p < size; p++) {
        out[p] = uStar[p];
        const c = uStar[p] - u[p];
        if (converged) rateKPerS[p] = c * perDt;
        if (Math.abs(c) > maxChangeK) maxChangeK = Math.abs(c);
      }
      return { heatOutJ, maxChangeK, iterations, converged };
    },
  };
}
