import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import vinValidator from 'vin-validator';
import { checkVin, decodeModelYear, isVinCheckDigitValid, normalizeVin, vinCheckDigit } from '@/shared/vin';

// Source for every check in this file unless noted: 49 CFR 565.15 (North American
// VIN check digit and model-year code), as summarised in REFERENCES.md section 5.
describe('VIN check digit (49 CFR 565.15)', () => {
  // Example VINs published as valid examples of the 49 CFR 565.15 rule (REFERENCES.md §5).
  const published: Array<[string, string]> = [
    ['1M8GDM9AXKP042788', 'X'],
    ['1G4AH59H45G118341', '4'],
    ['JH2RC3605MM101581', '5'],
    ['1J9RP1A36A1644345', '6'],
    ['11111111111111111', '1'],
  ];

  for (const [vin, digit] of published) {
    it(`accepts the published example ${vin} (check digit ${digit})`, () => {
      expect(vinCheckDigit(vin)).toBe(digit);
      expect(isVinCheckDigitValid(vin)).toBe(true);
      expect(checkVin(vin).status).toBe('valid');
    });
  }

  it('refuses the published altered example 1M8GDM9A0KP042788 and names the right digit', () => {
    expect(isVinCheckDigitValid('1M8GDM9A0KP042788')).toBe(false);
    const check = checkVin('1M8GDM9A0KP042788');
    expect(check.status).toBe('bad_check_digit');
    expect(check.expectedCheckDigit).toBe('X');
    expect(check.message).toMatch(/is 0 but .* gives X/);
  });

  it('normalises what people type: lower case, spaces and dashes', () => {
    expect(normalizeVin(' 1m8gdm9ax-kp042788 ')).toBe('1M8GDM9AXKP042788');
    expect(checkVin('1m8gdm9ax kp042788').status).toBe('valid');
  });

  it('explains incomplete, over-long and impossible VINs', () => {
    expect(checkVin('').status).toBe('empty');
    expect(checkVin('1G4AH59H').message).toBe('8 of 17 characters.');
    expect(checkVin('1G4AH59H45G1183411').status).toBe('too_long');
    const withO = checkVin('1G4AH59H45GO18341');
    expect(withO.status).toBe('bad_characters');
    expect(withO.message).toMatch(/never use I, O or Q/);
  });

  // Cross-check with the independent `vin-validator` package (npm), which implements
  // the same 49 CFR 565.15 rule in its own code.
  const vinChar = fc.constantFrom(...'0123456789ABCDEFGHJKLMNPRSTUVWXYZ'.split(''));
  const anyVinShaped = fc.array(vinChar, { minLength: 17, maxLength: 17 }).map((cs) => cs.join(''));
  const withCorrectDigit = anyVinShaped.map((v) => v.slice(0, 8) + vinCheckDigit(v)! + v.slice(9));
  const withStrayChars = fc
    .tuple(anyVinShaped, fc.integer({ min: 0, max: 16 }), fc.constantFrom('I', 'O', 'Q', '*', ' '))
    .map(([v, at, c]) => v.slice(0, at) + c + v.slice(at + 1));

  it('agrees with vin-validator on many random 17-character VINs', () => {
    fc.assert(
      fc.property(anyVinShaped, (vin) => isVinCheckDigitValid(vin) === vinValidator.validate(vin)),
      { numRuns: 20_000 },
    );
  });

  it('agrees with vin-validator on VINs given the computed check digit (all valid)', () => {
    fc.assert(
      fc.property(withCorrectDigit, (vin) => {
        expect(vinValidator.validate(vin)).toBe(true);
        expect(isVinCheckDigitValid(vin)).toBe(true);
      }),
      { numRuns: 5_000 },
    );
  });

  it('agrees with vin-validator on VINs holding a character a VIN cannot have (all invalid)', () => {
    fc.assert(
      fc.property(withStrayChars, (vin) => isVinCheckDigitValid(vin) === vinValidator.validate(vin) && !isVinCheckDigitValid(vin)),
      { numRuns: 5_000 },
    );
  });
});

describe('VIN model year (49 CFR 565.15, position 10 with position 7)', () => {
  // The 30-year code cycle: letters skip I, O, Q, U, Z; digits skip 0 (REFERENCES.md §5).
  const cycle = 'ABCDEFGHJKLMNPRSTVWXY123456789';
  const vinWith = (seventh: string, tenth: string) => `1G4AH5${seventh}H4${tenth}G118341`;

  it('maps every position 10 code to its two years, one cycle apart', () => {
    cycle.split('').forEach((code, i) => {
      expect(decodeModelYear(vinWith('9', code))).toEqual({ year: 1980 + i, candidates: [1980 + i, 2010 + i] });
    });
    expect(decodeModelYear(vinWith('9', 'Y'))?.year).toBe(2000);
    expect(decodeModelYear(vinWith('9', '1'))?.year).toBe(2001);
    expect(decodeModelYear(vinWith('9', '9'))?.year).toBe(2009);
  });

  it('reads a letter in position 7 as the 2010–2039 cycle', () => {
    expect(decodeModelYear(vinWith('A', 'A'))?.year).toBe(2010);
    expect(decodeModelYear(vinWith('C', 'R'))?.year).toBe(2024);
    expect(decodeModelYear(vinWith('9', 'R'))?.year).toBe(1994);
  });

  it('has no year for the codes the cycle skips', () => {
    for (const code of ['I', 'O', 'Q', 'U', 'Z', '0']) expect(decodeModelYear(vinWith('9', code))).toBeNull();
  });

  it('decodes the published examples', () => {
    expect(decodeModelYear('1G4AH59H45G118341')?.year).toBe(2005); // position 10 "5", position 7 digit
    expect(decodeModelYear('JH2RC3605MM101581')?.year).toBe(1991); // position 10 "M", position 7 digit
    expect(decodeModelYear('1J9RP1A36A1644345')?.year).toBe(2010); // position 10 "A", position 7 letter
    expect(checkVin('1G4AH59H45G118341').message).toBe('Check digit correct. Model year 2005.');
  });
});
