// Energy accounting with temperature-dependent k and rho cp (with a narrow cp peak), a boiling-curve h and radiation.
// 1) The solver's own balance: heat through the surface against the change of stored energy, below 1e-6.
// 2) An independent check of heatRemovedJ: the stored energy of the start and end fields recomputed from the
//    plan's own property tables (fieldEnergy.ts).
import { describe, expect, it } from 'vitest';
import { solveFiniteVolumeStage } from '@/engine/methods/finite-volume/solveFiniteVolumeStage';
import type { Medium } from '@/schema/planSchema';
import { type Shape1D } from './exactSeries1D';
import { storedHeatBetween } from './fieldEnergy';
import { boilingBath, problemOf, radiatingAir, solved, variableMaterial } from './stageProblemFixture';

/** The brief's bound on the solver's own balance. */
const BALANCE_TOLERANCE = 1e-6;
/**
 * The independent recomputation integrates the piecewise-linear end field on its nodes (trapezoid, second order):
 * agreement to 2e-4 of the heat removed is what that quadrature allows on these grids.
 */
const INDEPENDENT_TOLERANCE = 2e-4;
const START_K = 1150;
const uniformStart = { kind: 'uniform', temperatureK: START_K } as const;

const cases: [Shape1D, string, Medium, number][] = [
  ['slab', 'radiating air', radiatingAir, 200],
  ['cylinder', 'boiling-curve bath', boilingBath, 60],
  ['sphere', 'boiling-curve bath', boilingBath, 60],
  ['slab', 'boiling-curve bath with radiation', { ...boilingBath, radiation: { emissivity: 0.6, surroundingsTemperature: 350 } }, 45],
  ['cylinder', 'radiating air', radiatingAir, 300],
  // A long hold: steps of tens of seconds, where the conduction terms dominate the Newton matrix.
  ['slab', 'radiating air (long hold)', radiatingAir, 4000],
];

describe('energy balance with variable properties', () => {
  for (const [shape, mediumName, medium, seconds] of cases) {
    it(`${shape} in ${mediumName}, ${seconds} s: balance below ${BALANCE_TOLERANCE}, heat removed as recomputed from the fields`, () => {
      const s = solved(solveFiniteVolumeStage(problemOf({ shape, lengthM: 0.03, material: variableMaterial, medium, start: { kind: 'uniform', temperatureK: START_K }, end: { kind: 'duration', seconds } })));
      expect(s.energyRelativeError, `${shape} ${mediumName}: energyRelativeError ${s.energyRelativeError}`).not.toBeNull();
      expect(s.energyRelativeError as number).toBeLessThan(BALANCE_TOLERANCE);
      const independent = storedHeatBetween(variableMaterial, shape, uniformStart, s.endField);
      const rel = Math.abs(s.heatRemovedJ - independent) / Math.abs(independent);
      expect(rel, `${shape} ${mediumName}: heatRemovedJ ${s.heatRemovedJ}, recomputed ${independent}, relative difference ${rel}, tolerance ${INDEPENDENT_TOLERANCE}`).toBeLessThan(INDEPENDENT_TOLERANCE);
      // The part lost heat and the end field cooled through the cp peak (1000 K) at the surface.
      expect(s.heatRemovedJ).toBeGreaterThan(0);
    });
  }
});
