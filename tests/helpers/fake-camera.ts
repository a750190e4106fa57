import { writeFileSync } from 'node:fs';
import QRCode from 'qrcode';

/**
 * Writes a Y4M video (a one-line header, then per frame `FRAME\n` and the Y, U and V planes of a
 * 4:2:0 picture) showing a QR code of `text`, for Chromium's fake camera
 * (--use-file-for-fake-video-capture). No video encoder needed.
 */
export function writeQrVideo(path: string, text: string, { width = 640, height = 480, frames = 10, module = 8 } = {}): void {
  const qr = QRCode.create(text, { errorCorrectionLevel: 'M' });
  const size = qr.modules.size;
  const quiet = 4;
  const side = (size + 2 * quiet) * module;
  const left = Math.floor((width - side) / 2);
  const top = Math.floor((height - side) / 2);
  const y = Buffer.alloc(width * height, 235);
  for (let row = 0; row < size; row++) {
    for (let col = 0; col < size; col++) {
      if (!qr.modules.get(row, col)) continue;
      const x0 = left + (col + quiet) * module;
      const y0 = top + (row + quiet) * module;
      for (let dy = 0; dy < module; dy++) y.fill(16, (y0 + dy) * width + x0, (y0 + dy) * width + x0 + module);
    }
  }
  writeGreyVideo(path, y, { width, height, frames });
}

/** A Y4M video of a plain light picture with no code in it: a camera pointed at nothing. */
export function writeBlankVideo(path: string, { width = 640, height = 480, frames = 10 } = {}): void {
  writeGreyVideo(path, Buffer.alloc(width * height, 235), { width, height, frames });
}

/** `frames` copies of the brightness plane `y`, with no colour. */
function writeGreyVideo(path: string, y: Buffer, { width, height, frames }: { width: number; height: number; frames: number }): void {
  const chroma = Buffer.alloc((width / 2) * (height / 2), 128);
  const frame = Buffer.concat([Buffer.from('FRAME\n'), y, chroma, chroma]);
  const header = Buffer.from(`YUV4MPEG2 W${width} H${height} F10:1 Ip A1:1 C420jpeg\n`);
  writeFileSync(path, Buffer.concat([header, ...Array.from({ length: frames }, () => frame)]));
}
