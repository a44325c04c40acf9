// Whole-plan benchmark: runPlan on the demo plan (all three stages, every stage cross-checked)
// and on its first two stages (air transfer, boiling-curve water quench), and the quick pass the workbench
// shows first after an edit. Prints figures only.
import { runPlan } from '@/engine/plan/runPlan';
import { parsePlan } from '@/schema/parsePlan';
import demo from '@/library/plans/demo-plan.json';

const parsed = parsePlan(demo);
if (!parsed.ok) throw new Error('the demo plan does not parse');
const full = parsed.plan;
const twoStage = { ...full, stages: full.stages.slice(0, 2) };

function measure(label: string, fn: () => unknown, repeats: number) {
  for (let i = 0; i < 3; i++) fn();
  const times: number[] = [];
  for (let i = 0; i < repeats; i++) {
    const t0 = performance.now();
    fn();
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  const q = (p: number) => times[Math.min(times.length - 1, Math.floor(p * times.length))];
  console.log(`${label.padEnd(52)} median ${q(0.5).toFixed(2)} ms   p95 ${q(0.95).toFixed(2)} ms   (${repeats} runs)`);
}

const r = runPlan(full);
console.log(`demo plan: ${r.stages.map((s) => `${s.name} [${s.method}, ${s.effort.steps ?? '-'} steps]`).join('; ')}`);
measure('demo plan, 3 stages, with cross-checks', () => runPlan(full), 20);
measure('demo plan, first 2 stages, with cross-checks', () => runPlan(twoStage), 20);
measure('demo plan, quick pass (0.1 K, no cross-checks)', () => runPlan(full, { crossCheck: false }), 20);
