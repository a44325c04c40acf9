// Benchmark of the finite-shape finite-volume solver (run: npx tsx test/bench/finiteVolume2D.bench.ts).
// An invented scenario: a short steel cylinder (r0 = 25 mm, length 80 mm) from 850 °C quenched in a stirred oil
// bath at 60 °C with an h that depends on the surface temperature, for 300 s, with k(T) and rho(T) cp(T) tables
// (demo numbers of our own, not data), 101 samples, 0.01 K tolerance. The brief's target: a 40 x 40 grid
// (41 x 41 nodes) under 100 ms median per stage. Also: how time grows with the grid, the 3-D block, and the water
// quench of the plan fixture short-cylinder-hub.json (steep boiling curve, centre to 300 °C: a point-temperature end).
// Prints figures only; no timing is asserted anywhere.
import { geometryOf } from '@/engine/geometry/geometry';
import { materialModel } from '@/engine/properties/materialModel';
import { surfaceBoundary } from '@/engine/properties/surfaceBoundary';
import type { StageProblem } from '@/engine/methods/stageProblem';
import type { Shape } from '@/schema/planSchema';
import { finiteVolume2DSolver } from '@/engine/methods/finite-volume-2d/solveFiniteVolume2DStage';
import { parsePlan } from '@/schema/parsePlan';
import hubPlan from '../fixtures/plans/short-cylinder-hub.json';

const C = 273.15;
const WARM_UP_RUNS = 2;
const material = materialModel({
  name: 'demo quench steel',
  source: 'invented demo table',
  conductivityWPerMK: { table: [[20 + C, 44], [300 + C, 40], [600 + C, 32], [900 + C, 27]] },
  densityKgPerM3: { table: [[20 + C, 7850], [900 + C, 7620]] },
  specificHeatJPerKgK: { table: [[20 + C, 465], [400 + C, 560], [700 + C, 720], [730 + C, 1100], [760 + C, 700], [900 + C, 640]] },
});
const oil = surfaceBoundary({
  name: 'demo stirred oil',
  temperature: 60 + C,
  heatTransfer: { kind: 'surface-table', rows: [[60 + C, 350], [200 + C, 900], [450 + C, 2600], [600 + C, 1800], [750 + C, 700], [900 + C, 500]] },
});

function problemFor(shape: Shape): StageProblem {
  return { geometry: geometryOf(shape), material, boundary: oil, start: { kind: 'uniform', temperatureK: 850 + C }, end: { kind: 'duration', seconds: 300 }, toleranceK: 0.01, sampleCount: 101, propertyTemperatureK: 500 + C };
}

function median(xs: number[]): number {
  const s = [...xs].sort((x, y) => x - y);
  return s[Math.floor(s.length / 2)];
}

function measure(shape: Shape, nodes: number, runs: number, problem: StageProblem = problemFor(shape)): { medianMs: number; minMs: number; steps: number; cells: number; centreC: number; edgeC: number } {
  const solve = finiteVolume2DSolver({ nodesPerAxis: nodes });
  const times: number[] = [];
  let last = null;
  for (let r = 0; r < WARM_UP_RUNS + runs; r++) {
    const t0 = performance.now();
    const out = solve(problem);
    const ms = performance.now() - t0;
    if (!out.ok) throw new Error(out.message);
    if (r >= WARM_UP_RUNS) times.push(ms);
    last = out.solution;
  }
  if (!last) throw new Error('no run');
  const at = (id: 'centre' | 'edge') => last.samples.temperaturesK[id]![50] - C;
  return { medianMs: median(times), minMs: Math.min(...times), steps: last.effort.steps ?? 0, cells: last.effort.cells ?? 0, centreC: at('centre'), edgeC: at('edge') };
}

const cylinder: Shape = { kind: 'short-cylinder', radiusM: 0.025, halfLengthM: 0.04 };
console.log('Short cylinder r0 25 mm x 80 mm, oil quench 300 s, k(T), rho cp(T), h(Ts); 101 samples');
console.log('cells per axis | nodes | median ms | min ms | steps | us per step per node | centre at 150 s | rim at 150 s');
for (const [nodes, runs] of [[11, 20], [21, 10], [41, 10], [81, 3]] as const) {
  const m = measure(cylinder, nodes, runs);
  const perNode = (1000 * m.medianMs) / (m.steps * m.cells);
  console.log(`${String(nodes - 1).padStart(14)} | ${String(m.cells).padStart(5)} | ${m.medianMs.toFixed(1).padStart(9)} | ${m.minMs.toFixed(1).padStart(6)} | ${String(m.steps).padStart(5)} | ${perNode.toFixed(3).padStart(20)} | ${m.centreC.toFixed(2).padStart(12)} °C | ${m.edgeC.toFixed(2)} °C`);
}
console.log('Target: 40 x 40 cells (41 x 41 nodes) under 100 ms median.');

const block: Shape = { kind: 'block', halfLengthM: 0.04, halfWidthM: 0.03, halfHeightM: 0.02 };
console.log('\nBlock 80 x 60 x 40 mm (3-D), same quench');
for (const [nodes, runs] of [[11, 5], [21, 2]] as const) {
  const m = measure(block, nodes, runs);
  console.log(`${nodes - 1} cells per axis (${m.cells} nodes): median ${m.medianMs.toFixed(1)} ms, ${m.steps} steps, centre ${m.centreC.toFixed(2)} °C at 150 s`);
}

const hub = parsePlan(hubPlan);
if (!hub.ok) throw new Error('hub fixture plan does not parse');
const hubShape = hub.plan.part.shape;
const water: StageProblem = {
  geometry: geometryOf(hubShape),
  material: materialModel(hub.plan.part.material),
  boundary: surfaceBoundary(hub.plan.stages[1].medium),
  start: { kind: 'uniform', temperatureK: 1100 },
  end: { kind: 'point-temperature', point: 'centre', temperatureK: 300 + C },
  toleranceK: 0.01,
  sampleCount: 201,
  propertyTemperatureK: 800,
};
console.log('\nHub fixture, short cylinder r0 30 mm x 50 mm, still-water boiling curve, 1100 K to centre 300 °C; 201 samples');
for (const [nodes, runs] of [[41, 5]] as const) {
  const m = measure(hubShape, nodes, runs, water);
  console.log(`${nodes - 1} x ${nodes - 1} cells: median ${m.medianMs.toFixed(1)} ms, min ${m.minMs.toFixed(1)} ms, ${m.steps} steps, ${((1000 * m.medianMs) / (m.steps * m.cells)).toFixed(3)} us per step per node`);
}
