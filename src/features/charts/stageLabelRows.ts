// Stacking of stage names above the temperature chart, so names of short stages do not overlap.

const STAGE_LABEL_MAX_ROWS = 4;
/** For spacing stage names: about 6.5 px per character at 11 px, on a plot assumed no wider than 600 px (small panels). */
const STAGE_LABEL_CHAR_PX = 6.5;
const STAGE_LABEL_PAD_PX = 10;
const STAGE_LABEL_ASSUMED_PLOT_PX = 600;

/** The share of the plot width a stage name takes, on the assumed narrowest plot. */
export function stageLabelWidthFraction(text: string): number {
  return (text.length * STAGE_LABEL_CHAR_PX + STAGE_LABEL_PAD_PX) / STAGE_LABEL_ASSUMED_PLOT_PX;
}

/**
 * The row (0 = lowest) of each stage name above the plot, so that names of short stages do not overlap:
 * a name goes on the lowest row whose last name ends before this one starts.
 * starts: each name's left edge as a fraction of the plot width, ascending; widths: each name's width, same units.
 */
export function stageLabelRows(starts: readonly number[], widths: readonly number[]): number[] {
  const rowEnds: number[] = [];
  return starts.map((x, i) => {
    let row = rowEnds.findIndex((end) => x >= end);
    if (row < 0) row = rowEnds.length < STAGE_LABEL_MAX_ROWS ? rowEnds.length : rowEnds.indexOf(Math.min(...rowEnds));
    rowEnds[row] = x + widths[i];
    return row;
  });
}
