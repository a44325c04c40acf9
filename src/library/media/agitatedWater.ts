// Agitated water quench: moderate to strong circulation or a pumped flow.
import type { MediumEntry } from '../libraryEntrySchema';
import { CRACKING_CAUTION, DEFER_CAUTION, STEAM_CAUTION } from '../cautions';
import { illustrativeCurveLabel } from './illustrativeCurveLabel';

export const agitatedWater: MediumEntry = {
  id: 'agitated-water',
  name: 'Water, agitated',
  description:
    'Water with moderate to strong circulation. Agitation breaks the vapour film early, so boiling starts at a higher surface temperature and h is higher and more even than in still water.',
  phase: 'liquid',
  temperatureC: { min: 10, max: 50, suggested: 25, source: 'common practice' },
  hWPerM2K: {
    min: 1900,
    max: 6300,
    suggested: 3500,
    source:
      'common practice; matches a Grossmann severity H of about 1.2-2.0 per inch for moderately to strongly agitated water (ASM Handbook, Vol. 4, Heat Treating, 1991, from memory) through h = 2Hk with k of 20-40 W/m K',
  },
  radiationMatters: false,
  boilingCurve: {
    label: illustrativeCurveLabel('for example a probe test with agitation in the manner of ASTM D6482 or ASTM D6549; from memory'),
    drawnForBathC: 25,
    convectionBelowC: 105,
    filmAboveC: 700,
    // [surface degC, W/m2 K]
    hWPerM2KBySurfaceC: [
      [25, 2000],
      [105, 3500],
      [200, 14000],
      [300, 20000],
      [450, 14000],
      [600, 4000],
      [700, 1200],
      [800, 800],
      [1200, 700],
    ],
  },
  cautions: [STEAM_CAUTION.text, CRACKING_CAUTION.text, DEFER_CAUTION.text],
};
