// Results as CSV (RFC 4180): one row per sampled time, one column per reported point, units in
// the header. Every number is read from the PlanResult; only the temperature scale is changed.
import type { PlanResult, StageResult } from '@/engine/plan/planResult';
import type { PointId } from '@/schema/planSchema';
import { safeFileName } from './safeFileName';
import { KELVIN_AT_ZERO_CELSIUS, FAHRENHEIT_AT_ZERO_CELSIUS, KELVIN_PER_FAHRENHEIT_DEGREE } from '@/features/units/usCustomaryFactors';

export type CsvTemperatureUnit = 'degC' | 'degF' | 'K';

const FROM_KELVIN: Record<CsvTemperatureUnit, (k: number) => number> = {
  degC: (k) => k - KELVIN_AT_ZERO_CELSIUS,
  degF: (k) => (k - KELVIN_AT_ZERO_CELSIUS) / KELVIN_PER_FAHRENHEIT_DEGREE + FAHRENHEIT_AT_ZERO_CELSIUS,
  K: (k) => k,
};

/** Decimals written: 1 ms in time, 0.001 K in temperature, well below what any method resolves. */
const TIME_DECIMALS = 3;
const TEMPERATURE_DECIMALS = 3;

const LINE_END = '\r\n';

export interface CsvOptions {
  temperatureUnit: CsvTemperatureUnit;
  /** One stage only (its index in the plan), or the whole plan when left out. */
  stageIndex?: number;
}

function cell(value: string | number): string {
  const text = String(value);
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

const fixed = (x: number, decimals: number) => (Number.isFinite(x) ? String(Number(x.toFixed(decimals))) : '');

export function planResultToCsv(result: PlanResult, options: CsvOptions): string {
  const stages: StageResult[] = options.stageIndex === undefined ? result.stages : result.stages.filter((s) => s.index === options.stageIndex);
  const points: { id: PointId; label: string }[] = result.points.filter((p) => stages.some((s) => s.curves.temperaturesK[p.id]));
  const unit = options.temperatureUnit;
  const toUnit = FROM_KELVIN[unit];
  const header = ['time from plan start [s]', 'time in stage [s]', 'stage', 'stage name', ...points.map((p) => (p.label === p.id ? `${p.id} [${unit}]` : `${p.id} (${p.label}) [${unit}]`))];
  const rows = [header.map(cell).join(',')];
  for (const stage of stages) {
    stage.curves.timeS.forEach((t, i) => {
      const temperatures = points.map((p) => {
        const series = stage.curves.temperaturesK[p.id];
        return series ? fixed(toUnit(series[i]), TEMPERATURE_DECIMALS) : '';
      });
      rows.push([fixed(t, TIME_DECIMALS), fixed(t - stage.startTimeS, TIME_DECIMALS), stage.index + 1, cell(stage.name), ...temperatures].join(','));
    });
  }
  return rows.join(LINE_END) + LINE_END;
}

/** A file name for the export: plan name made safe, the stage when there is one. */
export function csvFileName(result: PlanResult, stageIndex?: number): string {
  return safeFileName(stageIndex === undefined ? result.planName : `${result.planName}-stage-${stageIndex + 1}`, 'csv');
}
