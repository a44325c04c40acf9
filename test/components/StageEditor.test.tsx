// @vitest-environment jsdom
// The stage editor's form edge: h, medium temperature, end condition and boiling curve edits arrive as
// schema-checked stages in SI (kelvin, W/(m²·K), seconds). Unit factor 1 Btu/(h·ft²·°F) = 5.678263 W/(m²·K)
// (NIST SP 811, 2008 ed., Appendix B.8, from memory).
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import demoPlan from '@/library/plans/demo-plan.json';
import { parsePlan } from '@/schema/parsePlan';
import { geometryOf } from '@/engine/geometry/geometry';
import { BUILT_IN_MATERIALS, BUILT_IN_MEDIA, builtInMedium } from '@/library/builtInLibrary';
import { StageEditor } from '@/features/stages/StageEditor';
import type { UnitSystem } from '@/features/units/unitSystem';

afterEach(cleanup);

const parsed = parsePlan(demoPlan);
if (!parsed.ok) throw new Error('demo plan invalid');
const plan = parsed.plan;
const geometry = geometryOf(plan.part.shape);
/** The NIST factor is printed to 7 digits; compare to a relative 1e-6. */
const PRINTED_FACTOR_RELATIVE_TOLERANCE = 1e-6;

function renderStage(index: number, system: UnitSystem = 'si') {
  const onChange = vi.fn();
  render(
    <StageEditor
      stage={plan.stages[index]}
      index={index}
      material={plan.part.material}
      points={geometry.points}
      oneD={geometry.oneD !== null}
      media={BUILT_IN_MEDIA}
      materials={BUILT_IN_MATERIALS}
      system={system}
      onChange={onChange}
    />,
  );
  return onChange;
}

describe('StageEditor', () => {
  it('commits a typed h as a constant h, grouped under the stage and field merge key', () => {
    const onChange = renderStage(0);
    fireEvent.change(screen.getByLabelText('Heat transfer coefficient h (W/(m²·K))'), { target: { value: '35' } });
    const [stage, mergeKey] = onChange.mock.calls[0];
    expect(stage.medium.heatTransfer).toEqual({ kind: 'constant', hWPerM2K: 35 });
    expect(stage.name).toBe(plan.stages[0].name);
    expect(mergeKey).toBe('stage0.h');
  });

  it('reads h in Btu/(h·ft²·°F) in US units: 10 is 56.78263 W/(m²·K)', () => {
    const onChange = renderStage(0, 'us');
    fireEvent.change(screen.getByLabelText('Heat transfer coefficient h (Btu/(h·ft²·°F))'), { target: { value: '10' } });
    const h = onChange.mock.calls[0][0].medium.heatTransfer.hWPerM2K;
    const expected = 56.78263;
    expect(Math.abs(h - expected) / expected, `h for 10 Btu/(h ft² °F): got ${h}, expected ${expected}`).toBeLessThan(PRINTED_FACTOR_RELATIVE_TOLERANCE);
  });

  it('a negative h is refused with a message naming the field; nothing is committed', () => {
    const onChange = renderStage(0);
    fireEvent.change(screen.getByLabelText('Heat transfer coefficient h (W/(m²·K))'), { target: { value: '-5' } });
    expect(screen.getByRole('alert').textContent).toBe('⚠ Heat transfer coefficient h: must be greater than zero');
    expect(onChange).not.toHaveBeenCalled();
  });

  it('the demo quench shows its boiling curve rows; switching to one h takes the largest h of the table', () => {
    const onChange = renderStage(1);
    const quench = plan.stages[1].medium.heatTransfer;
    if (quench.kind !== 'surface-table') throw new Error('the demo quench is expected to use a boiling curve');
    expect(screen.getAllByRole('row')).toHaveLength(quench.rows.length + 1);
    fireEvent.click(screen.getByLabelText('one h'));
    expect(onChange.mock.calls[0][0].medium.heatTransfer).toEqual({ kind: 'constant', hWPerM2K: Math.max(...quench.rows.map((r) => r[1])) });
  });

  it('switching a library water medium to the boiling curve uses the library rows in kelvin', () => {
    const water = builtInMedium('still-water');
    if (!water?.boilingCurve) throw new Error('still water carries a boiling curve in the library');
    const stage = { ...plan.stages[0], medium: { name: water.name, libraryId: water.id, temperature: 298.15, heatTransfer: { kind: 'constant' as const, hWPerM2K: 2000 } } };
    const onChange = vi.fn();
    render(
      <StageEditor stage={stage} index={0} material={plan.part.material} points={geometry.points} oneD media={BUILT_IN_MEDIA} materials={BUILT_IN_MATERIALS} system="si" onChange={onChange} />,
    );
    fireEvent.click(screen.getByLabelText(/h by surface temperature/));
    const rows = onChange.mock.calls[0][0].medium.heatTransfer.rows as [number, number][];
    expect(rows.length).toBe(water.boilingCurve.hWPerM2KBySurfaceC.length);
    rows.forEach(([tK, h], i) => {
      expect(tK).toBeCloseTo(water.boilingCurve!.hWPerM2KBySurfaceC[i][0] + 273.15, 9);
      expect(h).toBe(water.boilingCurve!.hWPerM2KBySurfaceC[i][1]);
    });
  });

  it('an end condition typed as "2 min" is 120 s; a target temperature in °C arrives in kelvin', () => {
    const onChange = renderStage(0);
    fireEvent.change(screen.getByLabelText('Duration (s)'), { target: { value: '2 min' } });
    expect(onChange.mock.calls[0][0].end).toEqual({ kind: 'duration', seconds: 120 });
    cleanup();
    const onTarget = renderStage(1);
    fireEvent.change(screen.getByLabelText('Target temperature (°C)'), { target: { value: '150' } });
    expect(onTarget.mock.calls[0][0].end.temperature).toBeCloseTo(423.15, 9);
  });

  it('a point at depth needs a depth: choosing it adds depthM and the depth field', () => {
    const onChange = renderStage(1);
    fireEvent.change(screen.getByLabelText('Point'), { target: { value: 'depth' } });
    expect(onChange.mock.calls[0][0].end).toMatchObject({ kind: 'point-temperature', point: 'depth', depthM: 0 });
  });

  it('the method choice is committed as the schema value', () => {
    const onChange = renderStage(0);
    fireEvent.change(screen.getByLabelText('Method'), { target: { value: 'finite-volume' } });
    expect(onChange.mock.calls[0][0].method).toBe('finite-volume');
  });
});
