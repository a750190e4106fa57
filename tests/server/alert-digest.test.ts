import { eq } from 'drizzle-orm';
import { describe, expect } from 'vitest';
import { jobRuns } from '../../server/db/schema/crib-jobs';
import { outboxMail } from '../../server/db/schema/mail';
import { users } from '../../server/db/schema/users';
import { ALERT_DIGEST_JOB, runAlertDigest } from '../../server/features/planning/alert-digest';
import { addBinAs, blindRivetBin, post } from '../helpers/crib';
import { addAssembly, hundredRivetLine, screwBin } from '../helpers/planning-fixture';
import { crewTest } from '../helpers/crew-test';

const test = crewTest
  .extend('runs', ({ t }) => () => t.db.select().from(jobRuns).where(eq(jobRuns.job, ALERT_DIGEST_JOB)).all())
  /** Messages written, sent or not. */
  .extend('mailCount', ({ t }) => () => t.db.select().from(outboxMail).all().length)
  /** A rivet bin (Cedar Valley) and a screw bin (Harbour Hardware), both short this week. */
  .extend('twoShortBins', ({ qm, member }) => async () => {
    const rivets = await addBinAs(qm, blindRivetBin({ initialQuantity: 100, leadTimeDays: 14 }));
    const screws = await addBinAs(qm, screwBin({ supplierPart: 'PS832-8' }));
    await addAssembly(member, {
      name: 'Tool chest',
      plannedStart: '2026-12-01',
      plannedFinish: '2026-12-06',
      lines: [hundredRivetLine],
      extraItems: [{ binCode: screws.code, quantity: 250 }],
    });
    return { rivets, screws };
  });

test.beforeEach(({ clock }) => {
  clock.now = new Date('2026-12-01T07:00:00Z');
});

describe('the daily alert digest', () => {
  test('refreshes the alerts and mails each active quartermaster the list by supplier', async ({ t, ctx, runs, twoShortBins }) => {
    const { rivets, screws } = await twoShortBins();
    const other = await t.addUser({ email: 'qm2@example.org', name: 'Rowan Restock', role: 'quartermaster' });
    const gone = await t.addUser({ email: 'qm-old@example.org', name: 'Old Quartermaster', role: 'quartermaster' });
    t.db.update(users).set({ deactivatedAt: new Date('2026-11-01T00:00:00Z') }).where(eq(users.id, gone.id)).run();

    const result = runAlertDigest(ctx);
    expect(result).toMatchObject({ raised: 2, digestsSent: 2, error: null });
    expect(result.summary).toBe('2 alerts raised, 2 bins to order, digest to 2 quartermasters');

    for (const address of ['qm@example.org', other.email]) {
      const mail = await t.lastMailTo(address);
      expect(mail?.subject).toBe('Reorder: 2 bins need ordering');
      expect(mail?.links).toContain('http://gripline.test/alerts');
    }
    const text = (await t.lastMailTo('qm@example.org'))!.text;
    expect(text).toContain('Hello Quinn Quartermaster,');
    // Suppliers by name, each with its bins and the suggested order in whole packs.
    expect(text.indexOf('Cedar Valley Fastener Supply:')).toBeLessThan(text.indexOf('Harbour Hardware Co.:'));
    expect(text).toContain(`- ${rivets.code} `);
    // The one reorder rule: rivets up to 200 (the bin's own point) + 459 (EOQ 458.3 over the typed 450) = 659, less 100 → 6 packs;
    // screws up to 250 + 817 = 1,067, less 200 → 18 packs of 50. The same quantities as Restock and the purchase list.
    expect(text).toContain('100 each on hand; order 600 each (6 packs of 100, about $72.00)');
    expect(text).toContain(`- ${screws.code} Screw #8-32 × 1/2 pan head, stainless, part PS832-8: 200 each on hand; order 900 each (18 packs of 50, about $81.00)`);
    expect(await t.lastMailTo('qm-old@example.org')).toBeUndefined();
    expect(await t.lastMailTo('lead@example.org')).toBeUndefined();
    expect(await t.lastMailTo('member@example.org')).toBeUndefined();

    const [run] = runs();
    expect(run).toMatchObject({ startedAt: new Date('2026-12-01T07:00:00Z'), finishedAt: new Date('2026-12-01T07:00:00Z'), summary: result.summary, error: null });
  });

  test('lists orders on their way too, and sends nothing once no alert is still to order', async ({ t, qm, ctx, runs, mailCount, twoShortBins }) => {
    const { rivets, screws } = await twoShortBins();
    runAlertDigest(ctx);
    const alerts = (await qm.agent.get('/api/alerts')).body.data as { id: number; bin: { code: string } }[];
    const idOf = (code: string) => alerts.find((a) => a.bin.code === code)!.id;
    await post(qm, `/api/alerts/${idOf(rivets.code)}/ordered`, { quantity: 500, expectedAt: '2026-12-09' });

    t.clock.now = new Date('2026-12-02T07:00:00Z');
    const second = runAlertDigest(ctx);
    expect(second).toMatchObject({ raised: 0, digestsSent: 1 });
    const text = (await t.lastMailTo('qm@example.org'))!.text;
    expect((await t.lastMailTo('qm@example.org'))!.subject).toBe('Reorder: 1 bin needs ordering');
    expect(text).toContain(`- ${rivets.code} `);
    expect(text).toContain('ordered 500 each on Tuesday, December 1, 500 each still to come, expected Wednesday, December 9');

    await post(qm, `/api/alerts/${idOf(screws.code)}/dismiss`, { reason: 'Borrowing from the chapter next door' });
    const before = mailCount();
    t.clock.now = new Date('2026-12-03T07:00:00Z');
    const third = runAlertDigest(ctx);
    expect(third).toMatchObject({ raised: 0, digestsSent: 0, summary: '0 alerts raised, nothing to order, no digest' });
    expect(mailCount()).toBe(before);
    expect(runs()).toHaveLength(3);
  });

  test('records a run with nothing to do', async ({ qm, ctx, runs, mailCount }) => {
    await addBinAs(qm, blindRivetBin());
    const result = runAlertDigest(ctx);
    expect(result).toMatchObject({ raised: 0, digestsSent: 0, error: null });
    expect(mailCount()).toBe(0);
    expect(runs()).toEqual([expect.objectContaining({ summary: '0 alerts raised, nothing to order, no digest', error: null })]);
  });
});
