// Soda-lime (plate / container) glass.
import type { MaterialEntry } from '../libraryEntrySchema';

export const sodaLimeGlass: MaterialEntry = {
  id: 'soda-lime-glass',
  name: 'Soda-lime glass',
  description:
    'Ordinary plate and container glass. Very low conductivity: surfaces cool far faster than the inside, which is what makes glass break under thermal shock and what tempering uses.',
  source:
    'Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Table A.3, glass, plate (soda lime), 300 K values (from memory); held constant, since that table gives no temperature dependence',
  // [degC, W/m K]: the 300 K value, held constant across the range.
  conductivityWPerMK: [
    [0, 1.4],
    [500, 1.4],
  ],
  // [degC, kg/m3]
  densityKgPerM3: [
    [0, 2500],
    [500, 2500],
  ],
  // [degC, J/kg K]
  specificHeatJPerKgK: [
    [0, 750],
    [500, 750],
  ],
  emissivity: {
    min: 0.85,
    max: 0.95,
    suggested: 0.9,
    source: 'glass surfaces are nearly black in the thermal infrared; common practice, see Incropera et al., 6th ed., Table A.12, nonmetallic substances (from memory)',
  },
  notes: [
    'Only one temperature was tabulated in the source, so k, rho and cp are held constant. In reality k and especially cp rise with temperature; replace with measured data for work near the annealing or softening range.',
    'Glass is semi-transparent: at high temperature some heat moves by internal radiation, which a conduction model does not capture.',
  ],
  cautions: ['Hot glass looks exactly like cold glass, and glass cooled too fast can shatter: handle with heat-resistant gloves and eye protection as the site requires.'],
};
