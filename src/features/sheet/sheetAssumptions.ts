// The assumptions a stage sheet states, read from the plan and the result (no physics here).
import type { PlanK, PropertyInput, ShapeKind } from '@/schema/planSchema';
import type { PlanResult } from '@/engine/plan/planResult';

const SHAPE_IDEALISATION: Record<ShapeKind, string> = {
  plate: 'The plate is taken as infinitely wide: heat leaves through both faces only, edges are ignored. Figures are per m² of one face.',
  'plate-insulated-back': 'The plate is taken as infinitely wide with a perfectly insulated back face: heat leaves through the front face only. Figures are per m² of that face.',
  'long-cylinder': 'The bar is taken as infinitely long: heat leaves through the round surface only, the end faces are ignored. Figures are per m of length.',
  sphere: 'The part is taken as a perfect ball, cooled evenly over its whole surface.',
  'short-cylinder': 'The part is a finite round: heat leaves through the round surface and both end faces, all cooled by the same medium.',
  bar: 'The bar is taken as infinitely long with a rectangular section: heat leaves through its four long faces, the end faces are ignored. Figures are per m of length.',
  block: 'The part is a rectangular block cooled evenly on all six faces.',
};

const isTable = (p: PropertyInput) => typeof p !== 'number';

export function sheetAssumptions(plan: PlanK, result: PlanResult | undefined): string[] {
  const m = plan.part.material;
  const tabled = (
    [
      ['conductivity', m.conductivityWPerMK],
      ['density', m.densityKgPerM3],
      ['specific heat', m.specificHeatJPerKgK],
    ] as const
  ).filter(([, p]) => isTable(p)).map(([name]) => name);
  const properties =
    tabled.length === 0
      ? 'Material properties are constant (one value each for conductivity, density and specific heat).'
      : `Material properties vary with temperature (${tabled.join(', ')} from tables). Stages solved by the lumped or exact-series method use constant properties taken at one temperature per stage; the finite-volume method follows the tables.`;
  const withRadiation = plan.stages.map((s, i) => (s.medium.radiation ? i + 1 : null)).filter((i): i is number => i !== null);
  const radiation =
    withRadiation.length === 0
      ? 'Radiation from the surface is left out in every stage (convection only).'
      : withRadiation.length === plan.stages.length
        ? 'Radiation from the surface is included in every stage, to surroundings at the medium temperature unless stated.'
        : `Radiation from the surface is included in stage${withRadiation.length > 1 ? 's' : ''} ${withRadiation.join(', ')} only; the other stages are convection only.`;
  const methods = result ? [...new Set(result.stages.map((s) => s.method))].join(', ') : 'not computed yet';
  return [
    SHAPE_IDEALISATION[plan.part.shape.kind],
    'The part starts at one uniform temperature; each stage starts from the temperature field the previous stage left.',
    properties,
    'The heat transfer coefficient is the same over the whole cooled surface at any moment; agitation, part orientation and vapour blankets that differ from place to place are not modelled beyond the h or h(surface T) given.',
    radiation,
    'Heat released or absorbed by phase changes in the part appears only through the specific heat given; transformations, stresses and hardness are not computed.',
    `Methods used: ${methods}.`,
    ...(result && !result.crossChecked ? ['These results come from a quick pass: the stages were not cross-checked by a second method. Let the full computation finish before printing a sheet to hand on.'] : []),
  ];
}
