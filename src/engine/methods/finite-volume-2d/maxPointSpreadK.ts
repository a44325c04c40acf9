// The largest difference between any two reported points at one time, maximised over the stage's samples:
// the distortion and cracking indicator of finite shapes (large spreads between the corner or edge and the
// centre mean large thermal stresses; common practice). Computed from the samples of any method.
import type { StageSamples } from '../stageProblem';

export function maxPointSpreadK(samples: StageSamples): number {
  const curves = Object.values(samples.temperaturesK).filter((c): c is Float64Array => c !== undefined);
  let spread = 0;
  for (let i = 0; i < samples.timeS.length; i++) {
    let lo = Infinity;
    let hi = -Infinity;
    for (const c of curves) {
      lo = Math.min(lo, c[i]);
      hi = Math.max(hi, c[i]);
    }
    if (hi - lo > spread) spread = hi - lo;
  }
  return spread;
}
