// Method selection for one stage, as a pure function of the stage's numbers, with its reasons
// written for the user. Order of preference: lumped capacitance when the part is effectively at one
// temperature, the exact series when everything is constant, the finite-volume solver otherwise.
import type { MethodChoice } from '@/schema/planSchema';
import type { MethodId } from '../methods/stageProblem';
import type { MethodVerdict } from './planResult';
import { LUMPED_BIOT_LIMIT } from '../validity/rules';

export interface MethodEligibility {
  biotLumped: number;
  /** The spread lumped capacitance would miss (exact series), K. */
  lumpedErrorK: number;
  lumpedAccuracyLimitK: number;
  constantProperties: boolean;
  hIsConstant: boolean;
  radiation: boolean;
}

export interface MethodSelection {
  method: MethodId;
  forced: boolean;
  reason: string;
  verdicts: MethodVerdict[];
  /** The second method every stage is checked with; 'finite-volume' with refined = true is a tolerance/10 re-run. */
  crossCheck: { method: MethodId; refined: boolean };
}

const n3 = (x: number) => Number(x.toPrecision(3)).toString();

export function judgeMethods(e: MethodEligibility): MethodVerdict[] {
  const lumpedBiotOk = e.biotLumped < LUMPED_BIOT_LIMIT;
  const lumpedAccurate = e.lumpedErrorK <= e.lumpedAccuracyLimitK;
  const lumped: MethodVerdict = {
    method: 'lumped',
    valid: lumpedBiotOk && lumpedAccurate,
    reason: !lumpedBiotOk
      ? `Bi (Lc = V/As) = ${n3(e.biotLumped)} is not below ${LUMPED_BIOT_LIMIT}`
      : !lumpedAccurate
        ? `Bi (Lc = V/As) = ${n3(e.biotLumped)} is below ${LUMPED_BIOT_LIMIT}, but the exact centre-surface spread of ${n3(e.lumpedErrorK)} K exceeds the ${n3(e.lumpedAccuracyLimitK)} K lumped accuracy limit`
        : `Bi (Lc = V/As) = ${n3(e.biotLumped)} < ${LUMPED_BIOT_LIMIT} and the exact centre-surface spread is only ${n3(e.lumpedErrorK)} K`,
  };
  const seriesBlockers = [
    e.constantProperties ? null : 'the material properties depend on temperature',
    e.hIsConstant ? null : 'h depends on the surface temperature',
    e.radiation ? 'the stage includes radiation' : null,
  ].filter((x): x is string => x !== null);
  const series: MethodVerdict = {
    method: 'series',
    valid: seriesBlockers.length === 0,
    reason: seriesBlockers.length === 0 ? 'properties, h and the medium temperature are constant and there is no radiation' : `not exact here: ${seriesBlockers.join('; ')}`,
  };
  const finiteVolume: MethodVerdict = {
    method: 'finite-volume',
    valid: true,
    reason: 'valid for temperature-dependent properties, any h(Ts), radiation and any starting profile',
  };
  return [lumped, series, finiteVolume];
}

export function selectMethod(e: MethodEligibility, choice: MethodChoice): MethodSelection {
  const verdicts = judgeMethods(e);
  const verdict = (m: MethodId) => verdicts.find((v) => v.method === m)!;
  let method: MethodId;
  let reason: string;
  if (choice !== 'auto') {
    method = choice;
    const v = verdict(choice);
    reason = v.valid ? `chosen by hand; valid here: ${v.reason}` : `chosen by hand OUTSIDE its range: ${v.reason}`;
  } else if (verdict('lumped').valid) {
    method = 'lumped';
    reason = `lumped capacitance: ${verdict('lumped').reason}`;
  } else if (verdict('series').valid) {
    method = 'series';
    reason = `exact series: ${verdict('series').reason}; lumped capacitance is out because ${verdict('lumped').reason}`;
  } else {
    method = 'finite-volume';
    reason = `finite-volume: the exact series is ${verdict('series').reason}; lumped capacitance is out because ${verdict('lumped').reason}`;
  }
  const crossCheck: MethodSelection['crossCheck'] =
    method !== 'series' && verdict('series').valid
      ? { method: 'series', refined: false }
      : method !== 'finite-volume'
        ? { method: 'finite-volume', refined: false }
        : { method: 'finite-volume', refined: true };
  return { method, forced: choice !== 'auto', reason, verdicts, crossCheck };
}
