import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { ServiceContext } from '../../server/context';
import { atChapterHour } from '../../server/jobs/chapter-hour';
import { writeChapterTimeZone } from '../../server/settings/chapter-time-zone';
import { buildTestApp, type TestApp } from '../helpers/test-app';

let t: TestApp;
let ctx: ServiceContext;
beforeEach(async () => {
  t = await buildTestApp();
  ctx = { db: t.db, publicUrl: 'http://gripline.test', now: () => t.clock.now };
});
afterEach(() => t.close());

describe('atChapterHour', () => {
  it('runs a daily job in the hour it is due on the chapter’s clock, whatever the server’s zone, and follows a new zone at once', async () => {
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
