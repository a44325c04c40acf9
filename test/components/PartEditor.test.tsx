// @vitest-environment jsdom
// The part editor's form edge: whole sizes typed in the chosen units become the schema's half-sizes in
// metres; a bad value names the field and commits nothing. Unit factor 1 in = 25.4 mm exactly
// (NIST SP 811, 2008 ed., Appendix B.8, from memory).
import { afterEach, describe, expect, it, vi } from 'vitest';
import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import demoPlan from '@/library/plans/demo-plan.json';
import { parsePlan } from '@/schema/parsePlan';
import { BUILT_IN_MATERIALS } from '@/library/builtInLibrary';
import { PartEditor } from '@/features/part/PartEditor';
import type { UnitSystem } from '@/features/units/unitSystem';

afterEach(cleanup);

const parsed = parsePlan(demoPlan);
if (!parsed.ok) throw new Error('demo plan invalid');
const plan = parsed.plan;
/** Metres compared to 1e-12 m: the conversions are exact decimal scalings, so only float rounding remains. */
const LENGTH_TOLERANCE_M = 1e-12;

function renderPart(system: UnitSystem = 'si') {
  const onShape = vi.fn();
  const onMaterial = vi.fn();
  const onInitialTemperature = vi.fn();
  render(
    <PartEditor
      part={plan.part}
      initialTemperatureK={plan.initialTemperature}
      system={system}
      materials={BUILT_IN_MATERIALS}
      onShape={onShape}
      onMaterial={onMaterial}
      onInitialTemperature={onInitialTemperature}
    />,
  );
  return { onShape, onMaterial, onInitialTemperature };
}

describe('PartEditor', () => {
  it('shows the demo bar (radius 20 mm) as a 40 mm diameter and commits a typed 50 mm as radius 0.025 m', () => {
    const { onShape } = renderPart();
    const diameter = screen.getByLabelText('Diameter (mm)') as HTMLInputElement;
    expect(diameter.value).toBe('40');
    fireEvent.change(diameter, { target: { value: '50' } });
    expect(onShape).toHaveBeenCalledTimes(1);
    const [shape, mergeKey] = onShape.mock.calls[0];
    expect(shape.kind).toBe('long-cylinder');
    expect(Math.abs(shape.radiusM - 0.025)).toBeLessThan(LENGTH_TOLERANCE_M);
    expect(mergeKey).toBe('shape.Diameter');
  });

  it('reads a bare number in inches in US units: 2 in diameter is radius 0.0254 m', () => {
    const { onShape } = renderPart('us');
    const diameter = screen.getByLabelText('Diameter (in)') as HTMLInputElement;
    fireEvent.change(diameter, { target: { value: '2' } });
    expect(Math.abs(onShape.mock.calls[0][0].radiusM - 0.0254)).toBeLessThan(LENGTH_TOLERANCE_M);
  });

  it('refuses text and zero, naming the field, and commits nothing', () => {
    const { onShape } = renderPart();
    const diameter = screen.getByLabelText('Diameter (mm)') as HTMLInputElement;
    fireEvent.change(diameter, { target: { value: 'forty' } });
    expect(screen.getByRole('alert').textContent).toMatch(/^⚠ Diameter: "forty" is not a number/);
    expect(diameter.getAttribute('aria-invalid')).toBe('true');
    fireEvent.change(diameter, { target: { value: '0' } });
    expect(screen.getByRole('alert').textContent).toBe('⚠ Diameter: must be greater than zero');
    expect(onShape).not.toHaveBeenCalled();
  });

  it('takes a value typed with another unit: 1 in in SI mode is radius 0.0127 m', () => {
    const { onShape } = renderPart();
    fireEvent.change(screen.getByLabelText('Diameter (mm)'), { target: { value: '1 in' } });
    expect(Math.abs(onShape.mock.calls[0][0].radiusM - 0.0127)).toBeLessThan(LENGTH_TOLERANCE_M);
  });

  it('changing the shape keeps the smallest half-size: a 40 mm bar becomes a plate 40 mm thick', () => {
    const { onShape } = renderPart();
    fireEvent.change(screen.getByLabelText('Shape'), { target: { value: 'plate' } });
    expect(onShape.mock.calls[0][0]).toEqual({ kind: 'plate', halfThicknessM: 0.02 });
  });

  it('starting temperature typed in degC arrives in kelvin (t/K = t/°C + 273.15, BIPM SI Brochure, 9th ed.)', () => {
    const { onInitialTemperature } = renderPart();
    fireEvent.change(screen.getByLabelText('Starting temperature (uniform) (°C)'), { target: { value: '850' } });
    expect(onInitialTemperature.mock.calls[0][0]).toBeCloseTo(1123.15, 9);
  });

  it('a property table row that breaks the rising order is refused with the schema message', () => {
    const { onMaterial } = renderPart();
    // Row 2 of the demo conductivity table is at 100 °C; 10 °C would fall below row 1 (20 °C).
    fireEvent.change(screen.getByLabelText('Conductivity, row 2 temperature (°C)'), { target: { value: '10' } });
    expect(screen.getByRole('alert').textContent).toMatch(/Conductivity: table temperatures must rise strictly/);
    expect(onMaterial).not.toHaveBeenCalled();
  });

  it('editing a library material makes it the plan’s own, with the edited value', () => {
    const { onMaterial } = renderPart();
    fireEvent.change(screen.getByLabelText('Conductivity, row 1 (W/(m·K))'), { target: { value: '60' } });
    const [material] = onMaterial.mock.calls[0];
    expect(material.libraryId).toBeUndefined();
    expect(material.name).toMatch(/\(edited\)$/);
    expect(material.conductivityWPerMK.table[0]).toEqual([293.15, 60]);
  });
});
