// Low-alloy chromium-molybdenum steel (about 1 % Cr, 0.2 % Mo, 0.4 % C), through the transformation range.
import type { MaterialEntry } from '../libraryEntrySchema';

export const lowAlloySteel: MaterialEntry = {
  id: 'low-alloy-cr-mo-steel',
  name: 'Low-alloy Cr-Mo steel (about 1 % Cr, 0.4 % C)',
  description:
    'A through-hardening chromium-molybdenum steel, 20-1200 degC. Alloying lowers the conductivity below that of plain carbon steel at room temperature; in austenite the two come close together.',
  source:
    'ASM Handbook, Vol. 1, Properties and Selection: Irons, Steels, and High-Performance Alloys, 1990, room-temperature k, rho, cp (from memory); higher rows are an approximate trend that meets the carbon-steel values in austenite, as the commercial steels of BISRA, Physical Constants of Some Commercial Steels at Elevated Temperatures, 1953, do (from memory)',
  // [degC, W/m K]
  conductivityWPerMK: [
    [20, 42.6],
    [100, 42.3],
    [200, 40.5],
    [300, 38.5],
    [400, 36.3],
    [500, 33.9],
    [600, 31.3],
    [700, 28.6],
    [800, 26.0],
    [900, 26.9],
    [1000, 28.0],
    [1100, 29.2],
    [1200, 30.0],
  ],
  // [degC, kg/m3]: 7850 kg/m3 at room temperature, lowered by thermal expansion; the step near
  // 800 degC is the denser austenite forming (from memory, approximate).
  densityKgPerM3: [
    [20, 7850],
    [200, 7790],
    [400, 7720],
    [600, 7645],
    [750, 7590],
    [850, 7600],
    [1000, 7520],
    [1200, 7410],
  ],
  // [degC, J/kg K]: effective specific heat; the peak near 730-790 degC carries the latent heat of
  // the change to austenite and the magnetic change (approximate: shaped like the carbon-steel peak,
  // moved to this grade's Ac1-Ac3 range, from memory).
  specificHeatJPerKgK: [
    [20, 460],
    [100, 477],
    [200, 515],
    [300, 550],
    [400, 590],
    [500, 640],
    [600, 710],
    [680, 830],
    [745, 1300],
    [790, 900],
    [850, 630],
    [900, 620],
    [1000, 630],
    [1200, 650],
  ],
  emissivity: {
    min: 0.6,
    max: 0.9,
    suggested: 0.8,
    source: 'oxidised / scaled steel; bright machined steel is far lower (about 0.1-0.3). Common practice; see Incropera et al., 6th ed., Table A.11 (from memory)',
  },
  notes: [
    'The specific heat is an effective heat capacity: the latent heat of the change to austenite (and the magnetic change) is spread over about 730-790 degC as a peak in cp. This is a property approximation, not a transformation model.',
    'On cooling, and especially in a quench, this steel transforms at other, lower temperatures (bainite or martensite, depending on the cooling rate), so the heat release on cooling is not where this table puts it.',
  ],
  cautions: [],
};
