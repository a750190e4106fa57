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

/** The room a label's text has, in points: its width and height, the template's type size and the smallest allowed. */
export interface TextRoom {
  width: number;
  height: number;
  fontSize: number;
  minFontSize: number;
  /** Line advance as a multiple of the type size. */
  lineHeight: number;
  /** Lines a title with nothing to keep whole may take at the template's size (all the height allows when absent). */
  maxLines?: number;
}

const FIELD_SEPARATOR = ' · ';
const SIZE_STEP = 0.5;

/**
 * A label's title and caution, wrapped into its room. A title's first field (up to the first " · ") is
 * a name that may be shortened with an ellipsis; the fields after it are measurements (a diameter,
 * a grip and its range) that, like the caution, are never cut: the type shrinks by half points, down
 * to `minFontSize`, until everything fits whole. A title with nothing to keep whole stays at the
 * template's size and is shortened as `fitLines` does. Only when even the smallest size is too small is
 * the name shortened, above its measurements and the caution.
 * `measure` gives a string's width at a type size.
 */
export function fitLabelText(
  title: string,
  caution: string | undefined,
  room: TextRoom,
  measure: (s: string, fontSize: number) => number,
): { fontSize: number; lines: string[] } {
  const [name = '', ...fields] = title.split(FIELD_SEPARATOR);
  const measurements = fields.join(FIELD_SEPARATOR);
  const mustStayWhole = measurements !== '' || caution !== undefined;
  const sizes = mustStayWhole ? typeSizes(room.fontSize, room.minFontSize) : [room.fontSize];
  const linesAt = (size: number) => Math.max(1, Math.floor(room.height / (size * room.lineHeight) + 1e-9));
  const fitterAt = (size: number) => (text: string, maxLines = Infinity) => fitLines(text, room.width, maxLines, (s) => measure(s, size));
  for (const size of sizes) {
    const fit = fitterAt(size);
    if (!mustStayWhole) return { fontSize: size, lines: fit(title, room.maxLines ?? linesAt(size)) };
    const lines = [...fit(title), ...(caution ? fit(caution) : [])];
    if (lines.length <= linesAt(size)) return { fontSize: size, lines };
  }
  const size = sizes.at(-1)!;
  const fit = fitterAt(size);
  const kept = [...(measurements ? fit(measurements) : []), ...(caution ? fit(caution) : [])];
  return { fontSize: size, lines: [...fit(name, Math.max(0, linesAt(size) - kept.length)), ...kept] };
}

/** From the template's size down to the smallest, by half points; the smallest always included. */
function typeSizes(fontSize: number, minFontSize: number): number[] {
  const sizes: number[] = [];
  for (let size = fontSize; size > minFontSize; size -= SIZE_STEP) sizes.push(size);
  sizes.push(Math.min(fontSize, minFontSize));
  return sizes;
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
