// What the user reads: number, digits and unit symbol. Conversions are checked against NIST SP 811 in
// quantityConversion.test.ts; here the text. Expected strings worked by hand from the same factors.
import { describe, expect, it } from 'vitest';
import { formatQuantity } from '@/features/units/formatQuantity';
import { formatDuration } from '@/features/units/formatDuration';
import { formatHeat } from '@/features/units/formatHeat';
import { formatNumber } from '@/features/units/formatNumber';

describe('formatQuantity', () => {
  it.each([
    ['temperature', 1123.15, 'si', '850.0 °C'],
    ['temperature', 1123.15, 'us', '1562.0 °F'],
    ['temperature', 273.15, 'us', '32.0 °F'],
    ['temperatureDifference', 50, 'us', '90 °F'],
    ['temperatureDifference', 0.0061, 'si', '0.0061 K'],
    ['length', 0.0254, 'si', '25.4 mm'],
    ['length', 0.0254, 'us', '1 in'],
    ['heatTransferCoefficient', 5.678263 * 200, 'us', '200 Btu/(h·ft²·°F)'],
    ['conductivity', 45, 'si', '45 W/(m·K)'],
    ['density', 7850, 'us', '490.1 lb/ft³'], // 7850 / 16.01846 = 490.06
    ['specificHeat', 460, 'us', '0.11 Btu/(lb·°F)'], // 460 / 4186.8 = 0.10987
    ['coolingRate', 25, 'us', '45 °F/s'],
  ] as const)('%s %d in %s -> %s', (kind, si, system, expected) => {
    expect(formatQuantity(kind, si, system)).toBe(expected);
  });
  it('bare leaves the unit off', () => {
    expect(formatQuantity('temperature', 300, 'si', { bare: true })).toBe('26.9');
  });
  it('-0.0 is shown as 0.0', () => {
    expect(formatQuantity('temperature', 273.15 - 1e-9, 'si')).toBe('0.0 °C');
  });
});

describe('formatNumber', () => {
  it('uses exponent form outside 1e-3..1e6', () => {
    expect(formatNumber(1234567, { kind: 'significant', count: 3 })).toBe('1.23e+6');
    expect(formatNumber(0.0001234, { kind: 'significant', count: 3 })).toBe('1.23e-4');
    expect(formatNumber(0.0412, { kind: 'significant', count: 2 })).toBe('0.041');
  });
  it('never prints NaN', () => {
    expect(formatNumber(Number.NaN, { kind: 'decimals', count: 1 })).toBe('—');
  });
});

describe('formatDuration', () => {
  it.each([
    [12.345, '12.3 s'],
    [119.4, '119 s'],
    [750, '12 min 30 s'],
    [3599.6, '1 h 00 min'],
    [5400, '1 h 30 min'],
    [86400 + 65, '24 h 01 min'],
  ])('%d s -> %s', (s, expected) => expect(formatDuration(s)).toBe(expected));
});

describe('formatHeat on each basis', () => {
  it('per part: kJ / MJ in SI, Btu in US (1 Btu_IT = 1055.056 J, NIST SP 811 B.8)', () => {
    expect(formatHeat(412_000, 'part', 'si')).toBe('412 kJ per part');
    expect(formatHeat(3_910_000, 'part', 'si')).toBe('3.91 MJ per part');
    expect(formatHeat(1055.056 * 250, 'part', 'us')).toBe('250 Btu per part');
  });
  it('per m² of face becomes per ft² in US (1 Btu/ft² = 1.135653E+04 J/m², NIST SP 811 B.8)', () => {
    expect(formatHeat(11356.53 * 96.1, 'per m² of cooled face', 'us')).toBe('96.1 Btu per ft² of cooled face');
  });
  it('per m of length becomes per ft in US (1055.056 J/ft = 3461.5 J/m)', () => {
    expect(formatHeat(3461.5 * 10, 'per m of length', 'us')).toBe('10 Btu per ft of length');
  });
});
