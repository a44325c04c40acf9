// A water-rich food: a lean-meat-like product, above freezing only.
import type { MaterialEntry } from '../libraryEntrySchema';

/** Mass fractions assumed for this entry (an invented, lean-meat-like demo composition). */
export const LEAN_MEAT_COMPOSITION = { water: 0.74, protein: 0.21, fat: 0.04, ash: 0.01 } as const;

export const leanMeatProduct: MaterialEntry = {
  id: 'lean-meat-product',
  name: 'Water-rich food, lean-meat-like (above freezing)',
  description:
    'A cooked lean-meat-like product of assumed composition 74 % water, 21 % protein, 4 % fat, 1 % ash, from 0 to 90 degC. Not valid at or below the initial freezing point (a little below 0 degC).',
  source:
    'Choi and Okos, Effects of temperature and composition on the thermal properties of foods, in Food Engineering and Process Applications, Vol. 1, Elsevier, 1986, component correlations with mass-fraction cp, volume-fraction (parallel) k and ideal-mixture density, as given in ASHRAE Handbook, Refrigeration, chapter Thermal Properties of Foods (from memory)',
  // [degC, W/m K]
  conductivityWPerMK: [
    [0, 0.487],
    [10, 0.502],
    [20, 0.516],
    [30, 0.528],
    [40, 0.54],
    [50, 0.55],
    [60, 0.56],
    [70, 0.568],
    [80, 0.575],
    [90, 0.582],
  ],
  // [degC, kg/m3]
  densityKgPerM3: [
    [0, 1055.6],
    [20, 1052.6],
    [40, 1047.1],
    [60, 1039.1],
    [80, 1028.6],
    [90, 1022.4],
  ],
  // [degC, J/kg K]
  specificHeatJPerKgK: [
    [0, 3602],
    [20, 3609],
    [40, 3619],
    [60, 3631],
    [80, 3646],
    [90, 3655],
  ],
  emissivity: {
    min: 0.85,
    max: 0.95,
    suggested: 0.9,
    source: 'moist surfaces are close to water, about 0.95; common practice, see Incropera et al., 6th ed., Table A.12, nonmetallic substances (from memory)',
  },
  notes: [
    'Composition is an invented demo value; use the composition of your product, or measured properties.',
    'Surface moisture evaporation, which speeds up cooling in open air, and freezing are not represented.',
  ],
  cautions: [
    'Food safety: cooling-time and temperature limits for cooked food are set by local food codes and the site\'s food safety plan. This tool estimates temperatures; it does not certify that a cooling process is safe. Confirm with calibrated probe measurements and qualified people.',
  ],
};
