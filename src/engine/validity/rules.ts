// Validity rules as data: each rule states itself, its source, when it trips, and what to do.
// The plan runner gathers StageFacts per stage and runs every rule over them.
import type { EngineWarning, WarningSeverity } from './warning';
import type { StageFacts } from './stageFacts';

/** Lumped capacitance needs Bi on Lc = V/As below 0.1: common practice (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Eq. 5.10, from memory). */
export const LUMPED_BIOT_LIMIT = 0.1;
/** The one-term series approximation needs Fo above 0.2: common practice (Incropera et al., 6th ed., Sec. 5.5.2, from memory). */
export const ONE_TERM_FOURIER_LIMIT = 0.2;
/** Radiation left out matters once its linearised coefficient exceeds this share of h (common practice). */
export const RADIATION_SHARE_LIMIT = 0.1;
/** Constant properties are a poor stand-in once a property varies more than this over the stage (common practice). */
export const PROPERTY_VARIATION_LIMIT = 0.2;
/** h above this is a liquid, not a gas: forced gas convection spans about 25-250 W/m²K (Incropera et al., 6th ed., Table 1.1, from memory). */
export const LIQUID_H_THRESHOLD_WPERM2K = 300;
/** An energy balance worse than this points at a numerical problem (the solvers reach about 1e-9). */
export const ENERGY_ERROR_LIMIT = 1e-5;

export interface ValidityRule {
  id: string;
  severity: WarningSeverity;
  /** The rule in words, with its source. */
  rule: string;
  trips(f: StageFacts): boolean;
  message(f: StageFacts): string;
  advice(f: StageFacts): string;
  numbers(f: StageFacts): Record<string, number>;
}

const fmt = (x: number, digits = 3) => (Math.abs(x) >= 1e4 || (Math.abs(x) < 1e-3 && x !== 0) ? x.toExponential(2) : Number(x.toPrecision(digits)).toString());

/** What to do about a cross-check difference: it depends on what the stage was checked against. */
function crossCheckAdvice(f: StageFacts): string {
  const check = f.crossCheck!;
  if (f.method === 'lumped') return 'The part is not at one temperature here: use the finite-volume method.';
  if (!check.refined) return `The two methods disagree beyond their tolerances: force the ${check.method} method, which is valid here, and compare again.`;
  const boiling = f.hIsConstant ? '' : ' In a boiling-curve bath a film collapse magnifies small differences, and on finite shapes the grid places the wetting front only to about this figure.';
  return `The difference is the solver's own discretisation error at the plan tolerance, and the refined run is the closer one: read this stage's temperatures as uncertain by about ${fmt(check.maxDifferenceK, 2)} K, or tighten the plan tolerance and compare again.${boiling}`;
}

const degC = (k: number) => `${fmt(k - 273.15, 4)} °C`;
const pct = (x: number) => `${fmt(100 * x, 3)}%`;

export const VALIDITY_RULES: ValidityRule[] = [
  {
    id: 'forced-method-outside-range',
    severity: 'warning',
    rule: 'A method chosen by hand is computed even outside its validity range, but its result is not to be trusted there.',
    trips: (f) => f.forced && !f.methodValid,
    message: (f) => `The ${f.method} method was forced here although ${f.methodInvalidReason ?? 'its validity rule does not hold'}.`,
    advice: () => 'Set the stage method to automatic, or read the cross-check difference before using this result.',
    numbers: (f) => ({ biotLumped: f.biotLumped, biotSeries: f.biotSeries }),
  },
  {
    id: 'lumped-biot-limit',
    severity: 'warning',
    rule: `Lumped capacitance assumes a uniform temperature; it needs Bi (Lc = V/As) < ${LUMPED_BIOT_LIMIT} (common practice; Incropera et al., Eq. 5.10).`,
    trips: (f) => f.method === 'lumped' && f.biotLumped >= LUMPED_BIOT_LIMIT,
    message: (f) => `Bi on Lc = V/As is ${fmt(f.biotLumped)}, at or above ${LUMPED_BIOT_LIMIT}: the part is not at one temperature.`,
    advice: () => 'Use the exact series or the finite-volume method for this stage.',
    numbers: (f) => ({ biotLumped: f.biotLumped, limit: LUMPED_BIOT_LIMIT }),
  },
  {
    id: 'lumped-error',
    severity: 'caution',
    rule: 'Lumped capacitance ignores the centre-to-surface spread; the exact series gives the spread it misses.',
    trips: (f) => f.method === 'lumped' && f.lumpedErrorK !== null && f.lumpedErrorK > f.lumpedAccuracyLimitK,
    message: (f) => `Lumped capacitance misses a centre-to-surface spread of up to ${fmt(f.lumpedErrorK ?? 0)} K here (limit ${fmt(f.lumpedAccuracyLimitK)} K).`,
    advice: () => 'Use the finite-volume method if the centre and surface temperatures matter separately.',
    numbers: (f) => ({ lumpedErrorK: f.lumpedErrorK ?? 0, limitK: f.lumpedAccuracyLimitK }),
  },
  {
    id: 'one-term-fourier-limit',
    severity: 'info',
    rule: `The one-term hand approximation needs Fo > ${ONE_TERM_FOURIER_LIMIT} (common practice; Incropera et al., Sec. 5.5.2).`,
    trips: (f) => f.fourierEnd < ONE_TERM_FOURIER_LIMIT && f.method !== 'lumped',
    message: (f) => `Fo at the end of the stage is ${fmt(f.fourierEnd)} (< ${ONE_TERM_FOURIER_LIMIT}): a one-term hand calculation of this stage would be outside its range.`,
    advice: () => 'Do not check this stage by the one-term chart method; the engine uses the full series or the numerical solution.',
    numbers: (f) => ({ fourierEnd: f.fourierEnd, limit: ONE_TERM_FOURIER_LIMIT }),
  },
  {
    id: 'one-term-error',
    severity: 'info',
    rule: 'The one-term approximation against the exact series, over the part of the stage where Fo > 0.2.',
    trips: (f) => f.oneTermErrorK !== null && Math.max(f.oneTermErrorK.centre, f.oneTermErrorK.surface, f.oneTermErrorK.mean) > 0,
    message: (f) => {
      const e = f.oneTermErrorK!;
      return `A one-term hand calculation would be off by up to ${fmt(e.centre)} K at the centre, ${fmt(e.surface)} K at the surface and ${fmt(e.mean)} K in the mean.`;
    },
    advice: () => 'Informative: use it to judge a hand check of this stage.',
    numbers: (f) => ({ centreK: f.oneTermErrorK?.centre ?? 0, surfaceK: f.oneTermErrorK?.surface ?? 0, meanK: f.oneTermErrorK?.mean ?? 0 }),
  },
  {
    id: 'radiation-left-out',
    severity: 'warning',
    rule: `Radiation left out matters when its linearised coefficient exceeds ${pct(RADIATION_SHARE_LIMIT)} of h (common practice; h_r per Incropera et al., Eq. 1.9).`,
    trips: (f) => !f.radiationIncluded && f.radiationCoefficientWPerM2K > RADIATION_SHARE_LIMIT * f.hWPerM2K,
    message: (f) =>
      `Radiation is off, but at the starting surface temperature ${degC(f.surfaceStartK)} with emissivity ${fmt(f.emissivityUsed)} its coefficient is about ${fmt(f.radiationCoefficientWPerM2K)} W/m²K, ${pct(f.radiationCoefficientWPerM2K / f.hWPerM2K)} of h = ${fmt(f.hWPerM2K)} W/m²K.`,
    advice: () => 'Switch radiation on for this stage with the surface emissivity of the part.',
    numbers: (f) => ({ radiationCoefficientWPerM2K: f.radiationCoefficientWPerM2K, hWPerM2K: f.hWPerM2K, emissivity: f.emissivityUsed }),
  },
  {
    id: 'constant-properties-vary',
    severity: 'warning',
    rule: `Constant properties are a poor stand-in when a property varies by more than ${pct(PROPERTY_VARIATION_LIMIT)} over the stage (common practice).`,
    trips: (f) => f.constantProperties && Math.max(f.propertyVariation.conductivity, f.propertyVariation.heatCapacity) > PROPERTY_VARIATION_LIMIT,
    message: (f) =>
      `This stage holds properties constant (evaluated at ${degC(f.propertyTemperatureK)}), but over its temperature range k varies by ${pct(f.propertyVariation.conductivity)} and rho·cp by ${pct(f.propertyVariation.heatCapacity)}.`,
    advice: (f) => `Use the finite-volume method (temperature-dependent properties); if a constant-property check is wanted, evaluate the properties near ${degC(f.propertyTemperatureK)}, the mean of the stage's start and end temperatures.`,
    numbers: (f) => ({ conductivityVariation: f.propertyVariation.conductivity, heatCapacityVariation: f.propertyVariation.heatCapacity, propertyTemperatureK: f.propertyTemperatureK }),
  },
  {
    id: 'constant-h-in-boiling-range',
    severity: 'warning',
    rule: 'In a liquid quench h changes by an order of magnitude from film boiling through nucleate boiling to convection (Totten, Bates and Clinton, Handbook of Quenchants and Quenching Technology, 1993, from memory).',
    trips: (f) => f.liquidBath && f.hIsConstant && f.surfaceRangeK.highK > f.mediumK + 100,
    message: (f) => `A constant h = ${fmt(f.hWPerM2K)} W/m²K is used in a liquid bath while the surface passes from ${degC(f.surfaceRangeK.highK)} down to ${degC(f.surfaceRangeK.lowK)}, through the boiling range.`,
    advice: () => 'Give the bath an h table against surface temperature (a boiling curve), ideally from a cooling-curve test of the actual bath.',
    numbers: (f) => ({ hWPerM2K: f.hWPerM2K, surfaceHighK: f.surfaceRangeK.highK, mediumK: f.mediumK }),
  },
  {
    id: 'end-within-one-step',
    severity: 'warning',
    rule: 'A stage whose end condition is met at once (in under one time step) is usually a mistake in the end condition.',
    trips: (f) => f.endKind === 'point-temperature' && (f.durationS === 0 || (f.timeSteps !== null && f.timeSteps <= 1)),
    message: (f) => `The end condition was met after ${fmt(f.durationS)} s, within the first time step.`,
    advice: () => 'Check the target temperature and the point it names: it may already be met when the stage starts.',
    numbers: (f) => ({ durationS: f.durationS }),
  },
  {
    id: 'cross-check-difference',
    severity: 'warning',
    rule: 'Every stage is computed a second way; the two should agree within the method’s stated accuracy.',
    trips: (f) => f.crossCheck !== null && f.crossCheck.maxDifferenceK > f.crossCheck.allowedK,
    message: (f) => `The ${f.method} result and its cross-check (${f.crossCheck!.refined ? `${f.crossCheck!.method} re-run at a tenth of the tolerance` : f.crossCheck!.method}) differ by up to ${fmt(f.crossCheck!.maxDifferenceK)} K (allowed ${fmt(f.crossCheck!.allowedK)} K).`,
    advice: crossCheckAdvice,
    numbers: (f) => ({ maxDifferenceK: f.crossCheck?.maxDifferenceK ?? 0, allowedK: f.crossCheck?.allowedK ?? 0 }),
  },
  {
    id: 'energy-balance',
    severity: 'warning',
    rule: `Heat through the surface must equal the change of stored energy; a relative error above ${ENERGY_ERROR_LIMIT} points at a numerical problem.`,
    trips: (f) => f.energyRelativeError !== null && f.energyRelativeError > ENERGY_ERROR_LIMIT,
    message: (f) => `The energy balance of this stage is off by ${fmt(f.energyRelativeError ?? 0)} (relative).`,
    advice: () => 'Tighten the tolerance; if it persists, report the plan as a bug.',
    numbers: (f) => ({ energyRelativeError: f.energyRelativeError ?? 0, limit: ENERGY_ERROR_LIMIT }),
  },
];

export function stageWarnings(facts: StageFacts): EngineWarning[] {
  return VALIDITY_RULES.filter((r) => r.trips(facts)).map((r) => ({
    ruleId: r.id,
    severity: r.severity,
    stageIndex: facts.stageIndex,
    message: r.message(facts),
    rule: r.rule,
    advice: r.advice(facts),
    numbers: r.numbers(facts),
  }));
}
