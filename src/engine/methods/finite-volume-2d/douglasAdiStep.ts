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
// numerics/solveTridiagonal, which works on contiguous arrays; gathering each line cost a third of the step).
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
  /** Advances u by dtS seconds into out (u is not changed). */
  step(u: Float64Array, dtS: number, out: Float64Array): AdiStepResult;
  /** du/dt of the semi-discrete equations at the field u, K/s, into out: the slopes for cubic Hermite sampling. */
  rate(u: Float64Array, out: Float64Array): void;
}

export function douglasAdiStepper(grid: FiniteGrid, table: MaterialTable, constantProperties: boolean, boundary: SurfaceBoundary, picardToleranceK: number): DouglasAdiStepper {
  const { size, counts, strides, volumeM3, faceAreaPerSpacingM, surfaceAreaM2, lineStarts } = grid;
  const dims = counts.length;
  // Nothing depends on the iterate when k, rho*cp and h are constant and there is no radiation.
  const linear = constantProperties && boundary.hIsConstant && boundary.radiation === null;
  const surfaceNodes: number[] = [];
  for (let p = 0; p < size; p++) if (surfaceAreaM2.some((a) => a[p] > 0)) surfaceNodes.push(p);
  const uStar = new Float64Array(size);
  // Predictor for the first iterate: the last converged step's rate of change (none at first).
  const rateKPerS = new Float64Array(size);
  const k = new Float64Array(size);
  const k0 = new Float64Array(size);
  const kStar = new Float64Array(size);
  const scratch = new Float64Array(size);
  const c0 = new Float64Array(size);
  const e0 = new Float64Array(size);
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

  /** Solves (capPerDt - L_d/2) x = rhs along every line of axis d into delta; returns sum over the d-surface of S q' x. */
  const sweep = (d: number): number => {
    const n = counts[d];
    const s = strides[d];
    const g = faceG[d];
    const area = surfaceAreaM2[d];
    let surfaceSum = 0;
    const starts = lineStarts[d];
    for (let l = 0; l < starts.length; l++) {
      const start = starts[l];
      // Thomas algorithm along the strided line (the shared solver's recurrences, Press et al. Sec. 2.4).
      let p = start;
      let prevG = 0;
      let prevW = 0;
      let prevX = 0;
      for (let i = 0; i < n; i++) {
        const nextG = i < n - 1 ? g[p] : 0;
        const sub = -0.5 * prevG;
        const beta = capPerDt[p] + 0.5 * (prevG + nextG + area[p] * qSlope[p]) - sub * prevW;
        const w = (-0.5 * nextG) / beta;
        const x = (rhs[p] - sub * prevX) / beta;
        work[i] = w;
        delta[p] = x;
        prevW = w;
        prevX = x;
        prevG = nextG;
        p += s;
      }
      p -= s;
      surfaceSum += area[p] * qSlope[p] * delta[p];
      for (let i = n - 2; i >= 0; i--) {
        const q = p - s;
        delta[q] -= work[i] * delta[p];
        p = q;
      }
    }
    return surfaceSum;
  };

  return {
    rate(u, out) {
      // V C(u) du/dt = sum of face flows - surface flux (Patankar, Numerical Heat Transfer and Fluid Flow, 1980, Sec. 4.2 (from memory)).
      evaluateMaterial(table, u, size, kStar, scratch, cStar, eStar);
      out.fill(0);
      for (let d = 0; d < dims; d++) {
        const s = strides[d];
        const face = faceAreaPerSpacingM[d];
        const area = surfaceAreaM2[d];
        for (let p = 0; p < size; p++) {
          if (face[p] > 0) {
            const flow = faceConductance(face[p], kStar[p], kStar[p + s]) * (u[p + s] - u[p]);
            out[p] += flow;
            out[p + s] -= flow;
          } else if (area[p] > 0) out[p] -= area[p] * boundary.fluxOut(u[p]);
        }
      }
      for (let p = 0; p < size; p++) out[p] /= volumeM3[p] * cStar[p];
    },
    step(u, dtS, out) {
      for (let p = 0; p < size; p++) uStar[p] = u[p] + rateKPerS[p] * dtS;
      evaluateMaterial(table, u, size, k0, scratch, c0, e0);
      if (constantProperties) k.set(k0);
      let iterations = 0;
      let converged = false;
      let heatOutJ = 0;
      while (iterations < PICARD_MAX_ITERATIONS) {
        iterations++;
        if (constantProperties) {
          for (let p = 0; p < size; p++) capPerDt[p] = (volumeM3[p] * c0[p]) / dtS;
        } else {
          evaluateMaterial(table, uStar, size, kStar, scratch, cStar, eStar);
          for (let p = 0; p < size; p++) {
            // k over the step by the trapezoid rule (second order, like the Crank-Nicolson base).
            k[p] = 0.5 * (k0[p] + kStar[p]);
            const change = uStar[p] - u[p];
            const chord = Math.abs(change) < CHORD_MIN_CHANGE_K ? 0.5 * (c0[p] + cStar[p]) : (eStar[p] - e0[p]) / change;
            capPerDt[p] = (volumeM3[p] * chord) / dtS;
          }
        }
        for (const p of surfaceNodes) {
          qStar[p] = boundary.fluxOut(uStar[p]);
          qSlope[p] = boundary.fluxOutDerivative(uStar[p]);
        }
        // Explicit residual sum_d F_d(u), the surface flux linearised about the iterate.
        let surfaceOut = 0;
        rhs.fill(0);
        for (let d = 0; d < dims; d++) {
          const s = strides[d];
          const face = faceAreaPerSpacingM[d];
          const area = surfaceAreaM2[d];
          const g = faceG[d];
          for (let p = 0; p < size; p++) {
            if (face[p] > 0) {
              const conductance = faceConductance(face[p], k[p], k[p + s]);
              g[p] = conductance;
              const flow = conductance * (u[p + s] - u[p]);
              rhs[p] += flow;
              rhs[p + s] -= flow;
            } else if (area[p] > 0) {
              const q = area[p] * (qStar[p] + qSlope[p] * (u[p] - uStar[p]));
              rhs[p] -= q;
              surfaceOut += q;
            }
          }
        }
        // Split stages; each adds half the change of its implicit surface flux to the heat out.
        let slopeSum = sweep(0);
        for (let d = 1; d < dims; d++) {
          for (let p = 0; p < size; p++) rhs[p] = capPerDt[p] * delta[p];
          slopeSum += sweep(d);
        }
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
        if (converged) rateKPerS[p] = c / dtS;
        if (Math.abs(c) > maxChangeK) maxChangeK = Math.abs(c);
      }
      return { heatOutJ, maxChangeK, iterations, converged };
    },
  };
}
