// Aqueous polymer quenchant (e.g. a polyalkylene glycol solution in water).
import type { MediumEntry } from '../libraryEntrySchema';
import { CRACKING_CAUTION, DEFER_CAUTION, STEAM_CAUTION } from '../cautions';
import { illustrativeCurveLabel } from './illustrativeCurveLabel';

export const polymerQuenchant: MediumEntry = {
  id: 'polymer-quenchant',
  name: 'Polymer quenchant (aqueous, about 10-20 %)',
  description:
    'A water solution of a quench polymer. A polymer-rich film forms on the hot part and slows the first stage; severity lies between oil and water and is set by concentration, bath temperature and agitation.',
  phase: 'liquid',
  temperatureC: { min: 20, max: 55, suggested: 40, source: 'common practice; follow the quenchant supplier' },
  hWPerM2K: {
    min: 700,
    max: 3500,
    suggested: 1500,
    source:
      'common practice, broad on purpose: it moves with concentration, temperature and agitation (see Totten, Bates and Clinton, Handbook of Quenchants and Quenching Technology, ASM International, 1993, from memory)',
  },
  radiationMatters: false,
  boilingCurve: {
    label: illustrativeCurveLabel('ASTM D6482, the published agitated cooling-curve test for aqueous polymer quenchants; from memory'),
    drawnForBathC: 40,
    convectionBelowC: 110,
    filmAboveC: 650,
    // [surface degC, W/m2 K]
    hWPerM2KBySurfaceC: [
      [40, 800],
      [110, 1500],
      [150, 4000],
      [250, 6500],
      [350, 7000],
      [450, 5000],
      [550, 2000],
      [650, 800],
      [800, 500],
      [1100, 450],
    ],
  },
  cautions: [
    'Measure and correct the concentration as the supplier and the site procedure say (for example by refractometer); the quench severity follows it, and drag-out, contamination and ageing shift it.',
    STEAM_CAUTION.text,
    CRACKING_CAUTION.text,
    DEFER_CAUTION.text,
  ],
};
