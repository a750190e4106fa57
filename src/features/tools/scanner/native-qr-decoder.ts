import type { QrDecoder } from './qr-decoder';

/** The Barcode Detection API, which TypeScript's DOM types do not describe yet. */
interface BarcodeDetectorClass {
  new (options: { formats: string[] }): { detect(source: HTMLVideoElement): Promise<{ rawValue: string }[]> };
  getSupportedFormats(): Promise<string[]>;
}

/** The browser's own QR reader, or undefined where the browser has none or it cannot read QR codes. */
export async function nativeQrDecoder(): Promise<QrDecoder | undefined> {
  const Detector = (window as { BarcodeDetector?: BarcodeDetectorClass }).BarcodeDetector;
  if (!Detector) return undefined;
  try {
    if (!(await Detector.getSupportedFormats()).includes('qr_code')) return undefined;
    const detector = new Detector({ formats: ['qr_code'] });
    return { path: 'native', read: async (video) => (await detector.detect(video))[0]?.rawValue };
  } catch {
    return undefined;
  }
}
