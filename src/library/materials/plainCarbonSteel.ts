// Plain carbon steel, about 0.2 % C (a structural / case-hardening grade), through the transformation range.
import type { MaterialEntry } from '../libraryEntrySchema';

export const plainCarbonSteel: MaterialEntry = {
  id: 'plain-carbon-steel',
  name: 'Plain carbon steel (about 0.2 % C)',
  description:
    'Unalloyed steel with roughly 0.2 % carbon, from room temperature into the austenite range (20-1200 degC). Conductivity falls with temperature up to the transformation and rises slightly in austenite.',
  source:
    'BISRA, Physical Constants of Some Commercial Steels at Elevated Temperatures, Butterworths, 1953, 0.23 % C steel (from memory, rounded); cross-checked against Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Table A.1, plain carbon steel (from memory)',
  // [degC, W/m K]
  conductivityWPerMK: [
    [20, 51.9],
    [100, 51.1],
    [200, 49.0],
    [300, 46.1],
    [400, 42.7],
    [500, 39.4],
    [600, 35.6],
    [700, 31.8],
    [800, 26.0],
    [900, 27.2],
    [1000, 28.5],
    [1100, 29.7],
    [1200, 30.1],
  ],
  // [degC, kg/m3]: 7860 kg/m3 at room temperature, lowered by thermal expansion; the step near
  // 750-800 degC is the denser austenite forming (from memory, approximate).
  densityKgPerM3: [
    [20, 7860],
    [200, 7800],
    [400, 7730],
    [600, 7655],
    [700, 7620],
    [800, 7630],
    [900, 7580],
    [1000, 7525],
    [1200, 7415],
  ],
  // [degC, J/kg K]: effective specific heat; the peak near 700-775 degC carries the latent heat of
  // the ferrite/pearlite-to-austenite change and the magnetic change (from memory, rounded).
  specificHeatJPerKgK: [
    [20, 450],
    [100, 486],
    [200, 519],
    [300, 557],
    [400, 599],
    [500, 662],
    [600, 749],
    [675, 846],
    [725, 1432],
    [775, 950],
    [850, 620],
    [900, 620],
    [1000, 640],
    [1100, 650],
    [1200, 660],
  ],
  emissivity: {
    min: 0.6,
    max: 0.9,
    suggested: 0.8,
    source: 'oxidised / scaled steel; bright machined steel is far lower (about 0.1-0.3). Common practice; see Incropera et al., 6th ed., Table A.11 (from memory)',
  },
  notes: [
    'The specific heat is an effective heat capacity: the latent heat of the ferrite/pearlite-to-austenite transformation (and the magnetic change) is spread over about 700-780 degC as a peak in cp. This is a property approximation, not a transformation model.',
    'On heating the peak sits near the Ac1-Ac3 range. On cooling, and especially in a quench, steel transforms at other, lower temperatures (to ferrite/pearlite, bainite or martensite depending on the cooling rate), so the heat release on cooling is not at the place this table puts it.',
  ],
  cautions: [],
};
