import { describe, expect, it } from 'vitest';
import { decodeTextFile } from './decode-text-file';

const bytes = (...values: number[]): Uint8Array => new Uint8Array(values);

describe('decodeTextFile', () => {
  it('decodes UTF-8 with and without a byte-order mark', () => {
    expect(decodeTextFile(new TextEncoder().encode('time,level\n0,1\n'))).toEqual({
      ok: true,
      text: 'time,level\n0,1\n',
      encoding: 'utf-8',
    });
    const withBom = decodeTextFile(bytes(0xef, 0xbb, 0xbf, 0x61));
    expect(withBom).toMatchObject({ ok: true, text: 'a' });
  });

  it('falls back to Windows-1252 for a degree sign written by an older logger', () => {
    const result = decodeTextFile(bytes(0x74, 0x20, 0xb0, 0x43)); // "t °C"
    expect(result).toEqual({ ok: true, text: 't °C', encoding: 'windows-1252' });
  });

  it('decodes UTF-16LE with its byte-order mark', () => {
    expect(decodeTextFile(bytes(0xff, 0xfe, 0x61, 0x00, 0x2c, 0x00))).toMatchObject({
      ok: true,
      text: 'a,',
      encoding: 'utf-16le',
    });
  });

  it('refuses spreadsheets, NUL bytes, control-heavy data and empty files with a reason', () => {
    const xlsx = decodeTextFile(bytes(0x50, 0x4b, 0x03, 0x04, 1, 2, 3));
    expect(xlsx).toMatchObject({
      ok: false,
      code: 'NOT_A_CSV',
      message: expect.stringContaining('spreadsheet'),
    });
    expect(decodeTextFile(bytes(0x61, 0x00, 0x62))).toMatchObject({ ok: false, code: 'NOT_A_CSV' });
    const noisy = Uint8Array.from({ length: 2000 }, (_, i) => (i % 50 === 0 ? 0x07 : 0x61));
    expect(decodeTextFile(noisy)).toMatchObject({ ok: false, code: 'NOT_A_CSV' });
    expect(decodeTextFile(bytes())).toMatchObject({ ok: false, code: 'EMPTY_FILE' });
  });
});
