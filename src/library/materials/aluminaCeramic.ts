// Dense polycrystalline aluminium oxide (alumina) ceramic.
import type { MaterialEntry } from '../libraryEntrySchema';

export const aluminaCeramic: MaterialEntry = {
  id: 'alumina-ceramic',
  name: 'Alumina ceramic (dense polycrystalline Al2O3)',
  description:
    'A dense technical ceramic. Conductivity falls steeply with temperature (to about a quarter between room temperature and 730 degC); ceramics tolerate little thermal shock.',
  source:
    'Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Table A.2, aluminium oxide, polycrystalline, 300-1000 K (from memory); density at 300 K from the same table, at higher temperatures derived here from a mean linear expansion of about 8e-6 per K (common practice)',
  // [degC, W/m K] (300, 400, 600, 800, 1000 K)
  conductivityWPerMK: [
    [26.85, 36.0],
    [126.85, 26.4],
    [326.85, 15.8],
    [526.85, 10.4],
    [726.85, 7.85],
  ],
  // [degC, kg/m3]
  densityKgPerM3: [
    [26.85, 3970],
    [326.85, 3943],
    [726.85, 3904],
  ],
  // [degC, J/kg K]
  specificHeatJPerKgK: [
    [26.85, 765],
    [126.85, 940],
    [326.85, 1110],
    [526.85, 1180],
    [726.85, 1225],
  ],
  emissivity: {
    min: 0.4,
    max: 0.8,
    suggested: 0.7,
    source: 'falls with temperature, about 0.7 near 600 K and about 0.4-0.55 above 1000 K; Incropera et al., 6th ed., Table A.12, aluminium oxide (from memory)',
  },
  notes: ['Porous or lower-purity aluminas (for example 96 %) conduct noticeably less; use their own data.'],
  cautions: ['Ceramics can crack or burst under fast cooling; follow the supplier\'s limits on cooling rate.'],
};
