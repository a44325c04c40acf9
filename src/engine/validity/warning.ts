// A warning raised by a validity rule: which rule, the numbers that tripped it, and what to do.

export type WarningSeverity = 'info' | 'caution' | 'warning';

export interface EngineWarning {
  /** Stable id of the rule (see validity/rules.ts). */
  ruleId: string;
  severity: WarningSeverity;
  /** Stage index the warning belongs to, or null for the whole plan. */
  stageIndex: number | null;
  /** One sentence with the numbers. */
  message: string;
  /** The rule in words, with its source or "common practice". */
  rule: string;
  /** What the user can do about it. */
  advice: string;
  /** The numbers, by name, for tables and tests. */
  numbers: Record<string, number>;
}
