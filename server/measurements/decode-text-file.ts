/** Turns an uploaded file's bytes into text, refusing binary files with a message that says why. */

/** The decoded text, or a stable code and a message saying what to do. */
export type DecodedText =
  | { ok: true; text: string; encoding: 'utf-8' | 'utf-16le' | 'windows-1252' }
  | { ok: false; code: string; message: string };

const SIGNATURES: readonly { bytes: readonly number[]; what: string }[] = [
  { bytes: [0x50, 0x4b, 0x03, 0x04], what: 'a spreadsheet (.xlsx/.ods) or another zip archive' },
  { bytes: [0xd0, 0xcf, 0x11, 0xe0], what: 'an old Excel (.xls) workbook' },
  { bytes: [0x25, 0x50, 0x44, 0x46], what: 'a PDF' },
  { bytes: [0x89, 0x50, 0x4e, 0x47], what: 'a PNG image' },
  { bytes: [0xff, 0xd8, 0xff], what: 'a JPEG image' },
  { bytes: [0x1f, 0x8b], what: 'a gzip archive' },
];

function startsWith(bytes: Uint8Array, prefix: readonly number[]): boolean {
  return prefix.every((b, i) => bytes[i] === b);
}

/** Share of characters that are control characters other than tab, CR and LF. */
function controlShare(text: string): number {
  let count = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if ((c < 32 && c !== 9 && c !== 10 && c !== 13) || c === 0x7f || c === 0xfffd) count++;
  }
  return text.length === 0 ? 0 : count / text.length;
}

const NOT_TEXT = (what: string): DecodedText => ({
  ok: false,
  code: 'NOT_A_CSV',
  message: `This file is ${what}, not a CSV text file. Export or save the log as CSV and upload that.`,
});

/**
 * Decodes UTF-8 (with or without BOM), UTF-16LE with a BOM, or, when the bytes are not valid
 * UTF-8, Windows-1252 (what many loggers and spreadsheet exports write). Files that start with a
 * known binary signature, contain NUL bytes, or whose text is more than 0.1 % control characters
 * are refused as `NOT_A_CSV`; an empty file is `EMPTY_FILE`.
 */
export function decodeTextFile(bytes: Uint8Array): DecodedText {
  if (bytes.length === 0)
    return {
      ok: false,
      code: 'EMPTY_FILE',
      message: 'The file is empty; choose the CSV your logger wrote.',
    };
  const signature = SIGNATURES.find((s) => startsWith(bytes, s.bytes));
  if (signature) return NOT_TEXT(signature.what);
  if (startsWith(bytes, [0xff, 0xfe])) {
    const text = new TextDecoder('utf-16le').decode(bytes.subarray(2));
    return controlShare(text) > 0.001
      ? NOT_TEXT('binary data')
      : { ok: true, text, encoding: 'utf-16le' };
  }
  if (bytes.includes(0)) return NOT_TEXT('binary data (it contains NUL bytes)');
  let text: string;
  let encoding: 'utf-8' | 'windows-1252' = 'utf-8';
  try {
    text = new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(bytes);
  } catch {
    text = new TextDecoder('windows-1252').decode(bytes);
    encoding = 'windows-1252';
  }
  if (controlShare(text) > 0.001) return NOT_TEXT('binary data');
  return { ok: true, text, encoding };
}
