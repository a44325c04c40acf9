// Pure (commercially pure) copper.
import type { MaterialEntry } from '../libraryEntrySchema';

export const pureCopper: MaterialEntry = {
  id: 'pure-copper',
  name: 'Copper, pure',
  description: 'Very high conductivity: almost any copper part of everyday size cools as a lumped body in air or oil. Tables cover -73 to 927 degC.',
  source:
    'Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Table A.1, pure copper, k and cp at 200-1200 K (from memory); density at 300 K from the same table, at higher temperatures derived here from a mean linear expansion of about 17-20e-6 per K (common practice)',
  // [degC, W/m K] (200, 300, 400, 600, 800, 1000, 1200 K)
  conductivityWPerMK: [
    [-73.15, 413],
    [26.85, 401],
    [126.85, 393],
    [326.85, 379],
    [526.85, 366],
    [726.85, 352],
    [926.85, 339],
  ],
  // [degC, kg/m3]
  densityKgPerM3: [
    [26.85, 8933],
    [126.85, 8888],
    [326.85, 8793],
    [526.85, 8691],
    [726.85, 8584],
    [926.85, 8468],
  ],
  // [degC, J/kg K]
  specificHeatJPerKgK: [
    [-73.15, 356],
    [26.85, 385],
    [126.85, 397],
    [326.85, 417],
    [526.85, 433],
    [726.85, 451],
    [926.85, 480],
  ],
  emissivity: {
    min: 0.03,
    max: 0.8,
    suggested: 0.6,
    source: 'polished about 0.03-0.05, oxidised as after heating in air about 0.5-0.8; common practice, see Incropera et al., 6th ed., Table A.11 (from memory)',
  },
  notes: ['Commercial coppers and copper alloys (brass, bronze) conduct far less; use their own data.'],
  cautions: [],
};
