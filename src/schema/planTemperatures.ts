// Converting a plan's temperatures between degC and kelvin. Only temperatures change unit;
// every other number in a plan is SI already.
import type { Plan, PlanK, PropertyInput, Stage, Material } from './planSchema';

/** Offset between the Celsius and kelvin scales (BIPM, The International System of Units, 9th ed., 2019). */
export const KELVIN_OFFSET = 273.15;

type Convert = (t: number) => number;

function mapProperty(p: PropertyInput, f: Convert): PropertyInput {
  return typeof p === 'number' ? p : { table: p.table.map(([t, v]) => [f(t), v] as [number, number]) };
}

function mapMaterial(m: Material, f: Convert): Material {
  return {
    ...m,
    conductivityWPerMK: mapProperty(m.conductivityWPerMK, f),
    densityKgPerM3: mapProperty(m.densityKgPerM3, f),
    specificHeatJPerKgK: mapProperty(m.specificHeatJPerKgK, f),
  };
}

function mapStage(s: Stage, f: Convert): Stage {
  const { medium } = s;
  return {
    ...s,
    medium: {
      ...medium,
      temperature: f(medium.temperature),
      heatTransfer:
        medium.heatTransfer.kind === 'constant'
          ? medium.heatTransfer
          : { kind: 'surface-table', rows: medium.heatTransfer.rows.map(([t, h]) => [f(t), h] as [number, number]) },
      ...(medium.radiation
        ? {
            radiation: {
              ...medium.radiation,
              ...(medium.radiation.surroundingsTemperature === undefined ? {} : { surroundingsTemperature: f(medium.radiation.surroundingsTemperature) }),
            },
          }
        : {}),
    },
    end: s.end.kind === 'point-temperature' ? { ...s.end, temperature: f(s.end.temperature) } : s.end,
  };
}

/** Apply one conversion to every temperature in the plan body. */
export function mapPlanTemperatures<P extends Plan>(plan: P, f: Convert, unit: Plan['temperatureUnit']): P {
  return {
    ...plan,
    temperatureUnit: unit,
    initialTemperature: f(plan.initialTemperature),
    part: { ...plan.part, material: mapMaterial(plan.part.material, f) },
    stages: plan.stages.map((s) => mapStage(s, f)),
  };
}

/** Round away the last bits of float noise so that degC -> K -> degC gives back the typed number. */
const tidy = (x: number) => Number(x.toPrecision(12));

export const celsiusToKelvin = (celsius: number) => tidy(celsius + KELVIN_OFFSET);
export const kelvinToCelsius = (kelvin: number) => tidy(kelvin - KELVIN_OFFSET);

export function toKelvinPlan(plan: Plan): PlanK {
  if (plan.temperatureUnit === 'K') return plan as PlanK;
  return mapPlanTemperatures(plan, celsiusToKelvin, 'K') as PlanK;
}

export function toCelsiusPlan(plan: Plan): Plan {
  if (plan.temperatureUnit === 'degC') return plan;
  return mapPlanTemperatures(plan, kelvinToCelsius, 'degC');
}
