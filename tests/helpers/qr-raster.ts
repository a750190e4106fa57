import jsQR from 'jsqr';
import { PNG } from 'pngjs';

type Rect = { x: number; y: number; width: number; height: number };

/** Paints black rectangles on white at `scale` pixels per unit and encodes the picture as a PNG file. */
export function rectsToPng(width: number, height: number, rects: readonly Rect[], scale: number): Buffer {
  const png = new PNG({ width: Math.ceil(width * scale), height: Math.ceil(height * scale) });
  png.data.fill(255);
  for (const r of rects) {
    for (let py = Math.round(r.y * scale); py < Math.round((r.y + r.height) * scale); py++) {
      for (let px = Math.round(r.x * scale); px < Math.round((r.x + r.width) * scale); px++) {
        if (px < 0 || py < 0 || px >= png.width || py >= png.height) continue;
        const i = (py * png.width + px) * 4;
        png.data[i] = png.data[i + 1] = png.data[i + 2] = 0;
      }
    }
  }
  return PNG.sync.write(png);
}

/** Reads a PNG file back and decodes the QR code in it, as a phone's scanner would; null when none reads. */
export function decodeQrPng(file: Buffer): string | null {
  const png = PNG.sync.read(file);
  return jsQR(new Uint8ClampedArray(png.data), png.width, png.height)?.data ?? null;
}

/**
 * Decodes a QR code drawn in a terminal with half blocks (black ink on white, two modules per
 * character cell), as the `qrcode` package's small terminal output draws it; null when none reads.
 */
export function decodeTerminalQr(text: string): string | null {
  const rects: Rect[] = [];
  let width = 0;
  text.split('\n').forEach((line, row) => {
    let ink = false;
    let col = 0;
    for (const part of line.split(/(\x1b\[\d+m)/)) {
      const code = /^\x1b\[(\d+)m$/.exec(part)?.[1];
      if (code !== undefined) {
        if (code === '30') ink = true;
        else if (code === '0' || code === '37') ink = false;
        continue;
      }
      for (const ch of part) {
        if (ink && (ch === '█' || ch === '▀')) rects.push({ x: col + 4, y: 2 * row + 4, width: 1, height: 1 });
        if (ink && (ch === '█' || ch === '▄')) rects.push({ x: col + 4, y: 2 * row + 5, width: 1, height: 1 });
        col++;
      }
      width = Math.max(width, col);
    }
  });
  const height = 2 * text.split('\n').length;
  return decodeQrPng(rectsToPng(width + 8, height + 8, rects, 6));
}
