// Still (unagitated) quench oil of normal speed.
import type { MediumEntry } from '../libraryEntrySchema';
import { CRACKING_CAUTION, DEFER_CAUTION, QUENCH_OIL_FIRE_CAUTION, WATER_IN_OIL_CAUTION } from '../cautions';
import { illustrativeCurveLabel } from './illustrativeCurveLabel';

export const stillOil: MediumEntry = {
  id: 'still-oil',
  name: 'Quench oil, still',
  description:
    'A mineral quench oil of normal speed without agitation, held warm. Milder than water: a long vapour-film stage, boiling in the mid range, slow convection below about 300 degC. The constant-h option is an effective average.',
  phase: 'liquid',
  temperatureC: { min: 40, max: 80, suggested: 60, source: 'usual bath range for conventional quench oils, common practice; follow the oil supplier' },
  hWPerM2K: {
    min: 400,
    max: 950,
    suggested: 600,
    source:
      'common practice; matches a Grossmann severity H of about 0.25-0.30 per inch for unagitated oil (ASM Handbook, Vol. 4, Heat Treating, 1991, from memory) through h = 2Hk with k of 20-40 W/m K',
  },
  radiationMatters: false,
  boilingCurve: {
    label: illustrativeCurveLabel('ISO 9950 or ASTM D6200, the published cooling-curve tests for quench oils; from memory'),
    drawnForBathC: 60,
    convectionBelowC: 300,
    filmAboveC: 650,
    // [surface degC, W/m2 K]
    hWPerM2KBySurfaceC: [
      [60, 300],
      [200, 320],
      [300, 450],
      [400, 1800],
      [500, 2800],
      [550, 3000],
      [600, 2400],
      [650, 800],
      [700, 350],
      [850, 280],
      [1100, 280],
    ],
  },
  cautions: [QUENCH_OIL_FIRE_CAUTION.text, WATER_IN_OIL_CAUTION.text, CRACKING_CAUTION.text, DEFER_CAUTION.text],
};
