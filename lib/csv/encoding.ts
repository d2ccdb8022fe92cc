/**
 * Byte-level checks before parsing: the import format is UTF-8 text (a UTF-8 BOM is fine).
 * Spreadsheets also save UTF-16 ("Unicode text"), legacy code pages and workbooks; each
 * gets a problem that says what to do instead of a page of garbled rows.
 */
import type { RowProblem } from './columns';

const SAVE_AS = 'save it from the spreadsheet as "CSV UTF-8 (comma delimited)"';
const fileProblem = (reason: string, line = 1): RowProblem => ({ line, column: null, reason });

/** 1-based line of a byte offset (LF counts lines; CRLF ends in LF). */
function lineOfOffset(bytes: Uint8Array, offset: number): number {
  let line = 1;
  for (let i = 0; i < offset && i < bytes.length; i++) if (bytes[i] === 0x0a) line++;
  return line;
}

/** UTF-16 without a BOM: most NULs sit at even offsets (big-endian) or odd ones (little-endian). */
function looksLikeUtf16(bytes: Uint8Array): boolean {
  const sample = bytes.subarray(0, 4096);
  let even = 0;
  let odd = 0;
  for (let i = 0; i < sample.length; i++) {
    if (sample[i] !== 0) continue;
    if (i % 2 === 0) even++;
    else odd++;
  }
  const half = sample.length / 2;
  return Math.max(even, odd) >= half * 0.3 && Math.min(even, odd) <= half * 0.05;
}

/** First line that is not valid UTF-8. Multi-byte UTF-8 sequences never contain 0x0A. */
function firstInvalidUtf8Line(bytes: Uint8Array): number | null {
  const decoder = new TextDecoder('utf-8', { fatal: true });
  let start = 0;
  let line = 1;
  while (start <= bytes.length) {
    let end = bytes.indexOf(0x0a, start);
    if (end === -1) end = bytes.length;
    try {
      decoder.decode(bytes.subarray(start, end));
    } catch {
      return line;
    }
    start = end + 1;
    line++;
  }
  return null;
}

/**
 * A file-level problem when the bytes are not UTF-8 text: UTF-16 (with BOM FF FE / FE FF,
 * or without one but full of NULs), a workbook (zip), other binary data (NUL bytes) or
 * bytes that are not valid UTF-8 (e.g. Windows-1252). Null when the bytes can be decoded.
 */
export function checkCsvBytes(bytes: Uint8Array): RowProblem | null {
  const [b0, b1, b2, b3] = bytes;
  if ((b0 === 0xff && b1 === 0xfe) || (b0 === 0xfe && b1 === 0xff)) {
    return fileProblem(`the file is saved as UTF-16 ("Unicode text"); ${SAVE_AS}`);
  }
  if (b0 === 0x50 && b1 === 0x4b && b2 === 0x03 && b3 === 0x04) {
    return fileProblem(`the file is a spreadsheet workbook (e.g. .xlsx), not CSV; ${SAVE_AS}`);
  }
  const nul = bytes.indexOf(0);
  if (nul !== -1) {
    if (looksLikeUtf16(bytes)) return fileProblem(`the file is saved as UTF-16 ("Unicode text"); ${SAVE_AS}`);
    return fileProblem(
      `the file contains binary data (a NUL byte), so it is not a CSV text file; ${SAVE_AS}`,
      lineOfOffset(bytes, nul),
    );
  }
  const bad = firstInvalidUtf8Line(bytes);
  if (bad !== null) {
    return fileProblem(
      `the file is not valid UTF-8 (perhaps saved as Windows-1252 or Latin-1; accented letters and Ω are affected); ${SAVE_AS}`,
      bad,
    );
  }
  return null;
}

/**
 * Decodes UTF-8 and drops a leading BOM. Throws (TextDecoder fatal) on invalid bytes:
 * call checkCsvBytes first to get a readable problem instead.
 */
export function decodeCsv(bytes: Uint8Array): string {
  const text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  return text.startsWith('\uFEFF') ? text.slice(1) : text;
}
