// Agitated quench oil: moderate to strong circulation by pumps or propellers.
import type { MediumEntry } from '../libraryEntrySchema';
import { CRACKING_CAUTION, DEFER_CAUTION, QUENCH_OIL_FIRE_CAUTION, WATER_IN_OIL_CAUTION } from '../cautions';
import { illustrativeCurveLabel } from './illustrativeCurveLabel';

export const agitatedOil: MediumEntry = {
  id: 'agitated-oil',
  name: 'Quench oil, agitated',
  description:
    'A quench oil of normal speed with moderate to strong circulation. Agitation shortens the vapour-film stage and raises h in every stage; how much depends on the flow each face sees.',
  phase: 'liquid',
  temperatureC: { min: 40, max: 80, suggested: 60, source: 'usual bath range for conventional quench oils, common practice; follow the oil supplier' },
  hWPerM2K: {
    min: 550,
    max: 2500,
    suggested: 1000,
    source:
      'common practice; matches a Grossmann severity H of about 0.35-0.8 per inch for moderately to strongly agitated oil (ASM Handbook, Vol. 4, Heat Treating, 1991, from memory) through h = 2Hk with k of 20-40 W/m K',
  },
  radiationMatters: false,
  boilingCurve: {
    label: illustrativeCurveLabel('ISO 9950 or ASTM D6200, the published cooling-curve tests for quench oils; from memory'),
    drawnForBathC: 60,
    convectionBelowC: 320,
    filmAboveC: 700,
    // [surface degC, W/m2 K]
    hWPerM2KBySurfaceC: [
      [60, 500],
      [250, 550],
      [320, 800],
      [420, 2500],
      [520, 4000],
      [620, 3200],
      [700, 1000],
      [780, 500],
      [1100, 450],
    ],
  },
  cautions: [
    QUENCH_OIL_FIRE_CAUTION.text,
    WATER_IN_OIL_CAUTION.text,
    'Agitators must keep the load below the oil surface and must not draw air into the oil; stop them only as the procedure says.',
    CRACKING_CAUTION.text,
    DEFER_CAUTION.text,
  ],
};
