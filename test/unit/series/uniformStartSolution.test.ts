import { describe, expect, it } from 'vitest';
import type { SeriesGeometry } from '@/engine/geometry/geometry';
import { uniformStartHeatFraction, uniformStartMeanTheta, uniformStartTheta } from '@/engine/methods/series/uniformStartSolution';
import { oneTermApproximation } from '@/engine/methods/series/oneTermApproximation';
import { largestLumpedSpreadFraction, lumpedSpreadFraction } from '@/engine/methods/series/lumpedSpreadFraction';

const GEOMETRIES: SeriesGeometry[] = ['slab', 'cylinder', 'sphere'];
const POWER = { slab: 0, cylinder: 1, sphere: 2 } as const;

/** Composite Simpson on [a, b] (Burden & Faires, Numerical Analysis, 9th ed., Sec. 4.4, from memory). */
function simpson(f: (x: number) => number, a: number, b: number, panels: number): number {
  const h = (b - a) / panels;
  let s = f(a) + f(b);
  for (let i = 1; i < panels; i++) s += (i % 2 === 1 ? 4 : 2) * f(a + i * h);
  return (s * h) / 3;
}

describe('uniform-start exact series', () => {
  it('theta -> 1 inside the body as Fo -> 0 (heat has not arrived: erfc(0.5/(2 sqrt Fo)) ~ 0)', () => {
    const EARLY_TOLERANCE = 1e-9;
    for (const g of GEOMETRIES) {
      for (const bi of [0.1, 5, 1e4]) {
        const got = uniformStartTheta(g, bi, 0.5, 1e-4);
        expect(Math.abs(got - 1), `${g} Bi=${bi} x*=0.5 Fo=1e-4: theta ${got}`).toBeLessThan(EARLY_TOLERANCE);
      }
    }
  });

  it('mean theta equals the numerical volume integral of the profile, and Q/Q0 = 1 - mean', () => {
    const MEAN_TOLERANCE = 1e-10;
    for (const g of GEOMETRIES) {
      for (const [bi, fo] of [[0.5, 0.01], [3, 0.3], [40, 1.2]]) {
        const d = POWER[g];
        const numeric = (d + 1) * simpson((x) => uniformStartTheta(g, bi, x, fo) * x ** d, 0, 1, 400);
        const got = uniformStartMeanTheta(g, bi, fo);
        expect(Math.abs(got - numeric), `${g} Bi=${bi} Fo=${fo}: mean ${got}, Simpson ${numeric}, tol ${MEAN_TOLERANCE}`).toBeLessThan(MEAN_TOLERANCE);
        expect(uniformStartHeatFraction(g, bi, fo)).toBeCloseTo(1 - got, 14);
      }
    }
  });

  it('Q/Q0 equals the heat through the surface, (d+1) Bi int_0^Fo theta_s dFo (energy balance, Incropera 6th ed. Sec. 5.5.3, from memory)', () => {
    const BALANCE_TOLERANCE = 1e-8;
    for (const g of GEOMETRIES) {
      for (const [bi, fo] of [[0.2, 0.5], [6, 0.4]]) {
        // theta_s ~ 1 - c sqrt(Fo) near 0: substitute Fo = u^2 so the integrand is smooth.
        const flux = (POWER[g] + 1) * bi * simpson((u) => (u === 0 ? 1 : uniformStartTheta(g, bi, 1, u * u)) * 2 * u, 0, Math.sqrt(fo), 400);
        const got = uniformStartHeatFraction(g, bi, fo);
        expect(Math.abs(got - flux), `${g} Bi=${bi} Fo=${fo}: Q/Q0 ${got}, surface integral ${flux}`).toBeLessThan(BALANCE_TOLERANCE);
      }
    }
  });

  it('small Bi gives the lumped answer exp(-Bi_c Fo_c) = exp(-(d+1) Bi Fo) (Incropera 6th ed. Eq. 5.13, from memory)', () => {
    const bi = 1e-4;
    for (const g of GEOMETRIES) {
      const fo = 2000; // (d+1) Bi Fo = 0.2 .. 0.6
      const lumped = Math.exp(-(POWER[g] + 1) * bi * fo);
      for (const x of [0, 1]) {
        const got = uniformStartTheta(g, bi, x, fo);
        // The spread inside the part is of order Bi, so lumped is right to ~Bi.
        expect(Math.abs(got - lumped), `${g} x*=${x}: series ${got}, lumped ${lumped}`).toBeLessThan(2 * bi);
      }
    }
  });

  it('long times reach the medium temperature', () => {
    for (const g of GEOMETRIES) expect(Math.abs(uniformStartTheta(g, 2, 0, 30)), g).toBeLessThan(1e-12);
  });

  it('one-term within 2% of exact at the centre and the mean for Fo > 0.2 (common practice); surface error reported', () => {
    const ONE_TERM_RELATIVE = 0.02;
    const surfaceErrors: { label: string; error: number }[] = [];
    for (const g of GEOMETRIES) {
      for (const bi of [0.1, 1, 10, 100]) {
        const oneTerm = oneTermApproximation(g, bi);
        for (const fo of [0.21, 0.3, 0.6, 1.5]) {
          const exactC = uniformStartTheta(g, bi, 0, fo);
          const exactM = uniformStartMeanTheta(g, bi, fo);
          const c = Math.abs(oneTerm.theta(0, fo) / exactC - 1);
          const m = Math.abs(oneTerm.meanTheta(fo) / exactM - 1);
          expect(c, `${g} Bi=${bi} Fo=${fo}: centre one-term rel. error ${c}`).toBeLessThan(ONE_TERM_RELATIVE);
          expect(m, `${g} Bi=${bi} Fo=${fo}: mean one-term rel. error ${m}`).toBeLessThan(ONE_TERM_RELATIVE);
          if (fo === 0.21) surfaceErrors.push({ label: `${g} Bi=${bi}`, error: Math.abs(oneTerm.theta(1, fo) - uniformStartTheta(g, bi, 1, fo)) });
        }
      }
    }
    // Reported, not assumed: absolute surface theta error of the one-term form at Fo = 0.21.
    console.info(`one-term surface |theta error| at Fo = 0.21: ${surfaceErrors.map((e) => `${e.label}: ${e.error.toExponential(2)}`).join('; ')}`);
    // Reported above; asserted only to be a real number below 2% of the excess for these Bi.
    for (const { label, error } of surfaceErrors) {
      expect(error > 0 && error < 0.02, `${label}: surface one-term error ${error}`).toBe(true);
    }
  });

  it('Incropera 6th ed. Example 5.4 (pipeline wall heated by oil, from memory): T(0) = 42.9 °C, T(L) = 45.2 °C after 8 min', () => {
    // Steel wall L = 40 mm, insulated outside; k = 63.9 W/mK, alpha = 18.8e-6 m²/s, h = 500 W/m²K, Ti = -20 °C, oil 60 °C.
    const bi = (500 * 0.04) / 63.9;
    const fo = (18.8e-6 * 8 * 60) / 0.04 ** 2;
    // The book works the one-term form with lambda1, C1 interpolated linearly in Table 5.1 (theta off by ~0.5%)
    // and prints one decimal: theta is 0.5-0.9% off, up to 0.2 K at this 80 K excess.
    const BOOK_ROUNDING_K = 0.2;
    const t0 = 60 + (-20 - 60) * uniformStartTheta('slab', bi, 0, fo);
    const tL = 60 + (-20 - 60) * uniformStartTheta('slab', bi, 1, fo);
    expect(Math.abs(t0 - 42.9), `T(0) got ${t0} °C, book 42.9 °C`).toBeLessThan(BOOK_ROUNDING_K);
    expect(Math.abs(tL - 45.2), `T(L) got ${tL} °C, book 45.2 °C`).toBeLessThan(BOOK_ROUNDING_K);
  });

  it('issue point: at Bi = 0.1 on Lc = V/As the largest centre-surface spread is above 10% of the start excess for a sphere, below 5% for a plate', () => {
    // Bi on the series length: plate L = Lc, sphere r0 = 3 Lc.
    const plate = largestLumpedSpreadFraction('slab', 0.1);
    const sphere = largestLumpedSpreadFraction('sphere', 0.3);
    expect(plate.fraction, `plate largest spread ${plate.fraction} at Fo ${plate.fo}`).toBeLessThan(0.05);
    expect(sphere.fraction, `sphere largest spread ${sphere.fraction} at Fo ${sphere.fo}`).toBeGreaterThan(0.1);
    // The maximum is a maximum: neighbours in Fo are smaller.
    expect(lumpedSpreadFraction('sphere', 0.3, sphere.fo * 1.2)).toBeLessThan(sphere.fraction);
    expect(lumpedSpreadFraction('sphere', 0.3, sphere.fo / 1.2)).toBeLessThan(sphere.fraction);
    console.info(`largest spread: plate ${plate.fraction.toFixed(4)} at Fo ${plate.fo.toFixed(3)}, sphere ${sphere.fraction.toFixed(4)} at Fo ${sphere.fo.toFixed(3)}`);
  });
});
