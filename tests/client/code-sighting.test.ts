import { describe, expect, it } from 'vitest';
import { CODE_GONE_MS, codeSighting } from '@/features/tools/scanner/use-qr-camera';

/** Feeds frames (what each one read, at its time in ms) and keeps the codes reported as new. */
function reported(frames: [string | undefined, number][]) {
  const sighting = codeSighting();
  return frames.filter(([text, at]) => sighting.isNew(text, at)).map(([text, at]) => `${text}@${at}`);
}

describe('the camera reports a code once while it stays in sight', () => {
  it('reports a label held in front of the lens once, however many frames read it', () => {
    expect(reported([['T-0042', 0], ['T-0042', 100], ['T-0042', 200], ['T-0042', 5_000]])).toEqual(['T-0042@0']);
  });

  it('does not report it again after a few frames that read nothing (a shaky hand)', () => {
    expect(reported([['T-0042', 0], [undefined, 300], [undefined, 600], ['T-0042', 900]])).toEqual(['T-0042@0']);
  });

  it(`reports it again once it has been out of sight for ${CODE_GONE_MS} ms (a badge refused, then shown again)`, () => {
    expect(reported([['B4dg3', 0], [undefined, 400], [undefined, 1_000], ['B4dg3', 1_100]])).toEqual(['B4dg3@0', 'B4dg3@1100']);
  });

  it('reports a different code at once', () => {
    expect(reported([['T-0042', 0], ['B-0107', 50], ['T-0042', 100]])).toEqual(['T-0042@0', 'B-0107@50', 'T-0042@100']);
  });
});
