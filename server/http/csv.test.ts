import { describe, expect, it } from 'vitest';
import { csvField, csvLine, safeFilename } from './csv';

describe('CSV fields (RFC 4180) with formula neutralising', () => {
  it('leaves plain text and numbers alone', () => {
    expect(csvField('Port left open')).toBe('Port left open');
    expect(csvField(42)).toBe('42');
    expect(csvField(-3.5)).toBe('-3.5');
    expect(csvField(null)).toBe('');
    expect(csvField(undefined)).toBe('');
    expect(csvField(Number.NaN)).toBe('');
    expect(csvField(true)).toBe('yes');
    expect(csvField(new Date('2026-03-02T09:00:00Z'))).toBe('2026-03-02T09:00:00.000Z');
  });

  it('quotes commas, quotes, line breaks and edge spaces, doubling quotes', () => {
    expect(csvField('a,b')).toBe('"a,b"');
    expect(csvField('say "hi"')).toBe('"say ""hi"""');
    expect(csvField('one\ntwo')).toBe('"one\ntwo"');
    expect(csvField('one\r\ntwo')).toBe('"one\r\ntwo"');
    expect(csvField(' padded ')).toBe('" padded "');
  });

  it('prefixes text a spreadsheet would run as a formula with an apostrophe', () => {
    expect(csvField('=1+1')).toBe("'=1+1");
    expect(csvField('+44 20')).toBe("'+44 20");
    expect(csvField('-2+3')).toBe("'-2+3");
    expect(csvField('@SUM(A1)')).toBe("'@SUM(A1)");
    expect(csvField('\t=cmd')).toBe("'\t=cmd");
    expect(csvField('=HYPERLINK("x","y")')).toBe('"\'=HYPERLINK(""x"",""y"")"');
  });

  it('ends records with CRLF and keeps file names header-safe', () => {
    expect(csvLine(['a', 1, null, 'b,c'])).toBe('a,1,,"b,c"\r\n');
    expect(safeFilename('baywalk-causes-2026-03-02-to-2026-03-29.csv')).toBe('baywalk-causes-2026-03-02-to-2026-03-29.csv');
    expect(safeFilename('a"b\r\nc.csv')).toBe('a-b-c.csv');
  });
});
