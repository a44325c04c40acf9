// Austenitic stainless steel of the 18 % Cr - 8 % Ni type (AISI 304).
import type { MaterialEntry } from '../libraryEntrySchema';

export const austeniticStainlessSteel: MaterialEntry = {
  id: 'austenitic-stainless-steel',
  name: 'Austenitic stainless steel (18 Cr - 8 Ni, AISI 304)',
  description:
    'Austenitic at all temperatures, so there is no transformation peak. Low conductivity (about a third of carbon steel): large parts develop steep gradients.',
  source:
    'Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Table A.1, AISI 304, k and cp at 300-1500 K (from memory); density at 300 K from the same table, at higher temperatures derived here from a mean linear expansion of about 17-19.5e-6 per K (common practice)',
  // [degC, W/m K] (300, 400, 600, 800, 1000, 1200, 1500 K)
  conductivityWPerMK: [
    [26.85, 14.9],
    [126.85, 16.6],
    [326.85, 19.8],
    [526.85, 22.6],
    [726.85, 25.4],
    [926.85, 28.0],
    [1226.85, 31.7],
  ],
  // [degC, kg/m3]
  densityKgPerM3: [
    [26.85, 7900],
    [126.85, 7859],
    [326.85, 7775],
    [526.85, 7691],
    [726.85, 7599],
    [926.85, 7508],
    [1226.85, 7370],
  ],
  // [degC, J/kg K]
  specificHeatJPerKgK: [
    [26.85, 477],
    [126.85, 515],
    [326.85, 557],
    [526.85, 582],
    [726.85, 611],
    [926.85, 640],
    [1226.85, 682],
  ],
  emissivity: {
    min: 0.2,
    max: 0.85,
    suggested: 0.6,
    source: 'bright or polished about 0.2-0.4, oxidised after heat treatment about 0.6-0.85; common practice, see Incropera et al., 6th ed., Table A.11 (from memory)',
  },
  notes: ['No phase change in this range: cp rises smoothly. Sensitisation and sigma-phase questions are outside this tool.'],
  cautions: [],
};
