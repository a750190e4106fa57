import { inflateSync } from 'node:zlib';

/** The content of every stream in a PDF, inflated when it is compressed (pdfkit writes one per page). */
export function pdfStreams(pdf: Buffer): string[] {
  const text = pdf.toString('latin1');
  const streams: string[] = [];
  const re = /stream\r?\n/g;
  let match: RegExpExecArray | null;
  while ((match = re.exec(text))) {
    const start = match.index + match[0].length;
    const end = text.indexOf('endstream', start);
    if (end < 0) break;
    const raw = pdf.subarray(start, end);
    try {
      streams.push(inflateSync(raw).toString('latin1'));
    } catch {
      streams.push(raw.toString('latin1'));
    }
    re.lastIndex = end + 'endstream'.length;
  }
  return streams;
}

export function pdfPageCount(pdf: Buffer): number {
  return pdf.toString('latin1').match(/\/Type\s*\/Page(?![a-z])/g)?.length ?? 0;
}

/** WinAnsi bytes 0x80–0x9F that differ from Latin-1 (PDF 1.7, ISO 32000-1, Annex D). */
const WIN_ANSI_HIGH: Record<number, string> = {
  0x80: '€', 0x85: '…', 0x91: '‘', 0x92: '’', 0x93: '“', 0x94: '”', 0x95: '•', 0x96: '–', 0x97: '—', 0x99: '™',
};
const winAnsi = (bytes: Buffer) => [...bytes].map((b) => WIN_ANSI_HIGH[b] ?? String.fromCharCode(b)).join('');

/** Text shown with TJ operators, one string per operator, for pages written with the built-in fonts. */
export function shownText(content: string): string[] {
  return [...content.matchAll(/\[((?:<[0-9a-fA-F]*>|[-\d.\s])*)\]\s*TJ/g)].map(([, parts]) =>
    [...parts!.matchAll(/<([0-9a-fA-F]*)>/g)].map(([, hex]) => winAnsi(Buffer.from(hex!, 'hex'))).join(''),
  );
}

/** Every `re` rectangle of a page's content, in the page's top-left coordinates (pdfkit flips the y axis once). */
export function pdfRects(content: string): { x: number; y: number; width: number; height: number }[] {
  return [...content.matchAll(/(-?[\d.]+) (-?[\d.]+) (-?[\d.]+) (-?[\d.]+) re/g)].map(([, x, y, w, h]) => ({
    x: Number(x),
    y: Number(y),
    width: Number(w),
    height: Number(h),
  }));
}
