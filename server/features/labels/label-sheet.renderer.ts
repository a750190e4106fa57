import PDFDocument from 'pdfkit';
import { slicePauser } from '../../lib/event-loop';
import { arrangeLabel, TITLE_LINE_HEIGHT } from '../../../labels/label-template';
import type { SheetLayout } from '../../../labels/layouts';
import { pageSizeInPoints, placeLabels, type Box } from '../../../labels/sheet-geometry';
import { fitLabelText, toWinAnsi } from './fit-text';
import { darkRuns, qrMatrix } from './qr-matrix';

/**
 * One label: the code the QR carries and prints large, a title (a tool's or a bin's name) and, for
 * some bins, a short caution printed whole below it. A badge's QR holds its secret token instead,
 * which is never printed as text (`qr`).
 */
export interface LabelItem {
  code: string;
  qr?: string;
  title: string;
  caution?: string;
}

export interface RenderOptions {
  /** Positions already used on the first page. */
  skip?: number;
  /** Off in tests, so the page content can be read as text. */
  compress?: boolean;
  createdAt?: Date;
}

const CODE_FONT = 'Courier-Bold';
const TITLE_FONT = 'Helvetica';

/**
 * A PDF with one label per item, laid out on the layout's pages; resolves with the file's bytes.
 * Drawing a few hundred labels takes a while, so it yields to the event loop between slices of
 * labels: other requests are answered meanwhile.
 */
export async function renderLabelSheet(layout: SheetLayout, items: readonly LabelItem[], options: RenderOptions = {}): Promise<Buffer> {
  const page = pageSizeInPoints(layout);
  const doc = new PDFDocument({
    size: [page.width, page.height],
    margin: 0,
    autoFirstPage: false,
    compress: options.compress ?? true,
    info: { Title: `Gripline labels (${layout.name})`, Creator: 'Gripline', CreationDate: options.createdAt ?? new Date() },
  });
  const chunks: Buffer[] = [];
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('data', (chunk: Buffer) => chunks.push(chunk));
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });
  // Awaited below, after the slices; a failure while drawing must not count as unhandled meanwhile.
  done.catch(() => undefined);

  const pause = slicePauser();
  let currentPage = -1;
  for (const [i, { page: pageIndex, box }] of placeLabels(layout, items.length, options.skip ?? 0).entries()) {
    while (currentPage < pageIndex) {
      doc.addPage({ size: [page.width, page.height], margin: 0 });
      currentPage++;
    }
    drawLabel(doc, box, items[i]!);
    await pause();
  }
  doc.end();
  return done;
}

function drawLabel(doc: PDFKit.PDFDocument, box: Box, item: LabelItem): void {
  const t = arrangeLabel(box, item.code.length);
  drawQr(doc, t.qr, item.qr ?? item.code);

  doc.fillColor('black').font(CODE_FONT).fontSize(t.code.fontSize);
  doc.text(item.code, t.code.x, t.code.y, { lineBreak: false });

  doc.font(TITLE_FONT);
  const caution = item.caution === undefined ? undefined : toWinAnsi(item.caution);
  const room = { ...t.title, lineHeight: TITLE_LINE_HEIGHT };
  const { fontSize, lines } = fitLabelText(toWinAnsi(item.title), caution, room, (s, size) => doc.fontSize(size).widthOfString(s));
  doc.fontSize(fontSize);
  lines.forEach((line, i) => {
    doc.text(line, t.title.x, t.title.y + i * fontSize * TITLE_LINE_HEIGHT, { lineBreak: false });
  });
}

/** Vector modules (no bitmap to blur when printed), quiet zone included in the square. */
function drawQr(doc: PDFKit.PDFDocument, square: Box, code: string): void {
  const matrix = qrMatrix(code);
  const module = square.width / matrix.size;
  for (const run of darkRuns(matrix)) {
    doc.rect(square.x + run.column * module, square.y + run.row * module, run.length * module, module);
  }
  doc.fill('black');
}
