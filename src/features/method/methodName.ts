// The name a method is shown by.
import type { MethodId } from '@/engine/methods/stageProblem';

const METHOD_NAMES: Record<MethodId, string> = {
  lumped: 'Lumped capacitance',
  series: 'Exact series',
  'finite-volume': 'Finite volume',
};

export function methodName(method: MethodId): string {
  return METHOD_NAMES[method];
}
