import { isUtf8 } from 'node:buffer';
import { AppError } from '../lib/errors';

/**
 * Decides from the bytes, not the name, whether an upload is text: known binary signatures first
 * (a PDF or a spreadsheet renamed .csv), then a decode as UTF-8 / UTF-16 (by BOM) / Latin-1, then
 * the share of control characters. The same idea as the file-type package's magic numbers, kept
 * here because its current line is ESM-only and the server runs as CommonJS under tsx.
 */

const SIGNATURES: { name: string; bytes: number[]; offset?: number }[] = [
  { name: 'a PDF document', bytes: [0x25, 0x50, 0x44, 0x46] },
  { name: 'a ZIP archive or a spreadsheet (.xlsx, .ods)', bytes: [0x50, 0x4b, 0x03, 0x04] },
  { name: 'a ZIP archive', bytes: [0x50, 0x4b, 0x05, 0x06] },
  { name: 'an old Excel or Word file', bytes: [0xd0, 0xcf, 0x11, 0xe0, 0xa1, 0xb1, 0x1a, 0xe1] },
  { name: 'a PNG image', bytes: [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a] },
  { name: 'a JPEG image', bytes: [0xff, 0xd8, 0xff] },
  { name: 'a GIF image', bytes: [0x47, 0x49, 0x46, 0x38] },
  { name: 'a WebP image or a WAV sound', bytes: [0x52, 0x49, 0x46, 0x46] },
  { name: 'a TIFF image', bytes: [0x49, 0x49, 0x2a, 0x00] },
  { name: 'a TIFF image', bytes: [0x4d, 0x4d, 0x00, 0x2a] },
  { name: 'a gzip archive', bytes: [0x1f, 0x8b] },
  { name: 'a 7-Zip archive', bytes: [0x37, 0x7a, 0xbc, 0xaf, 0x27, 0x1c] },
  { name: 'a RAR archive', bytes: [0x52, 0x61, 0x72, 0x21, 0x1a, 0x07] },
  { name: 'a bzip2 archive', bytes: [0x42, 0x5a, 0x68] },
  { name: 'an xz archive', bytes: [0xfd, 0x37, 0x7a, 0x58, 0x5a, 0x00] },
  { name: 'a program', bytes: [0x7f, 0x45, 0x4c, 0x46] },
  { name: 'a program', bytes: [0x4d, 0x5a] },
  { name: 'a database file', bytes: [0x53, 0x51, 0x4c, 0x69, 0x74, 0x65, 0x20, 0x66, 0x6f, 0x72, 0x6d, 0x61, 0x74] },
  { name: 'a BMP image', bytes: [0x42, 0x4d] },
];

const EXPECTED = 'Expected a CSV text file: a header row, then one row per item, separated by commas.';

/** Share of control characters (other than tab, CR, LF) above which a decoded text is not a CSV. */
const MAX_CONTROL_SHARE = 0.01;
const SAMPLE_CHARS = 65536;

const notText = (what: string) =>
  new AppError('not-csv', `The file is ${what}, not CSV text. Save it as CSV (comma-separated text) and upload that. ${EXPECTED}`, 415);

/** The binary format a buffer starts with, if it is one we know. */
export function binarySignature(buffer: Buffer): string | null {
  for (const s of SIGNATURES) {
    const at = s.offset ?? 0;
    if (buffer.length >= at + s.bytes.length && s.bytes.every((b, i) => buffer[at + i] === b)) {
      // "BM" and "MZ" are two letters a text file may well start with: trust them only with binary bytes behind.
      if (s.bytes.length === 2 && s.bytes[0] !== 0x1f && !hasBinaryBytes(buffer.subarray(0, 512))) continue;
      return s.name;
    }
  }
  return null;
}

function hasBinaryBytes(head: Buffer): boolean {
  for (const byte of head) if (byte < 9 || (byte > 13 && byte < 32)) return true;
  return false;
}

/** Decodes by BOM (UTF-8, UTF-16 LE/BE), else strict UTF-8, else Latin-1 (older spreadsheet exports). */
function decode(buffer: Buffer): string {
  if (buffer[0] === 0xff && buffer[1] === 0xfe) return strict('utf-16le', buffer.subarray(2));
  if (buffer[0] === 0xfe && buffer[1] === 0xff) return strict('utf-16be', buffer.subarray(2));
  if (buffer[0] === 0xef && buffer[1] === 0xbb && buffer[2] === 0xbf) return strict('utf-8', buffer.subarray(3));
  // isUtf8 validates without building a string (SIMD in Node); a valid buffer then decodes the same either way.
  if (isUtf8(buffer)) return buffer.toString('utf8');
  // Windows-1252 (older spreadsheet exports): every byte is a character, so the control share decides below.
  return windows1252.decode(buffer);
}

/** Windows-1252's letters at 0x80–0x9F (WHATWG Encoding index); Node's small ICU decodes that range as Latin-1 controls. */
const CP1252_HIGH = '\u20ac\u0081\u201a\u0192\u201e\u2026\u2020\u2021\u02c6\u2030\u0160\u2039\u0152\u008d\u017d\u008f\u0090\u2018\u2019\u201c\u201d\u2022\u2013\u2014\u02dc\u2122\u0161\u203a\u0153\u009d\u017e\u0178';
const windows1252 = {
  decode: (bytes: Buffer) => bytes.toString('latin1').replace(/[\u0080-\u009f]/g, (c) => CP1252_HIGH[c.charCodeAt(0) - 0x80]),
};

function strict(encoding: string, bytes: Buffer): string {
  try {
    return new TextDecoder(encoding, { fatal: true }).decode(bytes);
  } catch {
    throw notText(`marked as ${encoding.toUpperCase()} text but does not decode as it`);
  }
}

/** Whether a character code is a control character a CSV never holds (C0 but tab/LF/CR, DEL, C1). */
const isControl = (code: number) => (code < 32 && code !== 9 && code !== 10 && code !== 13) || (code >= 0x7f && code <= 0x9f);

/** The upload as text, or a 415 naming what it is instead. */
export function sniffText(buffer: Buffer): string {
  const signature = binarySignature(buffer);
  if (signature) throw notText(signature);
  const text = decode(buffer);
  if (text.includes('\u0000')) throw notText('binary data (it holds NUL bytes)');
  const sample = text.length > SAMPLE_CHARS ? text.slice(0, SAMPLE_CHARS) : text;
  let control = 0;
  for (let i = 0; i < sample.length; i++) if (isControl(sample.charCodeAt(i))) control++;
  if (control > Math.max(1, sample.length * MAX_CONTROL_SHARE)) throw notText('binary data (too many control characters for text)');
  return text;
}
