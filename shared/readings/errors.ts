/**
 * Typed refusal for impossible readings. Every function in the readings check
 * throws a ReadingError (never returns NaN) so a form can show the message
 * beside the field it names and the API can answer 400 with that field.
 */
export class ReadingError extends Error {
  constructor(
    /** The input that is wrong, as the form and the API name it (e.g. "vacuum", "trims.bank1.idle.shortPct"). */
    readonly field: string,
    message: string,
  ) {
    super(message);
    this.name = 'ReadingError';
  }
}

/** True for a ReadingError, also across bundle copies of this module. */
export function isReadingError(err: unknown): err is ReadingError {
  return err instanceof ReadingError || (!!err && typeof err === 'object' && (err as Error).name === 'ReadingError' && 'field' in err);
}

/** Returns value when it is a finite number; otherwise throws naming the field. */
export function requireFinite(value: number, field: string, label: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new ReadingError(field, `${label} must be a number; "${String(value)}" is not one.`);
  }
  return value;
}

/** Returns value when min <= value <= max; otherwise throws with what is allowed. */
export function requireWithin(value: number, min: number, max: number, field: string, label: string, unit: string): number {
  requireFinite(value, field, label);
  if (value < min || value > max) {
    throw new ReadingError(field, `${label} of ${formatNumber(value)} ${unit} is outside what is possible here: use ${formatNumber(min)} to ${formatNumber(max)} ${unit}.`);
  }
  return value;
}

/** Formats a number for messages: at most `digits` decimals, no trailing zeros. */
export function formatNumber(value: number, digits = 2): string {
  if (!Number.isFinite(value)) return String(value);
  const fixed = value.toFixed(digits);
  const trimmed = fixed.includes('.') ? fixed.replace(/\.?0+$/, '') : fixed;
  return trimmed === '-0' ? '0' : trimmed;
}
