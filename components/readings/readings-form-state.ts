/**
 * The Readings form as plain data: what each field shows (text), and the
 * translation into the readings check's input. Kept free of React so it is
 * tested without rendering.
 */
import type { EngineProfile, NeedleBehaviour, PressureUnit } from '@/shared/readings/reading-kinds';
import type { LengthUnit } from '@/shared/readings/units';
import type { ReadingsCheckInput } from '@/shared/readings/readings-check';
import { parseNumberText } from './number-text';

export type BankKey = 'bank1' | 'bank2';
export type SpeedKey = 'idle' | 'at2500';
export interface TrimPairText {
  shortText: string;
  longText: string;
}

export interface ReadingsFormState {
  airSource: 'altitude' | 'baro';
  altitudeText: string;
  altitudeUnit: LengthUnit;
  baroText: string;
  baroUnit: PressureUnit;
  profile: EngineProfile;
  vacuumSource: 'vacuum' | 'map';
  vacuumText: string;
  vacuumUnit: PressureUnit;
  needle?: NeedleBehaviour;
  twoBanks: boolean;
  trims: Record<BankKey, Record<SpeedKey, TrimPairText>>;
}

const emptyPair = (): TrimPairText => ({ shortText: '', longText: '' });
const emptyBank = () => ({ idle: emptyPair(), at2500: emptyPair() });

/** A blank form at the given defaults (the shop's altitude and unit when known, else sea level and inHg). */
export function initialFormState(defaults: { altitudeM?: number; pressureUnit?: PressureUnit } = {}): ReadingsFormState {
  const unit = defaults.pressureUnit ?? 'inHg';
  // Shops that read inches or psi usually think of altitude in feet.
  const altitudeUnit: LengthUnit = unit === 'inHg' || unit === 'psi' ? 'ft' : 'm';
  const altitudeM = defaults.altitudeM ?? 0;
  const altitude = altitudeUnit === 'ft' ? Math.round(altitudeM / 0.3048) : Math.round(altitudeM);
  return {
    airSource: 'altitude',
    altitudeText: String(altitude),
    altitudeUnit,
    baroText: '',
    baroUnit: unit === 'inH2O' || unit === 'Pa' ? 'kPa' : unit,
    profile: 'stock',
    vacuumSource: 'vacuum',
    vacuumText: '',
    vacuumUnit: unit,
    needle: undefined,
    twoBanks: false,
    trims: { bank1: emptyBank(), bank2: emptyBank() },
  };
}

export interface FormTranslation {
  input: ReadingsCheckInput;
  /** Text that is not a number, or half a trim pair, keyed like the check's own fields. */
  errors: Record<string, string>;
  /** True when there is a reading to judge (vacuum, MAP or any trim pair). */
  hasReading: boolean;
}

/** Turns the form's text into the check's input, with a message for each field that cannot be read. */
export function toCheckInput(s: ReadingsFormState): FormTranslation {
  const errors: Record<string, string> = {};
  const num = (text: string, field: string) => {
    const p = parseNumberText(text);
    if (p.kind === 'invalid') errors[field] = p.message;
    return p.kind === 'number' ? p.value : undefined;
  };

  const input: ReadingsCheckInput = { profile: s.profile, needle: s.needle };
  if (s.airSource === 'baro') {
    const v = num(s.baroText, 'baro');
    if (v !== undefined) input.baro = { value: v, unit: s.baroUnit };
    else if (!errors.baro) errors.baro = 'Enter the barometric pressure, or switch to the altitude.';
  } else {
    const v = num(s.altitudeText, 'altitude');
    if (v !== undefined) input.altitude = { value: v, unit: s.altitudeUnit };
  }

  const reading = num(s.vacuumText, s.vacuumSource);
  if (reading !== undefined) input[s.vacuumSource] = { value: reading, unit: s.vacuumUnit };

  const banks: BankKey[] = s.twoBanks ? ['bank1', 'bank2'] : ['bank1'];
  let anyTrim = false;
  for (const bank of banks) {
    for (const speed of ['idle', 'at2500'] as const) {
      const pair = s.trims[bank][speed];
      const base = `trims.${bank}.${speed}`;
      const shortPct = num(pair.shortText, `${base}.shortPct`);
      const longPct = num(pair.longText, `${base}.longPct`);
      if (shortPct !== undefined && longPct !== undefined) {
        input.trims ??= {};
        input.trims[bank] = { ...input.trims[bank], [speed]: { shortPct, longPct } };
        anyTrim = true;
      } else if (shortPct !== undefined && pair.longText.trim() === '') {
        errors[`${base}.longPct`] = 'Enter the long term trim too (0 if the scan tool shows none).';
      } else if (longPct !== undefined && pair.shortText.trim() === '') {
        errors[`${base}.shortPct`] = 'Enter the short term trim too.';
      }
    }
  }
  return { input, errors, hasReading: reading !== undefined || anyTrim };
}
