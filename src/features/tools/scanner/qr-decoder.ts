import { nativeQrDecoder } from './native-qr-decoder';

/** Which decoder read the labels: the browser's own, or the bundled library where there is none. */
export type ScanPath = 'native' | 'zxing';

/** Reads a QR code from the video's current frame, if there is one in it. */
export interface QrDecoder {
  readonly path: ScanPath;
  read(video: HTMLVideoElement): Promise<string | undefined>;
}

/**
 * The browser's own detector where it reads QR codes (it needs no download); the decoder library,
 * which is large, is fetched only where it does not.
 */
export async function loadQrDecoder(): Promise<QrDecoder> {
  const native = await nativeQrDecoder();
  if (native) return native;
  const { zxingQrDecoder } = await import('./zxing-qr-decoder');
  return zxingQrDecoder();
}
