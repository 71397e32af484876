/**
 * OBD-II mode 01 decoding from raw data bytes, for the values the readings
 * check uses. Formulas: SAE J1979 / ISO 15031-5 as commonly documented.
 */
import { ReadingError } from './errors';

/** Mode 01 PIDs this module decodes. */
export const OBD_PIDS = {
  shortTrimBank1: 0x06,
  longTrimBank1: 0x07,
  shortTrimBank2: 0x08,
  longTrimBank2: 0x09,
  mapKpa: 0x0b,
  engineRpm: 0x0c,
  baroKpa: 0x33,
} as const;

/** Throws unless the value is a whole number 0–255 (one data byte). */
export function requireByte(value: number, field = 'byte'): number {
  if (!Number.isInteger(value) || value < 0 || value > 255) {
    throw new ReadingError(field, `A data byte must be a whole number from 0 to 255 (0x00–0xFF); ${String(value)} is not.`);
  }
  return value;
}

/** Fuel trim in % from byte A (PIDs 06–09): (A − 128)·100/128, −100 to +99.22. */
export function decodeFuelTrimPct(a: number): number {
  return ((requireByte(a, 'A') - 128) * 100) / 128;
}

/** Intake manifold absolute pressure in kPa from byte A (PID 0B). */
export function decodeMapKpa(a: number): number {
  return requireByte(a, 'A');
}

/** Absolute barometric pressure in kPa from byte A (PID 33). */
export function decodeBaroKpa(a: number): number {
  return requireByte(a, 'A');
}

/** Engine speed in rpm from bytes A and B (PID 0C): (256·A + B)/4. */
export function decodeEngineRpm(a: number, b: number): number {
  return (256 * requireByte(a, 'A') + requireByte(b, 'B')) / 4;
}

export interface DecodedPid {
  pid: number;
  name: string;
  value: number;
  unit: '%' | 'kPa' | 'rpm';
}

const NAMES: Record<number, [string, DecodedPid['unit'], number]> = {
  0x06: ['Short term fuel trim, bank 1', '%', 1],
  0x07: ['Long term fuel trim, bank 1', '%', 1],
  0x08: ['Short term fuel trim, bank 2', '%', 1],
  0x09: ['Long term fuel trim, bank 2', '%', 1],
  0x0b: ['Intake manifold absolute pressure', 'kPa', 1],
  0x0c: ['Engine speed', 'rpm', 2],
  0x33: ['Absolute barometric pressure', 'kPa', 1],
};

/** Decodes a mode 01 PID from its data bytes (without the 41 and PID echo). */
export function decodeMode01(pid: number, data: readonly number[]): DecodedPid {
  const entry = NAMES[pid];
  if (!entry) {
    const known = Object.keys(NAMES).map((k) => Number(k).toString(16).toUpperCase().padStart(2, '0'));
    throw new ReadingError('pid', `PID ${pid.toString(16).toUpperCase()} is not one Baywalk decodes; use ${known.join(', ')}.`);
  }
  const [name, unit, length] = entry;
  if (data.length < length) throw new ReadingError('data', `${name} (PID ${pid.toString(16).toUpperCase().padStart(2, '0')}) needs ${length} data byte(s); got ${data.length}.`);
  const value =
    pid === 0x0c ? decodeEngineRpm(data[0], data[1]) : unit === '%' ? decodeFuelTrimPct(data[0]) : requireByte(data[0], 'A');
  return { pid, name, value, unit };
}

/** Decodes a mode 01 answer written as hex bytes, e.g. "41 0C 1A F8". */
export function decodeMode01Response(hex: string): DecodedPid {
  const digits = hex.replace(/[\s:]/g, '');
  if (!/^([0-9a-f]{2})+$/i.test(digits)) {
    throw new ReadingError('response', `"${hex}" is not a list of hex bytes; write the answer as pairs of hex digits, e.g. "41 0C 1A F8".`);
  }
  const bytes = (digits.match(/../g) ?? []).map((h) => parseInt(h, 16));
  if (bytes[0] !== 0x41) throw new ReadingError('response', 'A mode 01 answer starts with 41 (the mode plus 0x40).');
  if (bytes.length < 3) throw new ReadingError('response', 'A mode 01 answer needs at least 41, the PID and one data byte.');
  return decodeMode01(bytes[1], bytes.slice(2));
}
