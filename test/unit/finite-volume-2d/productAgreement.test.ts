// The finite-volume solver for finite shapes against the exact product solution (constant properties and h):
// every reported point and the mean, one stage and a chain of three media, and the grid's second-order
// convergence (Patankar, Numerical Heat Transfer and Fluid Flow, 1980, Sec. 4.2; Douglas and Gunn, Numer. Math. 6
// (1964) 428 (from memory)). The product solution is itself checked against independent exact series in
// test/unit/product.
import { describe, expect, it } from 'vitest';
import { finiteVolume2DSolver, solveFiniteVolume2DStage } from '@/engine/methods/finite-volume-2d/solveFiniteVolume2DStage';
import { solveProductStage } from '@/engine/methods/product/solveProductStage';
import type { Field } from '@/engine/fields';
import type { Medium, Shape } from '@/schema/planSchema';
import { convection, finiteProblem, flatBar, shortCylinder, smallBlock, solved } from './finiteShapeFixture';
import { largestDifference } from '../largestSampleDifference';

/** Guard against a stuck run on a loaded machine (the 3-D cases take about a second); not a speed check. */
const SLOW_CASE_TIMEOUT_MS = 60_000;

const OIL = convection(333, 800);
/**
 * Oil (Bi about 0.5 on 25-30 mm) on the default 40 x 40 grid clustered towards the faces: the surface gradient of
 * the first seconds is what the grid resolves least (measured 0.048 K at the rim at 6 s, bar 0.037 K); the 3-D
 * default has 20 cells per axis (measured 0.28 K at the corner at 6 s). Tolerances are about twice the measured.
 */
const FV_2D_OIL_K = 0.1;
const FV_3D_OIL_K = 0.5;
/**
 * Starting from the exact end field of a 5 s water quench: the nodes take exact values, but the volume mean of the
 * steep field by the control-volume rule is off by 0.10 K at t = 0 (measured), so 0.25 K.
 */
const PRODUCT_START_K = 0.25;
/** A start field from a 20-cell water stage, interpolated onto the 40-cell grid (measured 0.21 K), so 0.45 K. */
const COARSE_START_K = 0.45;
/** Halving the cells must cut the error about four times (second order); 3 leaves room for the time error. */
const SECOND_ORDER_RATIO = 3;

describe('finite-volume 2-D/3-D against the exact product solution', () => {
  const cases: [string, Shape, number][] = [
    ['short cylinder', shortCylinder, FV_2D_OIL_K],
    ['bar', flatBar, FV_2D_OIL_K],
    ['block', smallBlock, FV_3D_OIL_K],
  ];
  for (const [name, shape, toleranceK] of cases) {
    it(`${name} in oil, 240 s: all points within ${toleranceK} K`, { timeout: SLOW_CASE_TIMEOUT_MS }, () => {
      const problem = finiteProblem({ shape, medium: OIL, end: { kind: 'duration', seconds: 240 }, sampleCount: 41 });
      const exact = solved(solveProductStage(problem));
      const fv = solved(solveFiniteVolume2DStage(problem));
      const { differenceK, where } = largestDifference(fv, exact);
      expect(differenceK, `${name}: largest |FV - product| ${differenceK} K at ${where}, tolerance ${toleranceK} K`).toBeLessThan(toleranceK);
      expect(fv.durationS).toBe(240);
    });
  }

  it('short cylinder: a four times tighter tolerance doubles the cells and cuts the error about four times', { timeout: SLOW_CASE_TIMEOUT_MS }, () => {
    const at = (toleranceK: number) => finiteProblem({ shape: shortCylinder, medium: OIL, end: { kind: 'duration', seconds: 60 }, sampleCount: 13, toleranceK });
    const exact = solved(solveProductStage(at(1e-4)));
    const standard = solved(solveFiniteVolume2DStage(at(0.01)));
    const tight = solved(solveFiniteVolume2DStage(at(0.0025)));
    expect(tight.effort.cells, 'nodes at 0.0025 K').toBe(81 * 81);
    const ratio = largestDifference(standard, exact).differenceK / largestDifference(tight, exact).differenceK;
    expect(ratio, `error at 0.01 K over error at 0.0025 K: ${ratio}, expected above ${SECOND_ORDER_RATIO}`).toBeGreaterThan(SECOND_ORDER_RATIO);
  });

  it('short cylinder: the error falls with the square of the cell size', { timeout: SLOW_CASE_TIMEOUT_MS }, () => {
    const problem = finiteProblem({ shape: shortCylinder, medium: OIL, end: { kind: 'duration', seconds: 60 }, sampleCount: 13 });
    const exact = solved(solveProductStage(problem));
    const coarse = largestDifference(solved(finiteVolume2DSolver({ nodesPerAxis: 11 })(problem)), exact).differenceK;
    const fine = largestDifference(solved(finiteVolume2DSolver({ nodesPerAxis: 21 })(problem)), exact).differenceK;
    expect(coarse / fine, `10 cells: ${coarse} K, 20 cells: ${fine} K, ratio ${coarse / fine}, expected above ${SECOND_ORDER_RATIO}`).toBeGreaterThan(SECOND_ORDER_RATIO);
  });
});

describe('a chain of three media stays with the exact chained product solution', () => {
  /**
   * Water (Bi about 3) then air then oil. The water stage's first second is the steep part for the grid (measured
   * 0.34 K at 0.8 s on the sinh beta 1.5 grid, 0.22 K on the former beta 2 one, 0.48 K at beta 1); later stages
   * inherit that grid error in their start fields (measured 0.15 K, 0.07 K).
   */
  const stages: [string, Medium, number, number][] = [
    ['water', convection(300, 5000), 8, 0.45],
    ['air', convection(320, 30), 40, 0.3],
    ['oil', OIL, 60, 0.2],
  ];
  it('short cylinder: each stage starts from the previous end field of its own method', { timeout: SLOW_CASE_TIMEOUT_MS }, () => {
    let exactStart: Field = { kind: 'uniform', temperatureK: 1123 };
    let fvStart: Field = exactStart;
    for (const [name, medium, seconds, toleranceK] of stages) {
      const exact = solved(solveProductStage(finiteProblem({ shape: shortCylinder, medium, start: exactStart, end: { kind: 'duration', seconds }, sampleCount: 11 })));
      const fv = solved(solveFiniteVolume2DStage(finiteProblem({ shape: shortCylinder, medium, start: fvStart, end: { kind: 'duration', seconds }, sampleCount: 11 })));
      const { differenceK, where } = largestDifference(fv, exact);
      expect(differenceK, `${name} stage: largest |FV - product| ${differenceK} K at ${where}, tolerance ${toleranceK} K`).toBeLessThan(toleranceK);
      expect(exact.endField.kind).toBe('product');
      expect(fv.endField.kind).toBe('tensor-grid');
      exactStart = exact.endField;
      fvStart = fv.endField;
    }
  });

  it('the product chain is exact: two stages in one medium equal one stage of the summed time', { timeout: SLOW_CASE_TIMEOUT_MS }, () => {
    const medium = convection(340, 1500);
    const first = solved(solveProductStage(finiteProblem({ shape: smallBlock, medium, end: { kind: 'duration', seconds: 30 }, toleranceK: 1e-5 })));
    const second = solved(solveProductStage(finiteProblem({ shape: smallBlock, medium, start: first.endField, end: { kind: 'duration', seconds: 90 }, toleranceK: 1e-5 })));
    const whole = solved(solveProductStage(finiteProblem({ shape: smallBlock, medium, end: { kind: 'duration', seconds: 120 }, toleranceK: 1e-5 })));
    for (const id of ['centre', 'face-x', 'face-y', 'face-z', 'edge', 'corner', 'mean'] as const) {
      const got = second.samples.temperaturesK[id]!.at(-1)!;
      const expected = whole.samples.temperaturesK[id]!.at(-1)!;
      expect(Math.abs(got - expected), `${id} after 30 s + 90 s: ${got} K, one 120 s stage: ${expected} K, tolerance 1e-4 K`).toBeLessThan(1e-4);
    }
  });

  it('a finite-volume stage starts from the product end field or from a coarser grid field (interpolated)', { timeout: SLOW_CASE_TIMEOUT_MS }, () => {
    const water = convection(300, 5000);
    const first = finiteProblem({ shape: flatBar, medium: water, end: { kind: 'duration', seconds: 5 }, sampleCount: 11 });
    const exactFirst = solved(solveProductStage(first));
    const coarseFirst = solved(finiteVolume2DSolver({ nodesPerAxis: 21 })(first));
    const second = (start: Field) => finiteProblem({ shape: flatBar, medium: OIL, start, end: { kind: 'duration', seconds: 60 }, sampleCount: 11 });
    const exactSecond = solved(solveProductStage(second(exactFirst.endField)));
    // From the exact field: only the second stage's own grid error remains.
    const fromProduct = largestDifference(solved(solveFiniteVolume2DStage(second(exactFirst.endField))), exactSecond);
    expect(fromProduct.differenceK, `FV from the product end field: ${fromProduct.differenceK} K at ${fromProduct.where}, tolerance ${PRODUCT_START_K} K`).toBeLessThan(PRODUCT_START_K);
    // From a 20-cell field interpolated onto 40 cells: the coarse first stage's error (about 4 times the fine one) is carried in.
    const fromCoarse = largestDifference(solved(solveFiniteVolume2DStage(second(coarseFirst.endField))), exactSecond);
    expect(fromCoarse.differenceK, `FV from a 20-cell grid field: ${fromCoarse.differenceK} K at ${fromCoarse.where}, tolerance ${COARSE_START_K} K`).toBeLessThan(COARSE_START_K);
  });
});

