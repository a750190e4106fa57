import { vi } from 'vitest';

/**
 * Answers every fetch with a small PDF and keeps the request bodies; the browser's download (object
 * URL and link click) is stubbed. Returns the bodies sent, in order.
 */
export function stubPdfDownload(): unknown[] {
  const bodies: unknown[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn((_path: string, init: RequestInit) => {
      bodies.push(JSON.parse(init.body as string));
      return Promise.resolve(new Response(new Blob(['%PDF-1.3 fake']), { status: 200, headers: { 'Content-Type': 'application/pdf' } }));
    }),
  );
  vi.spyOn(URL, 'createObjectURL').mockReturnValue('blob:labels');
  vi.spyOn(URL, 'revokeObjectURL').mockImplementation(() => undefined);
  vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(() => undefined);
  return bodies;
}
