// The plan door: good plans convert to kelvin exactly, bad ones name the field and the problem.
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { parsePlan, parsePlanText, MAX_PLAN_BYTES } from '@/schema/parsePlan';
import { toCelsiusPlan } from '@/schema/planTemperatures';

const text = readFileSync('test/fixtures/plans/minimal-plate.json', 'utf8');
const raw = () => JSON.parse(text);

describe('parsePlan', () => {
  it('converts every temperature from degC to kelvin (offset 273.15 K, BIPM SI Brochure, 9th ed.)', () => {
    const out = parsePlan(raw());
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    expect(out.plan.temperatureUnit).toBe('K');
    expect(out.plan.initialTemperature).toBe(773.15);
    expect(out.plan.stages[0].medium.temperature).toBe(293.15);
    expect(out.plan.stages[0].method).toBe('auto');
  });

  it('round-trips degC -> K -> degC to the typed numbers', () => {
    const out = parsePlan(raw());
    if (!out.ok) throw new Error('fixture must parse');
    const back = toCelsiusPlan(out.plan);
    expect(back.initialTemperature).toBe(500);
    expect(back.stages[0].medium.temperature).toBe(20);
  });

  it('names the field of a negative dimension', () => {
    const p = raw();
    p.part.shape.halfThicknessM = -0.01;
    const out = parsePlan(p);
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(out.issues[0].path).toBe('part.shape.halfThicknessM');
    expect(out.issues[0].message).toMatch(/greater than zero/);
  });

  it('names the stage and field of a missing heat transfer coefficient', () => {
    const p = raw();
    delete p.stages[0].medium.heatTransfer.hWPerM2K;
    const out = parsePlan(p);
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(out.issues.map((i) => i.path)).toContain('stages[0].medium.heatTransfer.hWPerM2K');
  });

  it('rejects a temperature below absolute zero after conversion', () => {
    const p = raw();
    p.stages[0].medium.temperature = -300;
    const out = parsePlan(p);
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(out.issues[0].path).toBe('stages[0].medium.temperature');
    expect(out.issues[0].message).toMatch(/absolute zero/);
  });

  it('requires depthM when the end condition names a depth', () => {
    const p = raw();
    p.stages[0].end = { kind: 'point-temperature', point: 'depth', temperature: 100 };
    const out = parsePlan(p);
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(out.issues[0].path).toBe('stages[0].end.depthM');
  });

  it('rejects unknown fields and a wrong version', () => {
    const p = raw();
    p.version = 99;
    p.colour = 'red';
    const out = parsePlan(p);
    expect(out.ok).toBe(false);
    if (out.ok) return;
    const paths = out.issues.map((i) => i.path);
    expect(paths).toContain('version');
    expect(out.issues.some((i) => /colour/.test(i.message))).toBe(true);
  });

  it('rejects a property table whose temperatures do not rise', () => {
    const p = raw();
    p.part.material.conductivityWPerMK = { table: [[100, 40], [50, 38]] };
    const out = parsePlan(p);
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(out.issues[0].path).toBe('part.material.conductivityWPerMK.table');
    expect(out.issues[0].message).toMatch(/rise strictly/);
  });
});

describe('parsePlanText', () => {
  it('reports truncated JSON as a file problem', () => {
    const out = parsePlanText(text.slice(0, text.length / 2));
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(out.issues[0].path).toBe('(file)');
    expect(out.issues[0].message).toMatch(/not valid JSON/);
  });

  it('refuses an oversized file before parsing it', () => {
    const out = parsePlanText(' '.repeat(MAX_PLAN_BYTES + 1));
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(out.issues[0].message).toMatch(/at most/);
  });
});
