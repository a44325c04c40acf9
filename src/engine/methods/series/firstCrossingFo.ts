// The first Fourier number at which a point's temperature reaches a target, or why it never does.
// Method: scan in Fo from FO_SCAN_START (down by 10x while already past the target, then up by FO_SCAN_GROWTH),
// bracket the first sign change of value - target, refine the bracket by REFINE_SUBDIVISIONS geometric sub-steps
// (non-monotone curves), then Brent (findRootBracketed) to machine precision in Fo.
// Horizon: the scan stops when the field's envelope (sum |b_n X_n| exp(-lambda_n^2 Fo)) is below |T_inf - target|
// (no later crossing possible), or at foMax (the longest stage a plan allows). Never loops without bound.
// Monotone curves (uniform start: maximum principle, Carslaw and Jaeger, Conduction of Heat in Solids, 2nd ed.,
// Sec. 1.9, from memory) are decided from the signs alone. A double crossing between two scan points before
// FO_SCAN_START or inside one growth step of a non-monotone curve is not resolved (documented in docs/methods/series.md).
import { findRootBracketed } from '@/engine/numerics/findRootBracketed';

const FO_SCAN_START = 1e-3;
const FO_SCAN_DOWN = 10;
const FO_SCAN_GROWTH = 1.6;
const REFINE_SUBDIVISIONS = 12;

export interface CrossingQuery {
  /** Point temperature (K) at Fo >= foFloor. */
  value: (fo: number) => number;
  /** Upper bound of |T(point) - T_inf| at Fo (K), decreasing in Fo. */
  envelope: (fo: number) => number;
  startK: number;
  targetK: number;
  mediumK: number;
  toleranceK: number;
  monotone: boolean;
  foFloor: number;
  foMax: number;
  /** Converts Fo to seconds for the messages. */
  secondsPerFo: number;
  pointLabel: string;
}

export type CrossingOutcome =
  | { ok: true; fo: number }
  | { ok: false; code: 'target-unreachable' | 'target-not-reached' | 'not-applicable'; message: string };

const show = (k: number) => `${(k - 273.15).toFixed(2)} °C (${k.toFixed(2)} K)`;

function unreachable(q: CrossingQuery): CrossingOutcome {
  const { startK, targetK, mediumK, toleranceK, pointLabel, monotone } = q;
  if (Math.abs(targetK - mediumK) <= toleranceK) {
    return { ok: false, code: 'target-unreachable', message: `The target ${show(targetK)} equals the medium temperature ${show(mediumK)}: the ${pointLabel} only approaches it asymptotically and never reaches it in finite time. Set the target a little short of the medium temperature.` };
  }
  const towardMedium = Math.sign(mediumK - startK);
  if (Math.sign(targetK - mediumK) === towardMedium) {
    return { ok: false, code: 'target-unreachable', message: `The target ${show(targetK)} lies on the far side of the medium temperature ${show(mediumK)}: the ${pointLabel} (starting at ${show(startK)}) moves toward the medium and cannot pass it.` };
  }
  const path = monotone ? 'only moves toward' : 'tends to';
  return { ok: false, code: 'target-unreachable', message: `The target ${show(targetK)} is beyond what the field can reach: the ${pointLabel} starts at ${show(startK)} and ${path} the medium at ${show(mediumK)} without getting there in this stage.` };
}

export function firstCrossingFo(q: CrossingQuery): CrossingOutcome {
  const { value, targetK, startK, mediumK, toleranceK, monotone, foFloor, foMax } = q;
  const s0 = startK - targetK;
  if (Math.abs(s0) <= toleranceK) {
    return { ok: false, code: 'target-unreachable', message: `The ${q.pointLabel} already starts at the target ${show(targetK)} (within ${toleranceK} K): there is nothing for this stage to do. Remove the stage or change its target.` };
  }
  const sInf = mediumK - targetK;
  if (monotone && (Math.abs(sInf) <= toleranceK || Math.sign(sInf) === Math.sign(s0))) return unreachable(q);
  const crossed = (fo: number) => Math.sign(value(fo) - targetK) !== Math.sign(s0);

  let lo: number;
  let hi: number;
  let fo = Math.max(foFloor, Math.min(FO_SCAN_START, foMax));
  if (crossed(fo)) {
    hi = fo;
    for (;;) {
      if (fo <= foFloor) {
        return { ok: false, code: 'not-applicable', message: `The ${q.pointLabel} reaches ${show(targetK)} before Fo = ${foFloor.toExponential(2)} (t = ${(foFloor * q.secondsPerFo).toExponential(2)} s), earlier than the exact series can resolve with its largest term count. Use the finite-volume method for this stage.` };
      }
      fo = Math.max(foFloor, fo / FO_SCAN_DOWN);
      if (!crossed(fo)) break;
      hi = fo;
    }
    lo = fo;
  } else {
    for (;;) {
      lo = fo;
      if (lo >= foMax) {
        return { ok: false, code: 'target-not-reached', message: `The ${q.pointLabel} has not reached ${show(targetK)} after ${(foMax * q.secondsPerFo).toExponential(3)} s, the longest stage a plan allows (it tends to ${show(mediumK)}).` };
      }
      if (!monotone && q.envelope(lo) < Math.abs(sInf)) return unreachable(q);
      fo = Math.min(foMax, lo * FO_SCAN_GROWTH);
      if (crossed(fo)) { hi = fo; break; }
    }
  }
  if (!monotone) {
    // The first sign change inside [lo, hi].
    const ratio = (hi / lo) ** (1 / REFINE_SUBDIVISIONS);
    let a = lo;
    for (let i = 1; i <= REFINE_SUBDIVISIONS; i++) {
      const b = i === REFINE_SUBDIVISIONS ? hi : lo * ratio ** i;
      if (crossed(b)) { lo = a; hi = b; break; }
      a = b;
    }
  }
  return { ok: true, fo: findRootBracketed((x) => value(x) - targetK, lo, hi) };
}
