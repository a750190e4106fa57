import { describe, expect } from 'vitest';
import { atChapterHour } from '../../server/jobs/chapter-hour';
import { writeChapterTimeZone } from '../../server/settings/chapter-time-zone';
import { crewTest } from '../helpers/crew-test';

describe('atChapterHour', () => {
  crewTest('runs a daily job in the hour it is due on the chapter’s clock, whatever the server’s zone, and follows a new zone at once', async ({ t, ctx }) => {
    const runs: string[] = [];
    const tick = atChapterHour(ctx, 7, () => {
      runs.push(t.clock.now.toISOString());
      return Promise.resolve('ran');
    });
    writeChapterTimeZone(t.db, 'America/Denver'); // UTC−7 in December
    t.clock.now = new Date('2026-12-01T07:00:00Z'); // 00:00 in Denver
    expect(await tick()).toBeUndefined();
    t.clock.now = new Date('2026-12-01T14:00:00Z'); // 07:00 in Denver
    expect(await tick()).toBe('ran');
    writeChapterTimeZone(t.db, 'Europe/Berlin'); // UTC+1
    t.clock.now = new Date('2026-12-02T06:00:00Z'); // 07:00 in Berlin
    expect(await tick()).toBe('ran');
    expect(runs).toEqual(['2026-12-01T14:00:00.000Z', '2026-12-02T06:00:00.000Z']);
  });
});
