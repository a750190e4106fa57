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
