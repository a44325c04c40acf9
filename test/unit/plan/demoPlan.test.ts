// The demo plan is data copied from the library: it must stay equal to the library entries it names.
import { describe, expect, it } from 'vitest';
import demo from '@/library/plans/demo-plan.json';
import { parsePlan } from '@/schema/parsePlan';
import { plainCarbonSteel } from '@/library/materials/plainCarbonSteel';
import { stillWater } from '@/library/media/stillWater';
import { materialFromLibrary, mediumFromLibrary } from '@/library/libraryToPlan';

describe('demo plan', () => {
  const parsed = parsePlan(demo);
  it('parses', () => expect(parsed.ok ? [] : parsed.issues).toEqual([]));
  if (!parsed.ok) return;
  const plan = parsed.plan;

  it('uses the library plain carbon steel, temperature-dependent', () => {
    expect(plan.part.material).toEqual(materialFromLibrary(plainCarbonSteel));
    expect(plan.part.material.surfaceEmissivity).toBe(plainCarbonSteel.emissivity.suggested);
  });

  it('quenches in the library still-water boiling curve', () => {
    const quench = plan.stages.find((s) => s.medium.libraryId === stillWater.id);
    const lib = mediumFromLibrary(stillWater, { temperatureC: 25, heatTransfer: 'boiling-curve' });
    expect(lib.ok).toBe(true);
    if (!lib.ok || !quench) throw new Error('demo has no still-water stage');
    expect(quench.medium.heatTransfer).toEqual(lib.medium.heatTransfer);
  });

  it('has an air stage and a liquid bath', () => {
    expect(plan.stages.map((s) => s.medium.libraryId)).toEqual(['still-air', 'still-water', 'still-air']);
  });
});
