// Opening a plan file the user picked: an oversized file is refused before it is read, then the
// text goes through the one file door (planFileFromText).
import { MAX_PLAN_BYTES } from '@/schema/parsePlan';
import { planFileFromText, type PlanFileOutcome } from '@/schema/planFileFromText';

export async function readPlanFile(file: Pick<File, 'size' | 'text'>): Promise<PlanFileOutcome> {
  if (file.size > MAX_PLAN_BYTES) {
    return { ok: false, issues: [{ path: '(file)', message: `the file is ${(file.size / 1e6).toFixed(1)} MB; a plan file may be at most ${MAX_PLAN_BYTES / 1e6} MB` }] };
  }
  try {
    return planFileFromText(await file.text());
  } catch (e) {
    return { ok: false, issues: [{ path: '(file)', message: `the file could not be read (${(e as Error).message})` }] };
  }
}
