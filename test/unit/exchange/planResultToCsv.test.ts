// CSV export: columns, units in the header, values read from the result, quoting (RFC 4180).
import { describe, expect, it } from 'vitest';
import { csvFileName, planResultToCsv } from '@/features/exchange/planResultToCsv';
import { airResult } from './demoResult';

const parse = (csv: string) => csv.trimEnd().split('\r\n');

describe('planResultToCsv', () => {
  it('whole plan: header with units, one row per sample of every stage', () => {
    const lines = parse(planResultToCsv(airResult, { temperatureUnit: 'degC' }));
    expect(lines[0]).toBe('time from plan start [s],time in stage [s],stage,stage name,centre (axis) [degC],surface [degC],mean (volume mean) [degC]');
    expect(lines).toHaveLength(1 + 3 + 3);
    expect(lines[1]).toBe('0,0,1,Transfer,850,850,850');
    // 1100 K - 273.15 = 826.85 degC (BIPM SI Brochure, 9th ed., offset 273.15)
    expect(lines[3]).toBe('20,20,1,Transfer,826.85,822.85,824.85');
    // The second stage's own clock starts at its start; the name with a quote and a comma is quoted.
    expect(lines[5]).toBe('920,900,2,"Hold, ""still"" air",676.85,671.85,674.85');
    expect(lines[6]).toBe('1820,1800,2,"Hold, ""still"" air",600,596.85,598.85');
  });

  it('one stage only, in kelvin', () => {
    const lines = parse(planResultToCsv(airResult, { temperatureUnit: 'K', stageIndex: 1 }));
    expect(lines[0]).toMatch(/\[K\]$/);
    expect(lines.slice(1).map((l) => l.split(',')[0])).toEqual(['20', '920', '1820']);
    expect(lines[3].split(',').slice(-3)).toEqual(['873.15', '870', '872']);
  });

  it('degF: 1123.15 K is 1562 degF (NIST SP 811, Sec. B.8, t/degF = 1.8 t/degC + 32)', () => {
    const lines = parse(planResultToCsv(airResult, { temperatureUnit: 'degF' }));
    expect(lines[0]).toContain('centre (axis) [degF]');
    expect(lines[1].split(',')[4]).toBe('1562');
  });

  it('every row has as many cells as the header (after RFC 4180 unquoting)', () => {
    const lines = parse(planResultToCsv(airResult, { temperatureUnit: 'degC' }));
    const cells = (l: string) => l.match(/("([^"]|"")*"|[^,]*)(,|$)/g)!.filter((c) => c !== '').length;
    for (const l of lines) expect(cells(l), l).toBe(7);
  });

  it('file names are safe and say the stage', () => {
    expect(csvFileName(airResult)).toBe('Pin-40-mm-air-then-hold.csv');
    expect(csvFileName(airResult, 1)).toBe('Pin-40-mm-air-then-hold-stage-2.csv');
  });
});
