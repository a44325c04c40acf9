// The plan a first start opens: the lead's demo (an invented scenario, degC on disk), through the plan door.
import demoPlan from '@/library/plans/demo-plan.json';
import { formatPlanIssues, parsePlan } from '@/schema/parsePlan';
import type { PlanDocument } from '@/schema/planDocument';

export function demoDocument(): PlanDocument {
  const parsed = parsePlan(demoPlan);
  // The demo ships with the app and is checked by the unit tests; failing here is a build defect.
  if (!parsed.ok) throw new Error(`The bundled demo plan is invalid:\n${formatPlanIssues(parsed.issues)}`);
  return { main: parsed.plan, variants: [] };
}
