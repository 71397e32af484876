import { describe, expect, it } from 'vitest';
import { decodeEngineRpm, decodeFuelTrimPct, decodeMode01, decodeMode01Response, requireByte } from './obd';

describe('OBD-II decoding input checks', () => {
  it('refuses anything that is not one data byte', () => {
    for (const bad of [-1, 256, 1.5, Number.NaN]) expect(() => requireByte(bad)).toThrowError(/whole number from 0 to 255/);
    expect(() => decodeFuelTrimPct(300)).toThrowError(/0 to 255/);
    expect(() => decodeEngineRpm(1, 256)).toThrow(expect.objectContaining({ field: 'B' }));
  });

  it('refuses unknown PIDs, short data and malformed answers', () => {
    expect(() => decodeMode01(0x05, [100])).toThrowError(/PID 5 is not one Baywalk decodes; use 06, 07, 08, 09, 0B, 0C, 33/);
    expect(() => decodeMode01(0x0c, [0x1a])).toThrowError(/needs 2 data byte/);
    expect(() => decodeMode01Response('41 0C 1A F')).toThrowError(/pairs of hex digits/);
    expect(() => decodeMode01Response('7F 01 12')).toThrowError(/starts with 41/);
    expect(() => decodeMode01Response('41 0B')).toThrowError(/at least 41, the PID and one data byte/);
  });

  it('accepts colons and no spaces between bytes', () => {
    expect(decodeMode01Response('41:0B:22').value).toBe(34);
    expect(decodeMode01Response('410B22').value).toBe(34);
  });
});
