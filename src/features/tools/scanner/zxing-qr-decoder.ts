import { BrowserQRCodeReader } from '@zxing/browser';
import type { QrDecoder } from './qr-decoder';

/** Frames are scaled down to this many pixels on the long side: a label held up to the camera stays readable, decoding stays quick. */
const MAX_SIDE = 800;

/** The bundled decoder for browsers without their own: each frame is drawn on one canvas and decoded there. */
export function zxingQrDecoder(): QrDecoder {
  const reader = new BrowserQRCodeReader();
  const canvas = document.createElement('canvas');
  // Created first, so the library's own getContext('2d') gets this context, made for frequent reads.
  const context = canvas.getContext('2d', { willReadFrequently: true });
  return {
    path: 'zxing',
    read(video) {
      if (!context || !video.videoWidth) return Promise.resolve(undefined);
      const scale = Math.min(1, MAX_SIDE / Math.max(video.videoWidth, video.videoHeight));
      const width = Math.round(video.videoWidth * scale);
      const height = Math.round(video.videoHeight * scale);
      if (canvas.width !== width || canvas.height !== height) Object.assign(canvas, { width, height });
      context.drawImage(video, 0, 0, width, height);
      try {
        return Promise.resolve(reader.decodeFromCanvas(canvas).getText());
      } catch {
        // The library throws when a frame holds no readable code: the usual case between labels.
        return Promise.resolve(undefined);
      }
    },
  };
}
