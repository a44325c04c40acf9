import { describe, expect, it } from 'vitest';
import type { SeriesGeometry } from '@/engine/geometry/geometry';
import { seriesFourierFloor, seriesTermCount } from '@/engine/methods/series/seriesTermCount';
import { eigenvalues } from '@/engine/methods/series/eigenvalues';
import { uniformStartCoefficient } from '@/engine/methods/series/eigenfunction';

describe('series term count', () => {
  it('the dropped tail of a uniform start is below the tolerance (checked with 4000 extra terms)', () => {
    const TOLERANCE = 1e-9;
    for (const g of ['slab', 'cylinder', 'sphere'] as SeriesGeometry[]) {
      for (const bi of [0.05, 2, 500]) {
        for (const fo of [1e-4, 3e-3, 0.05, 0.5]) {
          const n = seriesTermCount(fo, 2, TOLERANCE);
          const lambdas = eigenvalues(g, bi, n + 4000);
          let tail = 0;
          for (let i = n; i < lambdas.length; i++) tail += Math.abs(uniformStartCoefficient(g, lambdas[i])) * Math.exp(-(lambdas[i] ** 2) * fo);
          expect(tail, `${g} Bi=${bi} Fo=${fo}: ${n} terms leave ${tail}, tol ${TOLERANCE}`).toBeLessThan(TOLERANCE);
          // And the count is not wasteful: a quarter of it would not do.
          let shortTail = 0;
          for (let i = Math.floor(n / 4); i < lambdas.length; i++) shortTail += Math.abs(uniformStartCoefficient(g, lambdas[i])) * Math.exp(-(lambdas[i] ** 2) * fo);
          if (n >= 8) expect(shortTail, `${g} Bi=${bi} Fo=${fo}: n/4 terms`).toBeGreaterThan(TOLERANCE);
        }
      }
    }
  });

  it('states its floor: about 1e-7 for 1e-9 of a 2 K bound; below it the count is Infinity', () => {
    const floor = seriesFourierFloor(2, 1e-9);
    expect(floor).toBeGreaterThan(1e-8);
    expect(floor).toBeLessThan(1e-6);
    expect(seriesTermCount(floor * 0.5, 2, 1e-9)).toBe(Infinity);
    expect(Number.isFinite(seriesTermCount(floor * 1.01, 2, 1e-9))).toBe(true);
  });
});
