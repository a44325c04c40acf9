// The label every built-in boiling curve carries: it is a drawn shape, not data.

/** `testMethod` names the published cooling-curve test that would give measured data for this medium. */
export function illustrativeCurveLabel(testMethod: string): string {
  return `Illustrative shape only, not measured data: replace it with h derived from a cooling-curve probe test of your own bath (${testMethod}).`;
}
