import type { Page } from 'playwright-core';

export interface FirstDecode {
  path: 'native' | 'zxing';
  ms: number;
}

/** The scanner's report of its first code read (it logs it, since the page moves on at once). */
export function firstDecode(page: Page): Promise<FirstDecode> {
  return new Promise((resolve) => {
    page.on('console', (message) => {
      const match = /first code after (\d+) ms \(path (native|zxing)\)/.exec(message.text());
      if (match) resolve({ ms: Number(match[1]), path: match[2] as FirstDecode['path'] });
    });
  });
}

/** Whether this browser has its own QR reader, so the scanner should take the native path. */
export function hasNativeQrReader(page: Page): Promise<boolean> {
  return page.evaluate(async () => {
    const detector = (window as { BarcodeDetector?: { getSupportedFormats(): Promise<string[]> } }).BarcodeDetector;
    return detector ? (await detector.getSupportedFormats()).includes('qr_code') : false;
  });
}
