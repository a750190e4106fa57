/**
 * Spreadsheets save CSV as UTF-8 (with or without a byte-order mark) or, on older Windows set-ups, as
 * Windows-1252. Reading the second as UTF-8 turns every accented letter into U+FFFD without a word, so
 * the bytes are decoded here: UTF-8 when they are valid UTF-8, Windows-1252 when they are plainly that
 * (no byte that code page leaves undefined, no control characters), otherwise a sentence to act on.
 */

export type DecodedCsv = { text: string; encoding: 'utf-8' | 'windows-1252' } | { problem: string };

/** Bytes Windows-1252 does not define, and control characters no CSV holds (tab, CR and LF are fine). */
const NOT_WINDOWS_1252 = new Set([0x81, 0x8d, 0x8f, 0x90, 0x9d]);
const isStrayControl = (b: number) => b < 0x20 && b !== 0x09 && b !== 0x0a && b !== 0x0d;

/**
 * Windows-1252 is ISO-8859-1 but for 0x80–0x9F, which hold typographic characters (the WHATWG
 * Encoding Standard's index-windows-1252). Decoded by hand: Node's TextDecoder reads this label as
 * ISO-8859-1 and would turn "€" into a control character. The five undefined bytes are refused above.
 */
const WINDOWS_1252_80_9F =
  '\u20AC\u0081\u201A\u0192\u201E\u2026\u2020\u2021\u02C6\u2030\u0160\u2039\u0152\u008D\u017D\u008F' +
  '\u0090\u2018\u2019\u201C\u201D\u2022\u2013\u2014\u02DC\u2122\u0161\u203A\u0153\u009D\u017E\u0178';

function decodeWindows1252(bytes: Uint8Array): string {
  let text = '';
  for (const b of bytes) text += b >= 0x80 && b <= 0x9f ? WINDOWS_1252_80_9F[b - 0x80] : String.fromCharCode(b);
  return text;
}

export const NOT_TEXT_PROBLEM =
  'This file is not text Gripline can read (neither UTF-8 nor Windows-1252). In the spreadsheet, save it as "CSV UTF-8" and choose it again.';

export function decodeCsvBytes(bytes: Uint8Array): DecodedCsv {
  try {
    const text = new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(bytes);
    if ([...text.slice(0, 4096)].some((c) => isStrayControl(c.charCodeAt(0)))) return { problem: NOT_TEXT_PROBLEM };
    return { text, encoding: 'utf-8' };
  } catch {
    if (bytes.some((b) => NOT_WINDOWS_1252.has(b) || isStrayControl(b))) return { problem: NOT_TEXT_PROBLEM };
    return { text: decodeWindows1252(bytes), encoding: 'windows-1252' };
  }
}

/**
 * CSV text that was decoded as UTF-8 somewhere before it reached us carries U+FFFD where the file had
 * other bytes: the line of the first, so the refusal can say where.
 */
export function lineWithReplacementCharacter(text: string): number | undefined {
  const at = text.indexOf('\uFFFD');
  return at < 0 ? undefined : text.slice(0, at).split('\n').length;
}
