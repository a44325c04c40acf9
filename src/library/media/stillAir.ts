// Still air: free convection plus radiation, e.g. a part cooling on a rack or during a transfer.
import type { MediumEntry } from '../libraryEntrySchema';
import { DEFER_CAUTION, HOT_PARTS_CAUTION } from '../cautions';

export const stillAir: MediumEntry = {
  id: 'still-air',
  name: 'Still air (free convection)',
  description:
    'Room air with no fan: free convection only. Around hot parts radiation usually carries more heat than convection, so keep radiation on with the part surface emissivity.',
  phase: 'gas',
  temperatureC: { min: 0, max: 40, suggested: 20, source: 'workshop ambient, common practice' },
  hWPerM2K: {
    min: 2,
    max: 25,
    suggested: 10,
    source: 'free convection of gases, Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Table 1.1 (from memory); convection only, radiation is added separately',
  },
  radiationMatters: true,
  cautions: [HOT_PARTS_CAUTION.text, DEFER_CAUTION.text],
};
