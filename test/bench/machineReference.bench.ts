// A yardstick for the machine, not for Coolstage (run: npx tsx test/bench/machineReference.bench.ts).
// The engine budgets are stated "in Node on this machine", and the shared 2-core machines here have run the same
// code two to three times slower from one session to the next. This fixed workload does not change with the
// engine's code: a sweep over 200 cells doing what a finite-volume evaluation does per cell (a table look-up, a
// harmonic mean with one division, a few multiply-adds, stores into typed arrays), repeated 20 000 times.
// Compare its figure between runs before comparing engine figures between runs. Prints figures only.
const CELLS = 200;
const SWEEPS = 20_000;
const RUNS = 15;
const TABLE_SIZE = 2048;

const table = new Float64Array(TABLE_SIZE + 1);
const slope = new Float64Array(TABLE_SIZE);
for (let i = 0; i <= TABLE_SIZE; i++) table[i] = 40 - 0.01 * i;
for (let i = 0; i < TABLE_SIZE; i++) slope[i] = table[i + 1] - table[i];
const temperature = new Float64Array(CELLS);
const flow = new Float64Array(CELLS);
for (let i = 0; i < CELLS; i++) temperature[i] = 100 + (1800 * i) / CELLS;

function sweep(): number {
  let kPrev = 0, tPrev = 0, inflow = 0;
  for (let i = 0; i < CELLS; i++) {
    const t = temperature[i];
    const m = Math.floor(t);
    const k = table[m] + slope[m] * (t - m);
    if (i > 0) {
      const phi = ((2 * kPrev * k) / (kPrev + k)) * (tPrev - t);
      flow[i - 1] = inflow - phi;
      inflow = phi;
    }
    kPrev = k;
    tPrev = t;
  }
  return inflow;
}

const times: number[] = [];
let sink = 0;
for (let r = 0; r < RUNS + 3; r++) {
  const t0 = performance.now();
  for (let s = 0; s < SWEEPS; s++) sink += sweep();
  if (r >= 3) times.push(performance.now() - t0);
}
times.sort((a, b) => a - b);
const nsPerCell = (ms: number) => ((ms * 1e6) / (CELLS * SWEEPS)).toFixed(2);
console.log(`Machine yardstick: ${CELLS}-cell sweep x ${SWEEPS}, ${RUNS} runs`);
console.log(`  ns per cell: minimum ${nsPerCell(times[0])}, median ${nsPerCell(times[Math.floor(RUNS / 2)])} (checksum ${sink.toExponential(3)})`);
