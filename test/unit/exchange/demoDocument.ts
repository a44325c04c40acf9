// Demo plans of our own invention for the exchange tests: a steel pin taken from a furnace,
// carried through air, then either held in still air or dropped into an agitated liquid bath.
// Property numbers are demo values near those of a plain carbon steel
// (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Table A.1, from memory).
import type { Plan, PlanK } from '@/schema/planSchema';
import { toKelvinPlan } from '@/schema/planTemperatures';
import { EMPTY_SHEET_META, type PlanDocument } from '@/schema/planDocument';

export const demoPlanCelsius: Plan = {
  format: 'coolstage-plan',
  version: 1,
  temperatureUnit: 'degC',
  name: 'Pin 40 mm, air then hold',
  part: {
    shape: { kind: 'long-cylinder', radiusM: 0.02 },
    material: { name: 'Demo carbon steel', source: 'demo values near Incropera 6th ed. Table A.1 (from memory)', conductivityWPerMK: 45, densityKgPerM3: 7850, specificHeatJPerKgK: 480 },
  },
  initialTemperature: 850,
  stages: [
    { name: 'Transfer', medium: { name: 'still air', temperature: 25, heatTransfer: { kind: 'constant', hWPerM2K: 15 }, radiation: { emissivity: 0.8 } }, end: { kind: 'duration', seconds: 20 }, method: 'auto' },
    { name: 'Hold', medium: { name: 'still air', temperature: 25, heatTransfer: { kind: 'constant', hWPerM2K: 10 } }, end: { kind: 'point-temperature', point: 'centre', temperature: 600 }, method: 'auto' },
  ],
};

export const demoPlanK: PlanK = toKelvinPlan(demoPlanCelsius);

/** The same pin, but the second stage is an agitated liquid bath with a boiling-curve h(Ts). */
export const bathVariantK: PlanK = toKelvinPlan({
  ...demoPlanCelsius,
  name: 'Pin 40 mm, air then bath',
  stages: [
    demoPlanCelsius.stages[0],
    {
      name: 'Bath',
      medium: { name: 'agitated liquid bath', temperature: 60, heatTransfer: { kind: 'surface-table', rows: [[60, 400], [300, 2500], [550, 3000], [850, 600]] } },
      end: { kind: 'point-temperature', point: 'centre', temperature: 100 },
      method: 'auto',
    },
  ],
});

export const demoDocument: PlanDocument = {
  main: demoPlanK,
  variants: [{ id: 'v1', name: 'Bath instead of hold', plan: bathVariantK }],
  sheet: { ...EMPTY_SHEET_META, revision: 'B', preparedBy: 'A. Example', date: '2026-12-01' },
};
