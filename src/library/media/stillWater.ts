// Still (unagitated) water quench.
import type { MediumEntry } from '../libraryEntrySchema';
import { CRACKING_CAUTION, DEFER_CAUTION, STEAM_CAUTION } from '../cautions';
import { illustrativeCurveLabel } from './illustrativeCurveLabel';

export const stillWater: MediumEntry = {
  id: 'still-water',
  name: 'Water, still',
  description:
    'Plain water without agitation. A severe quench: a vapour film forms first, then violent nucleate boiling, then convection. The constant-h option is an effective average; the boiling curve shows how h changes with surface temperature.',
  phase: 'liquid',
  temperatureC: { min: 10, max: 50, suggested: 25, source: 'common practice; warm water quenches more gently and less evenly' },
  hWPerM2K: {
    min: 1400,
    max: 3200,
    suggested: 2000,
    source:
      'common practice; matches a Grossmann severity H of about 0.9-1.0 per inch for unagitated water (ASM Handbook, Vol. 4, Heat Treating, 1991, from memory) through h = 2Hk with k of 20-40 W/m K',
  },
  radiationMatters: false,
  boilingCurve: {
    label: illustrativeCurveLabel('for example a probe test in the manner of ISO 9950 / ASTM D6200, which are written for oils; from memory'),
    drawnForBathC: 25,
    convectionBelowC: 105,
    filmAboveC: 600,
    // [surface degC, W/m2 K]
    hWPerM2KBySurfaceC: [
      [25, 700],
      [80, 1000],
      [105, 2500],
      [200, 12000],
      [300, 15000],
      [400, 9000],
      [500, 3000],
      [600, 600],
      [700, 400],
      [900, 350],
      [1200, 350],
    ],
  },
  cautions: [STEAM_CAUTION.text, CRACKING_CAUTION.text, 'Keep water and steam away from any oil tank or salt bath nearby.', DEFER_CAUTION.text],
};
