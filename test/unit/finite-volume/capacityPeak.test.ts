// A narrow cp peak (a latent heat of about 97 kJ/kg spread over 10 K) crossed during slow cooling at Bi = 0.001:
// the time for the mean to fall from 1100 K to 900 K must equal the lumped-capacitance time with variable heat capacity,
//   t = (rho V / (h A)) * integral from 900 K to 1100 K of cp(T) / (T - T_inf) dT,
// Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Sec. 5.2, Eq. 5.2 integrated with cp(T)
// (from memory); at Bi = 0.001 the lumped model is exact to about Bi/5 of the swing. The integral by adaptive Simpson
// (Burden and Faires, Numerical Analysis, 9th ed., Sec. 4.6 (from memory)).
import { describe, expect, it } from 'vitest';
import { solveFiniteVolumeStage } from '@/engine/methods/finite-volume/solveFiniteVolumeStage';
import type { Material } from '@/schema/planSchema';
import { convection, lastOf, problemOf, solved } from './stageProblemFixture';
import { adaptiveSimpson } from './adaptiveSimpson';

const RADIUS_M = 0.01;
const K_W_PER_MK = 40;
const RHO_KG_PER_M3 = 7800;
const H_W_PER_M2K = 4; // Bi = h r0 / k = 0.001
const MEDIUM_K = 300;
const peakMaterial: Material = {
  name: 'test alloy with a narrow peak',
  source: 'invented test numbers',
  conductivityWPerMK: K_W_PER_MK,
  densityKgPerM3: RHO_KG_PER_M3,
  specificHeatJPerKgK: { table: [[300, 600], [995, 600], [1000, 20000], [1005, 600], [1200, 600]] },
};
/** Lumped-model error at Bi = 0.001 and the quadrature: 0.1 % of the time is a generous bound. */
const TIME_TOLERANCE_RELATIVE = 1e-3;

function cp(t: number): number {
  const rows = (peakMaterial.specificHeatJPerKgK as { table: [number, number][] }).table;
  let i = 1;
  while (i < rows.length - 1 && rows[i][0] < t) i++;
  const [x0, y0] = rows[i - 1];
  const [x1, y1] = rows[i];
  return y0 + ((t - x0) / (x1 - x0)) * (y1 - y0);
}

describe('narrow cp peak', () => {
  it('sphere, mean from 1100 K to 900 K through a 10 K wide peak: time as the lumped enthalpy balance gives', () => {
    const s = solved(
      solveFiniteVolumeStage(
        problemOf({ shape: 'sphere', lengthM: RADIUS_M, material: peakMaterial, medium: convection(MEDIUM_K, H_W_PER_M2K), start: { kind: 'uniform', temperatureK: 1100 }, end: { kind: 'point-temperature', point: 'mean', temperatureK: 900 }, toleranceK: 0.01 }),
      ),
    );
    // Per unit V/A = r0/3 for a sphere.
    const expectedS = ((RHO_KG_PER_M3 * RADIUS_M) / (3 * H_W_PER_M2K)) * adaptiveSimpson((t) => cp(t) / (t - MEDIUM_K), 900, 1100, 1e-6);
    const rel = Math.abs(s.durationS - expectedS) / expectedS;
    expect(rel, `duration ${s.durationS} s, lumped enthalpy balance ${expectedS} s, relative ${rel}, tolerance ${TIME_TOLERANCE_RELATIVE}`).toBeLessThan(TIME_TOLERANCE_RELATIVE);
    expect(Math.abs(lastOf(s, 'mean') - 900)).toBeLessThan(0.01);
    // The samples show the plateau: the mean spends a visible share of the stage within 5 K of the peak.
    const mean = s.samples.temperaturesK.mean as Float64Array;
    const onPeak = mean.filter((t) => Math.abs(t - 1000) < 5).length / mean.length;
    expect(onPeak, `share of samples within 5 K of the peak: ${onPeak}`).toBeGreaterThan(0.1);
  });
});
