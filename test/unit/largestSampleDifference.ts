// Test helpers: the largest difference between the sampled curves of two stage solutions (same sample times),
// with where it happened, for failure messages.
import type { StageSolution } from '@/engine/methods/stageProblem';
import type { PointId } from '@/schema/planSchema';

/** Largest |a - b| over the samples of one point, and where it occurs (for failure messages). */
export function largestSampleDifference(a: StageSolution, b: StageSolution, id: PointId): { differenceK: number; where: string } {
  const x = a.samples.temperaturesK[id]!;
  const y = b.samples.temperaturesK[id]!;
  let differenceK = 0;
  let where = '';
  for (let i = 0; i < x.length; i++) {
    const d = Math.abs(x[i] - y[i]);
    if (d > differenceK) {
      differenceK = d;
      where = `t = ${a.samples.timeS[i].toFixed(2)} s: ${x[i].toFixed(3)} K vs ${y[i].toFixed(3)} K`;
    }
  }
  return { differenceK, where };
}

/** Largest |a - b| over every point both report and every sample, with where it happened. */
export function largestDifference(a: StageSolution, b: StageSolution): { differenceK: number; where: string } {
  let worst = { differenceK: 0, where: 'nowhere' };
  for (const id of Object.keys(a.samples.temperaturesK) as PointId[]) {
    if (!b.samples.temperaturesK[id]) continue;
    const d = largestSampleDifference(a, b, id);
    if (d.differenceK > worst.differenceK) worst = { differenceK: d.differenceK, where: `${id} at ${d.where}` };
  }
  return worst;
}
