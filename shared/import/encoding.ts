import iconv from 'iconv-lite';
import { ImportError } from './importError';
import type { EncodingName } from './types';

export interface EncodingGuess {
  encoding: EncodingName;
  bom: boolean;
}

/**
 * Tells the text encoding from the first bytes. Byte-order marks decide first (Unicode Standard §23.8, from memory);
 * otherwise bytes that are valid UTF-8 are read as UTF-8 (ASCII is both), and anything else as
 * Windows-1252, the superset of Latin-1 that spreadsheet exports in Western Europe use — a lone 0xB0
 * byte for the degree sign is the usual sign of it.
 */
export function guessEncoding(bytes: Uint8Array, complete: boolean): EncodingGuess {
  if (startsWith(bytes, [0xef, 0xbb, 0xbf])) return { encoding: 'utf-8', bom: true };
  if (startsWith(bytes, [0xff, 0xfe])) return { encoding: 'utf-16le', bom: true };
  if (startsWith(bytes, [0xfe, 0xff])) return { encoding: 'utf-16be', bom: true };
  const utf16 = unmarkedUtf16(bytes);
  if (utf16) return { encoding: utf16, bom: false };
  refuseBinary(bytes);
  return { encoding: isUtf8(bytes, complete) ? 'utf-8' : 'windows-1252', bom: false };
}

export interface TextDecoderLike {
  write(chunk: Uint8Array): string;
  end(): string;
}

/** A streaming decoder that keeps multi-byte characters split across chunks intact and drops a BOM. */
export function createDecoder(encoding: EncodingName): TextDecoderLike {
  const decoder = iconv.getDecoder(encoding, { stripBOM: true });
  return {
    write: (chunk) => decoder.write(Buffer.from(chunk.buffer, chunk.byteOffset, chunk.byteLength)),
    end: () => decoder.end() ?? '',
  };
}

function startsWith(bytes: Uint8Array, signature: number[]): boolean {
  return signature.every((value, index) => bytes[index] === value);
}

/** UTF-16 without a BOM: mostly-ASCII text leaves every other byte zero. */
function unmarkedUtf16(bytes: Uint8Array): EncodingName | null {
  const pairs = Math.min(bytes.length >> 1, 4096);
  if (pairs < 4) return null;
  let zeroEven = 0;
  let zeroOdd = 0;
  for (let i = 0; i < pairs; i++) {
    if (bytes[2 * i] === 0) zeroEven++;
    if (bytes[2 * i + 1] === 0) zeroOdd++;
  }
  if (zeroOdd > pairs * 0.4 && zeroEven < pairs * 0.02) return 'utf-16le';
  if (zeroEven > pairs * 0.4 && zeroOdd < pairs * 0.02) return 'utf-16be';
  return null;
}

const KNOWN_BINARY: { signature: number[]; what: string }[] = [
  { signature: [0x50, 0x4b, 0x03, 0x04], what: 'a ZIP archive or a spreadsheet workbook (.xlsx/.ods)' },
  { signature: [0xd0, 0xcf, 0x11, 0xe0], what: 'an old-style spreadsheet workbook (.xls)' },
  { signature: [0x25, 0x50, 0x44, 0x46], what: 'a PDF document' },
];

function refuseBinary(bytes: Uint8Array): void {
  const known = KNOWN_BINARY.find((entry) => startsWith(bytes, entry.signature));
  const sample = bytes.subarray(0, 65536);
  let control = 0;
  for (const byte of sample) {
    if (byte === 0) {
      control = sample.length;
      break;
    }
    // Tab, LF, VT, FF, CR and ESC can occur in text; other C0 controls do not.
    if (byte < 0x20 && !(byte >= 0x09 && byte <= 0x0d) && byte !== 0x1b) control++;
  }
  if (!known && control <= sample.length * 0.01) return;
  const what = known ? `looks like ${known.what}` : 'contains binary bytes, not text';
  throw new ImportError(
    'binary',
    `The file ${what}. Export the logger data as CSV or text (comma, semicolon or tab separated) and try that file.`,
  );
}

/** Strict UTF-8 check (RFC 3629): no overlongs, no surrogates, nothing past U+10FFFF. */
function isUtf8(bytes: Uint8Array, complete: boolean): boolean {
  let i = 0;
  const n = bytes.length;
  while (i < n) {
    const b = bytes[i];
    if (b < 0x80) {
      i++;
      continue;
    }
    let need: number;
    let min: number;
    if (b >= 0xc2 && b <= 0xdf) [need, min] = [1, 0x80];
    else if (b >= 0xe0 && b <= 0xef) [need, min] = [2, 0x800];
    else if (b >= 0xf0 && b <= 0xf4) [need, min] = [3, 0x10000];
    else return false;
    // A sequence cut by the end of the prefix says nothing either way.
    if (i + need >= n) return !complete;
    let code = b & (0x3f >> need);
    for (let k = 1; k <= need; k++) {
      const next = bytes[i + k];
      if ((next & 0xc0) !== 0x80) return false;
      code = (code << 6) | (next & 0x3f);
    }
    if (code < min || code > 0x10ffff || (code >= 0xd800 && code <= 0xdfff)) return false;
    i += need + 1;
  }
  return true;
}
