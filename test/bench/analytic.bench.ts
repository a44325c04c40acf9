// Benchmark of the analytic methods: prints median and p95 wall times over many repetitions (no assertions).
// Run: npx tsx test/bench/analytic.bench.ts   Budgets (brief): curves < 1 ms, time to target < 0.1 ms.
import type { Field, Series1DField } from '@/engine/fields';
import { temperatureAt } from '@/engine/methods/series/evaluateField1D';
import type { StageEnd } from '@/engine/methods/stageProblem';
import { solveSeriesStage } from '@/engine/methods/series/solveSeriesStage';
import { solveLumpedStage } from '@/engine/methods/lumped/solveLumpedStage';
import { stageProblem } from '../unit/series/stageFixture';
import { geometryOf } from '@/engine/geometry/geometry';
import { largestLumpedSpreadFraction } from '@/engine/methods/series/lumpedSpreadFraction';

// Invented demo part: a 60 mm steel-like shaft quenched, then held in air.
const SHAFT = { kind: 'long-cylinder' as const, radiusM: 0.03 };
const steel = { kWPerMK: 30, rhoKgPerM3: 7800, cJPerKgK: 500 };

function time(label: string, repetitions: number, run: () => void): void {
  for (let i = 0; i < Math.min(50, repetitions); i++) run(); // warm-up (JIT, eigenvalue cache)
  const samples: number[] = [];
  for (let i = 0; i < repetitions; i++) {
    const t0 = performance.now();
    run();
    samples.push(performance.now() - t0);
  }
  samples.sort((a, b) => a - b);
  const at = (q: number) => samples[Math.min(samples.length - 1, Math.floor(q * samples.length))];
  console.log(`${label.padEnd(58)} median ${at(0.5).toFixed(4)} ms   p95 ${at(0.95).toFixed(4)} ms   (${repetitions} runs)`);
}

function must(outcome: ReturnType<typeof solveSeriesStage>) {
  if (!outcome.ok) throw new Error(`${outcome.code}: ${outcome.message}`);
  return outcome.solution;
}

const uniform: Field = { kind: 'uniform', temperatureK: 1123 };
const quench = (end: StageEnd, start: Field = uniform) => stageProblem({ shape: SHAFT, ...steel, hWPerM2K: 2500, mediumK: 330, start, end, sampleCount: 200 });
const hold = (end: StageEnd, start: Field) => stageProblem({ shape: SHAFT, ...steel, hWPerM2K: 20, mediumK: 300, start, end, sampleCount: 200 });
const quenched = must(solveSeriesStage(quench({ kind: 'duration', seconds: 40 }))).endField;

time('series curves, uniform start, plate (200 t x 3 points)', 2000, () => { must(solveSeriesStage({ ...quench({ kind: 'duration', seconds: 120 }), geometry: geometryOf({ kind: 'plate', halfThicknessM: 0.03 }) })); });
time('series curves, uniform start (200 t x centre/surface/mean)', 2000, () => { must(solveSeriesStage(quench({ kind: 'duration', seconds: 120 }))); });
time('series curves, projected series start (air hold after quench)', 2000, () => { must(solveSeriesStage(hold({ kind: 'duration', seconds: 600 }, quenched))); });
time('series time to target (centre 600 K), uniform start', 2000, () => { must(solveSeriesStage(quench({ kind: 'point-temperature', point: 'centre', temperatureK: 600 }))); });
time('series time to target (surface 520 K, 0.6 s into the hold: 353 terms), projected start', 2000, () => { must(solveSeriesStage(hold({ kind: 'point-temperature', point: 'surface', temperatureK: 520 }, quenched))); });

// A finite-volume-like end field: 101 nodes sampled from the quenched series field.
const nodes = Float64Array.from({ length: 101 }, (_, i) => (i / 100) * SHAFT.radiusM);
const gridStart: Field = { kind: 'grid-1d', geometry: 'cylinder', lengthM: SHAFT.radiusM, nodesM: nodes, temperaturesK: Float64Array.from(nodes, (x) => temperatureAt(quenched as Series1DField, x)) };
time('series curves, grid start (101 nodes, Gauss-Legendre projection)', 200, () => { must(solveSeriesStage(hold({ kind: 'duration', seconds: 600 }, gridStart))); });

const smallPart = stageProblem({
  shape: { kind: 'sphere', radiusM: 0.006 }, kWPerMK: 30, rhoKgPerM3: 7800, cJPerKgK: { table: [[300, 450], [700, 600], [1000, 750], [1300, 640]] },
  hWPerM2K: 15, mediumK: 300, radiation: { emissivity: 0.8 }, start: { kind: 'uniform', temperatureK: 1173 }, end: { kind: 'duration', seconds: 1800 }, sampleCount: 200,
});
time('lumped ODE with radiation and cp(T), 200 samples', 500, () => { must(solveLumpedStage(smallPart)); });
time('lumped ODE with radiation, time to 500 K', 500, () => { must(solveLumpedStage({ ...smallPart, end: { kind: 'point-temperature', point: 'mean', temperatureK: 500 } })); });

// What the plan runner calls per stage to judge lumped: the largest exact spread at the stage's Bi.
time('largestLumpedSpreadFraction, cylinder Bi = 0.4', 500, () => { largestLumpedSpreadFraction('cylinder', 0.4); });
time('largestLumpedSpreadFraction, sphere Bi = 30', 500, () => { largestLumpedSpreadFraction('sphere', 30); });
