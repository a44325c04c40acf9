// Still air: free convection plus radiation, e.g. a part cooling on a rack or during a transfer.
import type { MediumEntry } from '../libraryEntrySchema';

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
  cautions: [
    'Parts cooling in air stay hot long after they stop glowing: mark them, fence the cooling area, and handle them only with suitable gloves and tongs.',
    'Follow the site procedures for hot work and the protective equipment set by local codes and qualified people.',
  ],
};
