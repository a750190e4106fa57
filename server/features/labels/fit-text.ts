/**
 * Wraps text into at most `maxLines` lines no wider than `maxWidth`; when it does not fit, the
 * last line ends with an ellipsis. `measure` gives a string's width in the font that will draw it.
 */
export function fitLines(text: string, maxWidth: number, maxLines: number, measure: (s: string) => number): string[] {
  const words = text.trim().split(/\s+/).filter(Boolean);
  const lines: string[] = [];
  let i = 0;
  while (i < words.length && lines.length < maxLines) {
    let line = words[i]!;
    if (measure(line) > maxWidth) {
      line = longestPrefix(line, maxWidth, measure);
      words[i] = words[i]!.slice(line.length);
    } else {
      i++;
      while (i < words.length && measure(`${line} ${words[i]}`) <= maxWidth) line += ` ${words[i++]}`;
    }
    lines.push(line);
  }
  if (i < words.length && lines.length > 0) lines[lines.length - 1] = withEllipsis(lines[lines.length - 1]!, maxWidth, measure);
  return lines;
}

const ELLIPSIS = '…';

function withEllipsis(line: string, maxWidth: number, measure: (s: string) => number): string {
  let cut = line;
  while (cut.length > 0 && measure(cut + ELLIPSIS) > maxWidth) cut = cut.slice(0, -1);
  return cut.replace(/[\s,;:.\-–]+$/, '') + ELLIPSIS;
}

function longestPrefix(word: string, maxWidth: number, measure: (s: string) => number): string {
  let end = word.length;
  while (end > 1 && measure(word.slice(0, end)) > maxWidth) end--;
  return word.slice(0, end);
}

/**
 * The PDF's built-in fonts know only the WinAnsi characters: fraction characters become
 * "5/8" ("2⅝" becomes "2 5/8"), a minus sign a hyphen, other characters outside the set become "?", so a label
 * never shows a wrong glyph.
 */
export function toWinAnsi(text: string): string {
  return text
    .replace(/(\d)([\u00bc-\u00be\u2150-\u215e])/g, '$1 $2')
    .normalize('NFKC')
    .replace(/\u2044/g, '/')
    // The minus sign of grip dashes (grip −2) is not in WinAnsi; a hyphen reads the same.
    .replace(/\u2212/g, '-')
    .replace(/[^\x20-\x7e\xa0-\xff\u2013\u2014\u2018\u2019\u201c\u201d\u2022\u2026\u2122\u20ac]/gu, '?');
}
