// Property: any document survives file and link round trips. In kelvin files the numbers come back
// bit for bit (JSON writes the shortest text that reads back to the same double, ECMA-262 Number::toString);
// in degC files the offset 273.15 is added and taken off again, so values typed in degC come back
// exactly and any other double within FLOAT_NOISE_K.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { planFileFromText } from '@/schema/planFileFromText';
import { planFileToText } from '@/schema/planFileToText';
import { decodePlanLink, encodePlanLink } from '@/schema/planLink';
import { toKelvinPlan } from '@/schema/planTemperatures';
import type { PlanDocument } from '@/schema/planDocument';
import { demoDocument, demoPlanCelsius } from './demoDocument';

/** Two rounding steps of 12 significant digits on temperatures near 1000 K. */
const FLOAT_NOISE_K = 1e-8;
const RUNS = 60;

const kelvin = fc.double({ min: 200, max: 1800, noNaN: true, noDefaultInfinity: true });
/** Temperatures as an engineer types them in degC: up to three decimals. */
const typedCelsius = fc.integer({ min: -50_000, max: 1_400_000 }).map((n) => n / 1000);

function withTemperatures(doc: PlanDocument, t: [number, number, number]): PlanDocument {
  const plan = structuredClone(doc.main);
  plan.initialTemperature = t[0];
  plan.stages[0].medium.temperature = t[1];
  const end = plan.stages[1].end;
  if (end.kind === 'point-temperature') end.temperature = t[2];
  return { ...doc, main: plan, variants: doc.variants.map((v) => ({ ...v, plan: { ...v.plan, initialTemperature: t[0] } })) };
}

const opened = (text: string) => {
  const out = planFileFromText(text);
  if (!out.ok) throw new Error(JSON.stringify(out.issues));
  return out.document;
};

describe('round trips for any temperatures', () => {
  it('kelvin file: exact', () => {
    fc.assert(
      fc.property(fc.tuple(kelvin, kelvin, kelvin), (t) => {
        const doc = withTemperatures(demoDocument, t);
        expect(opened(planFileToText(doc, 'K'))).toEqual(doc);
      }),
      { numRuns: RUNS },
    );
  });

  it('degC file: exact for values typed in degC', () => {
    fc.assert(
      fc.property(fc.tuple(typedCelsius, typedCelsius, typedCelsius), ([a, b, c]) => {
        const typed = structuredClone(demoPlanCelsius);
        typed.initialTemperature = a;
        typed.stages[0].medium.temperature = b;
        const end = typed.stages[1].end;
        if (end.kind === 'point-temperature') end.temperature = c;
        const doc: PlanDocument = { ...demoDocument, main: toKelvinPlan(typed), variants: [] };
        expect(opened(planFileToText(doc, 'degC'))).toEqual(doc);
      }),
      { numRuns: RUNS },
    );
  });

  it('degC file: any kelvin double comes back within float noise', () => {
    fc.assert(
      fc.property(fc.tuple(kelvin, kelvin, kelvin), (t) => {
        const back = opened(planFileToText(withTemperatures(demoDocument, t), 'degC')).main;
        const end = back.stages[1].end;
        const got = [back.initialTemperature, back.stages[0].medium.temperature, end.kind === 'point-temperature' ? end.temperature : NaN];
        got.forEach((g, i) => expect(Math.abs(g - t[i]), `sent ${t[i]} K, got ${g} K, tolerance ${FLOAT_NOISE_K} K`).toBeLessThanOrEqual(FLOAT_NOISE_K));
      }),
      { numRuns: RUNS },
    );
  });

  it('link: same as the degC file it carries', async () => {
    await fc.assert(
      fc.asyncProperty(fc.tuple(kelvin, kelvin, kelvin), async (t) => {
        const doc = withTemperatures(demoDocument, t);
        const link = await encodePlanLink(doc);
        if (!link.ok) throw new Error(JSON.stringify(link.issues));
        const back = await decodePlanLink(link.fragment);
        if (!back.ok) throw new Error(JSON.stringify(back.issues));
        expect(back.document).toEqual(opened(planFileToText(doc, 'degC')));
      }),
      { numRuns: 20 },
    );
  });
});
