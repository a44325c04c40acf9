// Two nested grids stepped together with the same time steps: a coarse grid of N cells and a fine one of 2N whose
// even nodes are the coarse nodes. The scheme's error in space goes as C dx², so (4 fine - coarse)/3 cancels it
// (Richardson extrapolation): L. F. Richardson, The approximate arithmetical solution by finite differences of physical
// problems, Phil. Trans. R. Soc. A 210 (1911); Richardson and Gaunt, The deferred approach to the limit,
// Phil. Trans. R. Soc. A 226 (1927) (from memory). Every reported number (point values and slopes, heat out, stored
// energy, the end field) is the same combination, so the energy balance of the pair is exact as it is for each grid.
// Validity: a smooth error expansion in dx²; near a sudden start the combination may overshoot by about the fine
// grid's own error, so reported temperatures are clipped to the range the maximum principle allows.
// Without a coarse grid the pair is the fine grid alone.
import type { VolumeGrid } from './buildVolumeGrid';
import type { StepAttempt, TrBdf2Stepper } from './trBdf2Stepper';
import { probeValue, probeSlope, type GridProbe } from './gridProbe';

const FINE_WEIGHT = 4 / 3;
const COARSE_WEIGHT = -1 / 3;

export interface GridMember {
  grid: VolumeGrid;
  stepper: TrBdf2Stepper;
}

/** One reported point on both grids. */
export interface PairProbe {
  fine: GridProbe;
  coarse: GridProbe | null;
}

export interface RichardsonPair {
  fine: GridMember;
  coarse: GridMember | null;
  attempt(stepS: number): StepAttempt;
  accept(): void;
  trialHeatOut(): number;
  storedEnergy(): number;
  /** Point value of the accepted (or trial) state. */
  value(probe: PairProbe, trial: boolean): number;
  slope(probe: PairProbe): number;
  /** Temperatures on the fine nodes, the coarse correction interpolated between the shared nodes. */
  endTemperaturesK(): Float64Array;
}

export function createRichardsonPair(fine: GridMember, coarse: GridMember | null, lowK: number, highK: number): RichardsonPair {
  const clip = (t: number) => (t < lowK ? lowK : t > highK ? highK : t);
  const combine = (f: number, c: number) => (coarse ? FINE_WEIGHT * f + COARSE_WEIGHT * c : f);
  const energy = (m: GridMember) => {
    let s = 0;
    const e = m.stepper.enthalpy;
    for (let i = 0; i < m.grid.nodeCount; i++) s += m.grid.volumes[i] * e[i];
    return s;
  };
  return {
    fine,
    coarse,
    attempt(h) {
      const a = fine.stepper.attempt(h);
      if (!a.ok || !coarse) return a;
      const b = coarse.stepper.attempt(h);
      if (!b.ok) return b;
      return { ok: true, errorK: Math.max(a.errorK, b.errorK) };
    },
    accept() {
      fine.stepper.accept();
      coarse?.stepper.accept();
    },
    trialHeatOut: () => combine(fine.stepper.trialHeatOut(), coarse ? coarse.stepper.trialHeatOut() : 0),
    storedEnergy: () => combine(energy(fine), coarse ? energy(coarse) : 0),
    value(probe, trial) {
      const f = probeValue(probe.fine, fine.grid, trial ? fine.stepper.trialTemperatureK : fine.stepper.temperatureK);
      if (!coarse || !probe.coarse) return f;
      const c = probeValue(probe.coarse, coarse.grid, trial ? coarse.stepper.trialTemperatureK : coarse.stepper.temperatureK);
      return clip(combine(f, c));
    },
    slope(probe) {
      const f = probeSlope(probe.fine, fine.grid, fine.stepper.inflow, fine.stepper.capacity);
      if (!coarse || !probe.coarse) return f;
      return combine(f, probeSlope(probe.coarse, coarse.grid, coarse.stepper.inflow, coarse.stepper.capacity));
    },
    endTemperaturesK() {
      const tf = fine.stepper.temperatureK;
      const out = tf.slice();
      if (!coarse) return out;
      const tc = coarse.stepper.temperatureK;
      const xf = fine.grid.nodesM;
      const xc = coarse.grid.nodesM;
      // Correction (fine - coarse)/3 at the coarse nodes, linear in between (it is smooth: the error itself).
      let j = 0;
      for (let i = 0; i < out.length; i++) {
        while (j < xc.length - 2 && xc[j + 1] < xf[i]) j++;
        const u = Math.min(1, Math.max(0, (xf[i] - xc[j]) / (xc[j + 1] - xc[j])));
        const correction = (1 - u) * (valueAt(xf, tf, xc[j]) - tc[j]) + u * (valueAt(xf, tf, xc[j + 1]) - tc[j + 1]);
        out[i] = clip(tf[i] + correction / 3);
      }
      return out;
    },
  };
}

function valueAt(x: Float64Array, t: Float64Array, xM: number): number {
  let lo = 0, hi = x.length - 1;
  if (xM <= x[0]) return t[0];
  if (xM >= x[hi]) return t[hi];
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (x[mid] <= xM) lo = mid;
    else hi = mid;
  }
  return t[lo] + ((xM - x[lo]) / (x[hi] - x[lo])) * (t[hi] - t[lo]);
}
