// The surface boundary condition of a stage: convection with a constant or surface-temperature
// dependent h, plus grey-body radiation to surroundings at their own temperature.
import type { Medium } from '@/schema/planSchema';
import { interpolateTable } from '../numerics/interpolateTable';

/** Stefan-Boltzmann constant, W/(m² K⁴) (CODATA 2018). */
export const STEFAN_BOLTZMANN = 5.670374419e-8;

export interface SurfaceBoundary {
  mediumK: number;
  /** h at the given surface temperature, W/(m² K). */
  convectionCoefficient(surfaceK: number): number;
  hIsConstant: boolean;
  /** Surface temperatures where a tabulated h changes slope (none when constant), K: ODE solvers stop their steps there. */
  hBreakpointsK?: readonly number[];
  radiation: { emissivity: number; surroundingsK: number } | null;
  /** Heat flux leaving the surface, W/m², positive when the part loses heat. */
  fluxOut(surfaceK: number): number;
  /** d(fluxOut)/d(surfaceK), for Newton linearisation in implicit solvers. */
  fluxOutDerivative(surfaceK: number): number;
}

export function surfaceBoundary(medium: Medium): SurfaceBoundary {
  const mediumK = medium.temperature;
  const ht = medium.heatTransfer;
  let h: (t: number) => number;
  let dh: (t: number) => number;
  if (ht.kind === 'constant') {
    h = () => ht.hWPerM2K;
    dh = () => 0;
  } else {
    const xs = Float64Array.from(ht.rows, (r) => r[0]);
    const ys = Float64Array.from(ht.rows, (r) => r[1]);
    h = (t) => interpolateTable(xs, ys, t);
    // One-sided slope of the piecewise-linear table, zero beyond its ends.
    dh = (t) => {
      if (t <= xs[0] || t >= xs[xs.length - 1]) return 0;
      let i = 1;
      while (xs[i] < t) i++;
      return (ys[i] - ys[i - 1]) / (xs[i] - xs[i - 1]);
    };
  }
  const rad = medium.radiation ? { emissivity: medium.radiation.emissivity, surroundingsK: medium.radiation.surroundingsTemperature ?? mediumK } : null;
  return {
    mediumK,
    convectionCoefficient: h,
    hIsConstant: ht.kind === 'constant',
    hBreakpointsK: ht.kind === 'constant' ? [] : ht.rows.map((r) => r[0]),
    radiation: rad,
    // Newton's law of cooling plus the grey-body exchange eps*sigma*(Ts^4 - Tsur^4),
    // Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Eqs. 1.3a and 1.7 (from memory).
    fluxOut(ts) {
      const conv = h(ts) * (ts - mediumK);
      return rad ? conv + rad.emissivity * STEFAN_BOLTZMANN * (ts ** 4 - rad.surroundingsK ** 4) : conv;
    },
    fluxOutDerivative(ts) {
      const conv = h(ts) + dh(ts) * (ts - mediumK);
      return rad ? conv + 4 * rad.emissivity * STEFAN_BOLTZMANN * ts ** 3 : conv;
    },
  };
}

/**
 * Linearised radiation coefficient h_r = eps*sigma*(Ts + Tsur)(Ts² + Tsur²),
 * Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Eq. 1.9 (from memory).
 */
export function radiationCoefficient(emissivity: number, surfaceK: number, surroundingsK: number): number {
  return emissivity * STEFAN_BOLTZMANN * (surfaceK + surroundingsK) * (surfaceK * surfaceK + surroundingsK * surroundingsK);
}
