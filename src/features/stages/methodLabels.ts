// Names of the solution methods as the stage forms and the timeline write them.
import type { MethodChoice } from '@/schema/planSchema';

export const METHOD_LABELS: Record<MethodChoice, string> = {
  auto: 'Automatic (checked choice)',
  lumped: 'Lumped capacitance',
  series: 'Exact series (1-D)',
  'finite-volume': 'Finite volume',
};
