import type { Box } from './sheet-geometry';

/**
 * What goes where inside one label, in points: the QR square on the left (its quiet zone is part of
 * the square), the code in large monospace type to its right, the name in smaller type below it.
 * Proportions scale with the label, so the same template serves every layout.
 */
export interface LabelTemplate {
  qr: Box;
  code: { x: number; y: number; width: number; fontSize: number };
  /** `height` is the room below the code; the type may shrink to `minFontSize` to keep a measurement whole. */
  title: { x: number; y: number; width: number; height: number; fontSize: number; minFontSize: number; maxLines: number };
}

/** Courier's advance width is 600/1000 em for every glyph (Adobe Core 14 font metrics, Courier AFM). */
const MONO_ADVANCE_EM = 0.6;
export const TITLE_LINE_HEIGHT = 1.2;
/** The smallest title type, in points: still readable on a bin at arm's length. */
const MIN_TITLE_SIZE = 6;

export function arrangeLabel(box: Box, codeLength: number): LabelTemplate {
  const padding = box.height * 0.06;
  const qrSize = Math.min(box.height - 2 * padding, box.width * 0.5);
  const qr = { x: box.x + padding, y: box.y + (box.height - qrSize) / 2, width: qrSize, height: qrSize };
  const textX = qr.x + qrSize;
  const textWidth = box.x + box.width - padding - textX;
  const codeSize = Math.min(box.height * 0.3, textWidth / (Math.max(codeLength, 1) * MONO_ADVANCE_EM));
  const titleSize = Math.min(11, Math.max(MIN_TITLE_SIZE, box.height * 0.12));
  // The code's top lines up with the QR's finder pattern rather than the label's edge.
  const codeY = qr.y + qrSize * 0.08;
  const titleY = codeY + codeSize + padding / 2;
  const titleRoom = box.y + box.height - padding - titleY;
  const maxLines = Math.max(1, Math.min(4, Math.floor(titleRoom / (titleSize * TITLE_LINE_HEIGHT))));
  return {
    qr,
    code: { x: textX, y: codeY, width: textWidth, fontSize: codeSize },
    title: { x: textX, y: titleY, width: textWidth, height: titleRoom, fontSize: titleSize, minFontSize: MIN_TITLE_SIZE, maxLines },
  };
}
