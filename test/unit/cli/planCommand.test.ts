// The headless command as a script would use it: JSON on stdout, field-named errors and exit codes.
import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const run = (...args: string[]) => spawnSync('npx', ['tsx', 'src/cli/plan.ts', ...args], { encoding: 'utf8' });
const dir = mkdtempSync(join(tmpdir(), 'coolstage-cli-'));

// Each case starts a Node process and runs whole plans with cross-checks: seconds, not milliseconds.
describe('npm run plan', { timeout: 30_000 }, () => {
  it('prints per-stage method, both Biot numbers, Fo, duration and warnings as JSON for the demo plan', () => {
    const r = run('src/library/plans/demo-plan.json', '--json');
    expect(r.status, r.stderr).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.units.temperature).toBe('K');
    expect(out.stages.length).toBeGreaterThanOrEqual(2);
    for (const s of out.stages) {
      expect(['lumped', 'series', 'finite-volume']).toContain(s.method);
      expect(typeof s.methodReason).toBe('string');
      expect(s.biot.lumped.lengthLabel).toBe('Lc = V/As');
      expect(s.biot.series.lengthLabel).toMatch(/r0/);
      expect(s.fourierEnd).toBeGreaterThan(0);
      expect(s.durationS).toBeGreaterThan(0);
      expect(Array.isArray(s.warnings)).toBe(true);
      expect(s.curves).toBeUndefined();
    }
    expect(out.stages.map((s: { method: string }) => s.method)).toContain('finite-volume');
  });

  it('adds sampled curves with --series', () => {
    const r = run('src/library/plans/demo-plan.json', '--json', '--series');
    expect(r.status, r.stderr).toBe(0);
    const s0 = JSON.parse(r.stdout).stages[0];
    expect(s0.curves.timeS.length).toBe(s0.curves.temperaturesK.centre.length);
  });

  it('reports centre, face, rim and mean temperatures per stage for a finite cylinder', () => {
    const r = run('test/fixtures/plans/short-cylinder-hub.json', '--json');
    expect(r.status, r.stderr).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.points.map((p: { id: string }) => p.id)).toEqual(['centre', 'face-x', 'face-z', 'edge', 'mean']);
    for (const s of out.stages) {
      for (const id of ['centre', 'face-x', 'face-z', 'edge', 'mean']) expect(s.endK[id]).toBeGreaterThan(273);
      // The rim cools fastest: it sees two faces (Carslaw and Jaeger, Sec. 1.15 product solutions, from memory).
      expect(s.endK.edge).toBeLessThan(s.endK['face-x']);
      expect(s.maxPointSpreadK).toBeGreaterThan(0);
      expect(s.crossCheck).not.toBeNull();
    }
  });

  it('names the field of a bad file and exits 1 without a stack trace', () => {
    const plan = JSON.parse(readFileSync('test/fixtures/plans/minimal-plate.json', 'utf8'));
    plan.stages[0].medium.heatTransfer.hWPerM2K = -5;
    const file = join(dir, 'bad.json');
    writeFileSync(file, JSON.stringify(plan));
    const r = run(file);
    expect(r.status).toBe(1);
    expect(r.stderr).toMatch(/stages\[0\]\.medium\.heatTransfer\.hWPerM2K: hWPerM2K must be greater than zero/);
    expect(r.stderr).not.toMatch(/at .*\.ts:\d+/);
  });

  it('exits 3 and says why when a stage target cannot be reached', () => {
    const plan = JSON.parse(readFileSync('test/fixtures/plans/minimal-plate.json', 'utf8'));
    plan.stages[0].end = { kind: 'point-temperature', point: 'centre', temperature: 5 };
    const file = join(dir, 'unreachable.json');
    writeFileSync(file, JSON.stringify(plan));
    const r = run(file);
    expect(r.status).toBe(3);
    expect(r.stderr).toMatch(/could not be computed/);
  });

  it('exits 2 on unknown options', () => {
    expect(run('x.json', '--colour').status).toBe(2);
  });
});
