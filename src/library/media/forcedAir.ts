// Forced air: fans or blowers across the part.
import type { MediumEntry } from '../libraryEntrySchema';
import { DEFER_CAUTION, HOT_PARTS_CAUTION } from '../cautions';

export const forcedAir: MediumEntry = {
  id: 'forced-air',
  name: 'Forced air (fan or blower)',
  description:
    'Air moved across the part by fans or nozzles. h depends strongly on the air speed and on how the air reaches each face; radiation still matters while the part is hot.',
  phase: 'gas',
  temperatureC: { min: 0, max: 40, suggested: 20, source: 'workshop ambient, common practice' },
  hWPerM2K: {
    min: 25,
    max: 250,
    suggested: 50,
    source: 'forced convection of gases, Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Table 1.1 (from memory); a plain fan sits at the low end, common practice',
  },
  radiationMatters: true,
  cautions: [
    HOT_PARTS_CAUTION.text,
    'Fans blow scale and hot particles: guard the area and protect eyes.',
    DEFER_CAUTION.text,
  ],
};
