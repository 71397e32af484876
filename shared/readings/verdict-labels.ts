/**
 * Words for every verdict and how serious it is. The screen pairs the word
 * with an icon per tone so meaning never rests on colour alone.
 */
import type { Verdict } from './reading-kinds';

export type VerdictTone = 'ok' | 'caution' | 'problem';

export const VERDICT_LABELS: Readonly<Record<Verdict, string>> = {
  within_range: 'Within range',
  low: 'Low',
  very_low: 'Very low',
  high: 'High',
  normal: 'Normal',
  lean: 'Lean',
  rich: 'Rich',
  code_lean: 'Lean enough to set a code',
  code_rich: 'Rich enough to set a code',
  below: 'Below range',
  within: 'Within range',
  above: 'Above range',
};

export const VERDICT_TONES: Readonly<Record<Verdict, VerdictTone>> = {
  within_range: 'ok',
  low: 'caution',
  very_low: 'problem',
  high: 'caution',
  normal: 'ok',
  lean: 'caution',
  rich: 'caution',
  code_lean: 'problem',
  code_rich: 'problem',
  below: 'caution',
  within: 'ok',
  above: 'caution',
};
