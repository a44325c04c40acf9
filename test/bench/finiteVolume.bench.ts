// Benchmark of the 1-D finite-volume stage solver (run: npx tsx test/bench/finiteVolume.bench.ts).
// An invented scenario: a 60 mm low-alloy steel bar (long cylinder, r = 30 mm) from 860 °C, 25 s air transfer
// with radiation, then a water quench with a boiling-curve h until the axis reaches 200 °C, at 0.01 K tolerance.
// Property and h tables are demo numbers of our own, shaped after handbook trends (from memory), not data.
// Prints figures only; no timing is asserted anywhere.
import { geometryOf } from '@/engine/geometry/geometry';
import { materialModel } from '@/engine/properties/materialModel';
import { surfaceBoundary } from '@/engine/properties/surfaceBoundary';
import type { StageProblem, StageSolution } from '@/engine/methods/stageProblem';
import type { Field } from '@/engine/fields';
import { solveFiniteVolumeStage, solveFiniteVolumeStageWith } from '@/engine/methods/finite-volume/solveFiniteVolumeStage';

const C = 273.15;
const RUNS = 40;
const geometry = geometryOf({ kind: 'long-cylinder', radiusM: 0.03 });
const material = materialModel({
  name: 'demo low-alloy steel',
  source: 'invented demo table',
  conductivityWPerMK: { table: [[20 + C, 42], [200 + C, 40], [400 + C, 36], [600 + C, 31], [800 + C, 26], [900 + C, 27]] },
  densityKgPerM3: { table: [[20 + C, 7840], [900 + C, 7600]] },
  // A narrow cp peak around 740 °C stands in for the latent heat of the transformation.
  specificHeatJPerKgK: { table: [[20 + C, 460], [300 + C, 520], [500 + C, 590], [700 + C, 760], [735 + C, 1300], [745 + C, 1300], [780 + C, 650], [900 + C, 620]] },
});
const air = surfaceBoundary({ name: 'shop air', temperature: 25 + C, heatTransfer: { kind: 'constant', hWPerM2K: 12 }, radiation: { emissivity: 0.8 } });
const water = surfaceBoundary({
  name: 'water bath',
  temperature: 30 + C,
  heatTransfer: { kind: 'surface-table', rows: [[30 + C, 900], [100 + C, 2500], [200 + C, 9000], [350 + C, 14000], [500 + C, 4000], [650 + C, 700], [900 + C, 500]] },
});

let toleranceK = 0.01;

function stage(boundary: typeof air, start: Field, end: StageProblem['end']): StageProblem {
  return { geometry, material, boundary, start, end, toleranceK, sampleCount: 121, propertyTemperatureK: 500 + C };
}

type Solve = (p: StageProblem) => ReturnType<typeof solveFiniteVolumeStage>;

function runPlan(solve: Solve): StageSolution[] {
  const a = solve(stage(air, { kind: 'uniform', temperatureK: 860 + C }, { kind: 'duration', seconds: 25 }));
  if (!a.ok) throw new Error(a.message);
  const b = solve(stage(water, a.solution.endField, { kind: 'point-temperature', point: 'centre', temperatureK: 200 + C }));
  if (!b.ok) throw new Error(b.message);
  return [a.solution, b.solution];
}

function median(xs: number[]): number {
  const s = [...xs].sort((x, y) => x - y);
  return s[Math.floor(s.length / 2)];
}

function measure(solve: Solve) {
  for (let i = 0; i < 5; i++) runPlan(solve);
  const times: number[] = [];
  let last: StageSolution[] = [];
  for (let i = 0; i < RUNS; i++) {
    const t0 = performance.now();
    last = runPlan(solve);
    times.push(performance.now() - t0);
  }
  const ms = median(times);
  const cellSteps = last.reduce((s, x) => s + (x.effort.steps ?? 0) * (x.effort.cells ?? 0), 0);
  return { ms, minMs: Math.min(...times), last, cellSteps };
}

const auto = measure(solveFiniteVolumeStage);
console.log('Two-stage plan (air 25 s + water quench to axis 200 °C), tolerance 0.01 K, median of', RUNS, 'runs');
console.log(`  median time            ${auto.ms.toFixed(2)} ms (budget 5 ms); minimum ${auto.minMs.toFixed(2)} ms (less disturbed by other load on a shared machine)`);
auto.last.forEach((s, i) =>
  console.log(`  stage ${i + 1}: ${s.effort.steps} steps, ${s.effort.cells} cells, duration ${s.durationS.toFixed(2)} s, energy rel. error ${s.energyRelativeError?.toExponential(2)}, axis end ${(s.samples.temperaturesK.centre!.at(-1)! - C).toFixed(3)} °C`),
);
console.log(`  ns per cell-step       ${((auto.ms * 1e6) / auto.cellSteps).toFixed(0)} (cells = control volumes of both grids of the Richardson pair)`);
const mem = process.memoryUsage();
console.log(`  memory                 rss ${(mem.rss / 2 ** 20).toFixed(1)} MiB, heap used ${(mem.heapUsed / 2 ** 20).toFixed(1)} MiB`);

// Accuracy of the same plan: each stage at the plan tolerance against a 30 times tighter run (the quench for the
// located duration), largest difference over the 121 samples (self-convergence, as in test/unit/finite-volume).
{
  const quenchS = auto.last[1].durationS;
  const stages = (tol: number) => {
    toleranceK = tol;
    const a = solveFiniteVolumeStage(stage(air, { kind: 'uniform', temperatureK: 860 + C }, { kind: 'duration', seconds: 25 }));
    if (!a.ok) throw new Error(a.message);
    const b = solveFiniteVolumeStage(stage(water, a.solution.endField, { kind: 'duration', seconds: quenchS }));
    if (!b.ok) throw new Error(b.message);
    return [a.solution, b.solution];
  };
  const plan = stages(0.01);
  const reference = stages(0.01 / 30);
  toleranceK = 0.01;
  console.log('Accuracy at 0.01 K against a 30x tighter run (largest difference over the samples):');
  plan.forEach((s, k) => {
    const parts = (['centre', 'surface', 'mean'] as const).map((pt) => {
      const x = s.samples.temperaturesK[pt]!, y = reference[k].samples.temperaturesK[pt]!;
      let worst = 0, at = 0;
      for (let i = 0; i < x.length; i++) if (Math.abs(x[i] - y[i]) > worst) [worst, at] = [Math.abs(x[i] - y[i]), i];
      return `${pt} ${worst.toFixed(4)} K at ${s.samples.timeS[at].toFixed(1)} s`;
    });
    console.log(`  stage ${k + 1} (${s.effort.steps} vs ${reference[k].effort.steps} steps): ${parts.join(', ')}`);
  });
}

console.log('Scaling with the cell count (fixed grids: coarse cells, the fine grid twice as many; same time tolerance):');
const quenchEnd = auto.last[1].endField;
const base = quenchEnd.kind === 'grid-1d' ? (quenchEnd.nodesM.length - 1) / 2 : 0;
for (const factor of [0.5, 1, 2, 4]) {
  const cells = Math.round(base * factor);
  const r = measure((p) => solveFiniteVolumeStageWith(p, { cellCount: cells }));
  const steps = r.last.reduce((s, x) => s + (x.effort.steps ?? 0), 0);
  console.log(`  ${String(cells).padStart(4)} coarse cells (${r.last[1].effort.cells} control volumes): ${r.ms.toFixed(2)} ms, ${steps} steps, ${((r.ms * 1e6) / r.cellSteps).toFixed(0)} ns per cell-step, axis end ${(r.last[1].samples.temperaturesK.centre!.at(-1)! - C).toFixed(4)} °C at ${r.last[1].durationS.toFixed(3)} s`);
}

console.log('The same plan at looser tolerances (automatic grid and steps):');
for (const loose of [0.03, 0.1, 0.3]) {
  toleranceK = loose;
  const r = measure(solveFiniteVolumeStage);
  console.log(`  ${loose} K: ${r.ms.toFixed(2)} ms, steps ${r.last.map((x) => x.effort.steps).join(' + ')}, cells ${r.last.map((x) => x.effort.cells).join(' / ')}, axis end at ${r.last[1].durationS.toFixed(3)} s`);
}
