// Brine quench: water with a few percent of common salt.
import type { MediumEntry } from '../libraryEntrySchema';
import { CRACKING_CAUTION, DEFER_CAUTION, STEAM_CAUTION } from '../cautions';
import { illustrativeCurveLabel } from './illustrativeCurveLabel';

export const brine: MediumEntry = {
  id: 'brine',
  name: 'Brine (salt water), still or mildly agitated',
  description:
    'Water with roughly 5-10 % sodium chloride. The salt breaks up the vapour film, so nucleate boiling starts almost at once: the most severe of the usual liquid quenches.',
  phase: 'liquid',
  temperatureC: { min: 10, max: 40, suggested: 25, source: 'common practice' },
  hWPerM2K: {
    min: 3150,
    max: 6900,
    suggested: 4500,
    source:
      'common practice; matches a Grossmann severity H of about 2.0-2.2 per inch for still to mildly agitated brine (ASM Handbook, Vol. 4, Heat Treating, 1991, from memory) through h = 2Hk with k of 20-40 W/m K',
  },
  radiationMatters: false,
  boilingCurve: {
    label: illustrativeCurveLabel('for example a probe test in the manner of ISO 9950 / ASTM D6200, which are written for oils; from memory'),
    drawnForBathC: 25,
    convectionBelowC: 105,
    filmAboveC: 800,
    // [surface degC, W/m2 K]
    hWPerM2KBySurfaceC: [
      [25, 2500],
      [105, 4500],
      [200, 15000],
      [350, 22000],
      [500, 18000],
      [650, 9000],
      [800, 3000],
      [1200, 2000],
    ],
  },
  cautions: [
    STEAM_CAUTION.text,
    CRACKING_CAUTION.text,
    'Brine corrodes parts, fixtures and tanks: rinse and dry parts after the quench as the procedure says.',
    DEFER_CAUTION.text,
  ],
};
