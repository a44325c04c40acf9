// Energy accounting of the finite-shape finite-volume solver with k(T), rho(T) cp(T) (a cp hump), a boiling-curve
// h and radiation, on a short cylinder, a bar and a block.
// 1) The solver's own balance (heat through the faces against the change of stored energy): below 1e-6 (the brief).
// 2) An independent recomputation of heatRemovedJ: e(T) = integral of rho cp dT by adaptive Simpson from the plan's
//    own tables (Burden and Faires, Numerical Analysis, 9th ed., Sec. 4.6 (from memory)), summed over the end
//    field's nodes with control volumes rebuilt here (half cells at centre and surface, r dr on the radial axis).
import { describe, expect, it } from 'vitest';
import { solveFiniteVolume2DStage } from '@/engine/methods/finite-volume-2d/solveFiniteVolume2DStage';
import { materialModel } from '@/engine/properties/materialModel';
import { geometryOf } from '@/engine/geometry/geometry';
import type { Material, Medium, Shape } from '@/schema/planSchema';
import type { Field } from '@/engine/fields';
import { boilingBath, finiteProblem, flatBar, radiatingAir, shortCylinder, smallBlock, solved, START_K, variableAlloy } from './finiteShapeFixture';
import { adaptiveSimpson } from '../finite-volume/adaptiveSimpson';

/** Guard against a stuck run on a loaded machine (the 3-D cases take about a second); not a speed check. */
const SLOW_CASE_TIMEOUT_MS = 60_000;

const BALANCE_TOLERANCE = 1e-6;
/** The solver resamples the tables every 0.5 K or finer (tabulateMaterial); against exact Simpson this is the allowance. */
const INDEPENDENT_TOLERANCE = 1e-4;
const REFERENCE_K = 300;

/** Stored energy (J, on the geometry's basis) of a grid field relative to REFERENCE_K. */
function storedEnergy(material: Material, shape: Shape, field: Field): number {
  const model = materialModel(material);
  const e = (t: number) => adaptiveSimpson((x) => model.volumetricHeatCapacity(x), REFERENCE_K, t, 1e-4);
  const geometry = geometryOf(shape);
  if (field.kind === 'uniform') return e(field.temperatureK) * geometry.volumeM3;
  if (field.kind !== 'tensor-grid') throw new Error(`unexpected field ${field.kind}`);
  const axes = geometry.finiteAxes ?? [];
  const weights = field.nodesM.map((x, d) =>
    Array.from(x, (xi, i) => {
      const lo = i === 0 ? 0 : 0.5 * (x[i - 1] + xi);
      const hi = i === x.length - 1 ? xi : 0.5 * (xi + x[i + 1]);
      return axes[d].coordinate === 'radial' ? 2 * Math.PI * 0.5 * (hi * hi - lo * lo) : 2 * (hi - lo);
    }),
  );
  const counts = field.nodesM.map((x) => x.length);
  let sum = 0;
  let volume = 0;
  for (let p = 0; p < field.temperaturesK.length; p++) {
    let rest = p;
    let v = 1;
    for (let d = 0; d < counts.length; d++) {
      v *= weights[d][rest % counts[d]];
      rest = Math.floor(rest / counts[d]);
    }
    sum += v * e(field.temperaturesK[p]);
    volume += v;
  }
  // The rebuilt control volumes must fill the part exactly.
  expect(Math.abs(volume - geometry.volumeM3) / geometry.volumeM3, `grid volume ${volume} vs part ${geometry.volumeM3}`).toBeLessThan(1e-12);
  return sum;
}

const cases: [string, Shape, string, Medium, number][] = [
  ['short cylinder', shortCylinder, 'boiling-curve bath', boilingBath, 40],
  ['short cylinder', shortCylinder, 'radiating air', radiatingAir, 300],
  ['bar', flatBar, 'boiling-curve bath', boilingBath, 40],
  ['block', smallBlock, 'radiating air', radiatingAir, 200],
];

describe('finite-volume 2-D/3-D energy balance with variable properties', () => {
  for (const [shapeName, shape, mediumName, medium, seconds] of cases) {
    it(`${shapeName} in ${mediumName} for ${seconds} s`, { timeout: SLOW_CASE_TIMEOUT_MS }, () => {
      const start: Field = { kind: 'uniform', temperatureK: START_K };
      const s = solved(solveFiniteVolume2DStage(finiteProblem({ shape, material: variableAlloy, medium, start, end: { kind: 'duration', seconds } })));
      expect(s.energyRelativeError, `own balance: got ${s.energyRelativeError}, allowed ${BALANCE_TOLERANCE}`).not.toBeNull();
      expect(s.energyRelativeError!).toBeLessThan(BALANCE_TOLERANCE);
      const expected = storedEnergy(variableAlloy, shape, start) - storedEnergy(variableAlloy, shape, s.endField);
      const relative = Math.abs(s.heatRemovedJ - expected) / expected;
      expect(relative, `${shapeName}, ${mediumName}, ${seconds} s: heat removed got ${s.heatRemovedJ} J, expected ${expected} J, tolerance ${INDEPENDENT_TOLERANCE} relative`).toBeLessThan(INDEPENDENT_TOLERANCE);
    });
  }
});
