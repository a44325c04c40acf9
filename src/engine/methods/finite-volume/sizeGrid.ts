// Number of cells and surface clustering from the Biot number and the relative tolerance.
// The scheme is second order: the error in temperature over the span is about C (dx/L)^2, with one constant for
// the interior (largest spacing, at the centre) and one for the surface (smallest spacing), both growing with Bi up
// to Bi = 1 (below it the temperature differences inside the part are about Bi x span; at the surface the layer at
// early times, Fo >= 0.01, sets the constant). The constants were measured against the exact
// series (test/unit/finite-volume/seriesAgreement.test.ts, which also checks the grid at two resolutions).
// The stretching parameter beta of buildVolumeGrid is then chosen to need the fewest cells. Common practice.
const MIN_CELLS = 8;
const MAX_CELLS = 600;
/** Share of the tolerance given to the spatial error. */
const SPACE_TOLERANCE_FRACTION = 0.5;
/** Measured error constants, dimensionless (centre and mean; surface at Bi >= 1, Fo = 0.01). */
const INTERIOR_ERROR_CONSTANT = 0.07;
const SURFACE_ERROR_CONSTANT = 1.2;
const BIOT_EXPONENT = 0.7;
const MAX_STRETCH = 4;

export function sizeGrid(biot: number, relativeTolerance: number): { cellCount: number; stretch: number } {
  const eps = SPACE_TOLERANCE_FRACTION * Math.max(relativeTolerance, 1e-12);
  const biotScale = Math.min(1, biot) ** BIOT_EXPONENT;
  const interior = Math.sqrt(eps / (INTERIOR_ERROR_CONSTANT * biotScale));
  const surface = Math.sqrt(eps / (SURFACE_ERROR_CONSTANT * biotScale));
  // Spacing at the centre is (L/N) beta coth(beta), at the surface (L/N) beta / sinh(beta).
  let best = { cellCount: Infinity, stretch: 0 };
  for (let i = 0; i <= 40; i++) {
    const beta = (MAX_STRETCH * i) / 40;
    const centreFactor = beta === 0 ? 1 : beta / Math.tanh(beta);
    const surfaceFactor = beta === 0 ? 1 : beta / Math.sinh(beta);
    const cells = Math.ceil(Math.max(centreFactor / interior, surfaceFactor / surface));
    if (cells < best.cellCount) best = { cellCount: cells, stretch: beta };
  }
  return { cellCount: Math.min(MAX_CELLS, Math.max(MIN_CELLS, best.cellCount)), stretch: best.stretch };
}
