/**
 * Vehicle identification numbers: the North American check digit
 * (49 CFR 565.15) and the model year from positions 10 and 7.
 * Pure: used live in the job form and again by the server.
 */

/** Letter values for the check digit (49 CFR 565.15, table of assigned values). */
const TRANSLITERATION: Record<string, number> = {
  A: 1, B: 2, C: 3, D: 4, E: 5, F: 6, G: 7, H: 8,
  J: 1, K: 2, L: 3, M: 4, N: 5, P: 7, R: 9,
  S: 2, T: 3, U: 4, V: 5, W: 6, X: 7, Y: 8, Z: 9,
};

/** Position weights 1–17 (49 CFR 565.15); position 9, the check digit itself, weighs 0. */
const WEIGHTS = [8, 7, 6, 5, 4, 3, 2, 10, 0, 9, 8, 7, 6, 5, 4, 3, 2] as const;

/** Model-year codes of position 10 in cycle order: letters skip I O Q U Z, digits skip 0. */
const YEAR_CODES = 'ABCDEFGHJKLMNPRSTVWXY123456789';

export const VIN_LENGTH = 17;
/** The characters a VIN may hold: digits and letters without I, O and Q. */
export const VIN_CHARS = /^[0-9A-HJ-NPR-Z]*$/;

/** Upper-cases and drops spaces and dashes people type or paste. */
export function normalizeVin(input: string): string {
  return input.toUpperCase().replace(/[\s-]/g, '');
}

function charValue(c: string): number | undefined {
  if (c >= '0' && c <= '9') return Number(c);
  return TRANSLITERATION[c];
}

/** The check digit a 17-character VIN should carry at position 9 ('0'–'9' or 'X'), or null if it has a character a VIN cannot hold. */
export function vinCheckDigit(vin: string): string | null {
  if (vin.length !== VIN_LENGTH) return null;
  let sum = 0;
  for (let i = 0; i < VIN_LENGTH; i++) {
    const v = charValue(vin[i]);
    if (v === undefined) return null;
    sum += v * WEIGHTS[i];
  }
  const rest = sum % 11;
  return rest === 10 ? 'X' : String(rest);
}

/** True when a 17-character VIN's position 9 matches its computed check digit. */
export function isVinCheckDigitValid(vin: string): boolean {
  const expected = vinCheckDigit(vin);
  return expected !== null && vin[8] === expected;
}

export interface ModelYear {
  /** The year the code means for a car or light truck. */
  year: number;
  /** Both years the position 10 code can mean on its 30-year cycle. */
  candidates: [number, number];
}

/**
 * Model year from position 10, with position 7 choosing the 30-year cycle:
 * a letter there means 2010–2039, a digit 1980–2009 (the rule for passenger
 * cars, multipurpose vehicles and light trucks). Null when position 10 holds
 * no year code.
 */
export function decodeModelYear(vin: string): ModelYear | null {
  if (vin.length < 10) return null;
  const index = YEAR_CODES.indexOf(vin[9]);
  if (index < 0) return null;
  const early = 1980 + index;
  const late = early + 30;
  const seventh = vin[6];
  const year = seventh !== undefined && /[A-Z]/.test(seventh) ? late : early;
  return { year, candidates: [early, late] };
}

export type VinStatus = 'empty' | 'incomplete' | 'too_long' | 'bad_characters' | 'valid' | 'bad_check_digit';

export interface VinCheck {
  vin: string;
  status: VinStatus;
  /** What position 9 should be, when the VIN is complete and readable. */
  expectedCheckDigit?: string;
  modelYear?: ModelYear | null;
  /** A sentence for the person typing. */
  message: string;
}

/** Checks a VIN as typed: length, characters, check digit and decoded year, with a message for the form. */
export function checkVin(input: string): VinCheck {
  const vin = normalizeVin(input);
  if (vin.length === 0) return { vin, status: 'empty', message: 'Enter the 17-character VIN.' };
  if (!VIN_CHARS.test(vin)) {
    const bad = [...new Set([...vin].filter((c) => !/[0-9A-HJ-NPR-Z]/.test(c)))].join(' ');
    const hint = /[IOQ]/.test(vin) ? ' VINs never use I, O or Q: they are usually 1 or 0.' : '';
    return { vin, status: 'bad_characters', message: `A VIN cannot hold ${bad}.${hint}` };
  }
  if (vin.length < VIN_LENGTH) {
    return { vin, status: 'incomplete', message: `${vin.length} of 17 characters.` };
  }
  if (vin.length > VIN_LENGTH) {
    return { vin, status: 'too_long', message: `That is ${vin.length} characters; a VIN has 17.` };
  }
  const expected = vinCheckDigit(vin)!;
  const modelYear = decodeModelYear(vin);
  if (vin[8] !== expected) {
    return {
      vin,
      status: 'bad_check_digit',
      expectedCheckDigit: expected,
      modelYear,
      message: `The check digit (9th character) is ${vin[8]} but the rest of the VIN gives ${expected}. Look for a mistyped character.`,
    };
  }
  return {
    vin,
    status: 'valid',
    expectedCheckDigit: expected,
    modelYear,
    message: modelYear ? `Check digit correct. Model year ${modelYear.year}.` : 'Check digit correct.',
  };
}
