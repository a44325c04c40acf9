// How a severity is told apart without colour: a word and a distinct shape, most serious first.
import type { WarningSeverity } from '@/engine/validity/warning';

export interface SeverityMark {
  word: string;
  /** A shape that differs per severity (shown beside the word, hidden from screen readers). */
  icon: string;
  rank: number;
}

const MARKS: Record<WarningSeverity, SeverityMark> = {
  warning: { word: 'Warning', icon: '▲', rank: 0 },
  caution: { word: 'Caution', icon: '◆', rank: 1 },
  info: { word: 'Note', icon: '●', rank: 2 },
};

export function severityMark(severity: WarningSeverity): SeverityMark {
  return MARKS[severity];
}
