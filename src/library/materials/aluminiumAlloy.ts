// Aluminium-copper alloy 2024 in the T6 temper.
import type { MaterialEntry } from '../libraryEntrySchema';

export const aluminiumAlloy: MaterialEntry = {
  id: 'aluminium-alloy-2024',
  name: 'Aluminium alloy 2024-T6',
  description:
    'A heat-treatable aluminium-copper alloy. High conductivity: parts cool nearly uniformly unless they are thick or the quench is severe. Tables cover -73 to 327 degC.',
  source:
    'Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Table A.1, aluminium alloy 2024-T6, k and cp at 200-600 K (from memory); density at 300 K from the same table, at other temperatures derived here from a linear expansion of about 23e-6 per K (common practice)',
  // [degC, W/m K] (200, 300, 400, 600 K)
  conductivityWPerMK: [
    [-73.15, 163],
    [26.85, 177],
    [126.85, 186],
    [326.85, 186],
  ],
  // [degC, kg/m3]
  densityKgPerM3: [
    [-73.15, 2789],
    [26.85, 2770],
    [126.85, 2751],
    [326.85, 2714],
  ],
  // [degC, J/kg K]
  specificHeatJPerKgK: [
    [-73.15, 787],
    [26.85, 875],
    [126.85, 925],
    [326.85, 1042],
  ],
  emissivity: {
    min: 0.03,
    max: 0.3,
    suggested: 0.1,
    source: 'polished about 0.04, mill finish or lightly oxidised about 0.1-0.2, anodised surfaces far higher (about 0.8); common practice, see Incropera et al., 6th ed., Table A.11 (from memory)',
  },
  notes: [
    'Above 327 degC (for example a quench from solution treatment near 500 degC) the last row is held constant, so cp there is somewhat low; add measured data for your alloy if that matters.',
    'Precipitation and melting near the solution temperature are not represented.',
  ],
  cautions: [],
};
