// The comparison of the main plan and its variants: plans across, figures down. Used on the
// workbench and on the printed sheet. Every figure comes from compareVariants (engine results).
import type { UnitSystem } from '@/features/units/unitSystem';
import { formatQuantity } from '@/features/units/formatQuantity';
import { formatHeat } from '@/features/units/formatHeat';
import type { ComparedPlan, VariantComparison } from './compareVariants';

type Computed = NonNullable<ComparedPlan['computed']>;

const METHOD_WORDS: Record<string, string> = { lumped: 'lumped', series: 'exact series', 'finite-volume': 'finite volume' };

export function ComparisonTable({ comparison, unitSystem, markerOf }: { comparison: VariantComparison; unitSystem: UnitSystem; markerOf?: (id: string) => string }) {
  const { plans, stageRowCount } = comparison;
  const temperature = (k: number | null) => (k === null ? '—' : formatQuantity('temperature', k, unitSystem));
  const rows: { label: string; value: (c: Computed) => string }[] = [
    ...Array.from({ length: stageRowCount }, (_, i) => ({
      label: `Stage ${i + 1} duration`,
      value: (c: Computed) => (c.stages[i] ? `${c.stages[i].name}: ${formatQuantity('duration', c.stages[i].durationS, unitSystem)}` : '—'),
    })),
    { label: 'Total cycle time', value: (c) => formatQuantity('duration', c.totalDurationS, unitSystem) },
    { label: 'End temperature, centre', value: (c) => temperature(c.endCentreK) },
    { label: 'End temperature, surface', value: (c) => temperature(c.endSurfaceK) },
    { label: 'End temperature, mean', value: (c) => temperature(c.endMeanK) },
    { label: 'Largest surface cooling rate', value: (c) => formatQuantity('coolingRate', c.maxSurfaceCoolingRateKPerS, unitSystem) },
    { label: 'Largest centre–surface difference', value: (c) => formatQuantity('temperatureDifference', c.maxCentreSurfaceDifferenceK, unitSystem) },
    { label: 'Heat removed', value: (c) => formatHeat(c.heatRemovedJ, c.heatBasis, unitSystem) },
    { label: 'Methods', value: (c) => c.methods.map((m) => METHOD_WORDS[m] ?? m).join(', ') },
    { label: 'Warnings', value: (c) => String(c.warningCount) },
  ];
  return (
    <table className="cs-compare" data-testid="comparison-table">
      <thead>
        <tr>
          <th scope="col">Figure</th>
          {plans.map((p) => (
            <th scope="col" key={p.id} data-plan-id={p.id}>
              {markerOf ? <span className="cs-compare-marker" aria-hidden="true">{markerOf(p.id)} </span> : null}
              {p.name}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {rows.map((row) => (
          <tr key={row.label}>
            <th scope="row">{row.label}</th>
            {plans.map((p) => (
              <td key={p.id} data-plan-id={p.id}>
                {p.computed ? row.value(p.computed) : 'computing…'}
              </td>
            ))}
          </tr>
        ))}
        {plans.some((p) => p.computed?.failure) ? (
          <tr>
            <th scope="row">Stopped</th>
            {plans.map((p) => (
              <td key={p.id}>{p.computed?.failure ?? '—'}</td>
            ))}
          </tr>
        ) : null}
      </tbody>
    </table>
  );
}
