/**
 * Reads what a person typed into a number field. Accepts a decimal comma
 * (common on phones set to many locales) and the typographic minus sign.
 */
export type NumberText = { kind: 'empty' } | { kind: 'number'; value: number } | { kind: 'invalid'; message: string };

const NUMBER = /^[+-]?(\d+([.,]\d*)?|[.,]\d+)$/;

/** Parses field text: empty, a finite number, or invalid with a message to show beside the field. */
export function parseNumberText(text: string): NumberText {
  const t = text.trim().replace(/\u2212/g, '-');
  if (t === '') return { kind: 'empty' };
  if (!NUMBER.test(t)) return { kind: 'invalid', message: `"${text.trim()}" is not a number; use digits with a point or comma for decimals.` };
  const value = Number(t.replace(',', '.'));
  if (!Number.isFinite(value)) return { kind: 'invalid', message: 'That number is too large to use.' };
  return { kind: 'number', value };
}
