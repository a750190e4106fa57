import { createRequire } from 'node:module';
import type { BrowserContext } from 'playwright-core';

/**
 * Gives the pages of `context` a `BarcodeDetector` that reads QR codes with jsQR, for Chromium
 * builds without the browser's own (Linux has none): it drives the scanner's native path. Each
 * call of detect() is counted in `window.__barcodeDetections`.
 */
export async function addBarcodeDetectorShim(context: BrowserContext): Promise<void> {
  await context.addInitScript({ path: createRequire(import.meta.url).resolve('jsqr') });
  await context.addInitScript(() => {
    type JsQr = (data: Uint8ClampedArray, width: number, height: number, options: object) => { data: string } | null;
    const page = window as unknown as { jsQR: JsQr; BarcodeDetector: unknown; __barcodeDetections: number };
    page.__barcodeDetections = 0;
    class ShimBarcodeDetector {
      static getSupportedFormats() {
        return Promise.resolve(['qr_code']);
      }
      private readonly canvas = document.createElement('canvas');
      detect(source: HTMLVideoElement) {
        page.__barcodeDetections += 1;
        const { videoWidth: width, videoHeight: height } = source;
        const context = this.canvas.getContext('2d', { willReadFrequently: true });
        if (!width || !context) return Promise.resolve([]);
        Object.assign(this.canvas, { width, height });
        context.drawImage(source, 0, 0);
        const code = page.jsQR(context.getImageData(0, 0, width, height).data, width, height, { inversionAttempts: 'dontInvert' });
        return Promise.resolve(code ? [{ rawValue: code.data, format: 'qr_code' }] : []);
      }
    }
    page.BarcodeDetector = ShimBarcodeDetector;
  });
}
