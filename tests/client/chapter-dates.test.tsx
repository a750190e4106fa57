import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { CatalogueTool } from '@shared/schemas/offline';
import type { ToolForYou } from '@shared/schemas/tools';
import { OfflineCheckoutForm } from '@/features/offline/components/offline-checkout-form';
import { CheckoutForm } from '@/features/tools/components/checkout-form';
import type { StoredCatalogue } from '@/features/offline/db';
import { chapterTimeZone, setChapterTimeZone } from '@/lib/chapter-zone';
import { dueStateOf } from '@/lib/due-state';
import { formatDate, formatDateTime, formatDay, formatDueDay } from '@/lib/format';
import { fakeFetch, renderWithProviders } from '../helpers/render';

// The test runs in UTC; the chapter is in Chicago (UTC−6 in December). Tuesday, December 1, 10:00 there.
const now = new Date('2026-12-01T16:00:00Z');

afterEach(() => {
  setChapterTimeZone('UTC');
  vi.useRealTimers();
});

describe('dates on screen, in the chapter’s time zone', () => {
  it('counts due days on the chapter’s calendar, not the viewer’s', () => {
    setChapterTimeZone('America/Chicago');
    // 05:30 UTC on the 2nd is still Tuesday 23:30 in Chicago: due today, not tomorrow.
    expect(dueStateOf('2026-12-02T05:30:00Z', now)).toEqual({ words: 'due today', overdue: false, soon: true });
    expect(dueStateOf('2026-12-03T05:59:59.999Z', now).words).toBe('due tomorrow');
    expect(dueStateOf('2026-12-09T05:59:59.999Z', now)).toEqual({ words: 'due in 7 days', overdue: false, soon: false });
  });

  it('says how late an overdue loan is in chapter days, by the rule the Overdue page and the reminders use', () => {
    setChapterTimeZone('America/Chicago');
    expect(dueStateOf('2026-11-29T05:59:59.999Z', now)).toEqual({ words: '3 days late', overdue: true, soon: false }); // due by the end of Saturday
    expect(dueStateOf('2026-12-01T15:00:00Z', now)).toEqual({ words: '1 day late', overdue: true, soon: false }); // an hour ago
  });

  it('writes days and moments in words in the chapter zone', () => {
    setChapterTimeZone('America/Chicago');
    expect(formatDueDay('2026-12-09T05:59:59.999Z', now)).toBe('Tuesday, December 8');
    expect(formatDate('2026-12-02T03:00:00Z')).toBe('Tue, Dec 1, 2026');
    expect(formatDateTime('2026-12-02T03:05:00Z')).toBe('Dec 1, 2026, 9:05 PM');
    expect(formatDay('2027-01-15')).toBe('Jan 15, 2027'); // a chapter day named by its date
    expect(formatDay('2026-12-02T03:00:00Z')).toBe('Dec 1, 2026');
    setChapterTimeZone('Pacific/Auckland');
    expect(formatDate('2026-12-02T03:00:00Z')).toBe('Wed, Dec 2, 2026');
  });

  it('keeps the zone on the device, and ignores a zone it does not know', () => {
    setChapterTimeZone('Europe/Oslo');
    expect(localStorage.getItem('gripline.chapterTimeZone')).toBe('Europe/Oslo');
    setChapterTimeZone('Mars/Olympus_Mons');
    expect(chapterTimeZone()).toBe('Europe/Oslo');
  });
});

describe('OfflineCheckoutForm', () => {
  it('shows the due day by the server’s rule: a week’s loan taken at 23:30 chapter time is due by the end of that day a week on', () => {
    setChapterTimeZone('America/Chicago');
    vi.useFakeTimers({ toFake: ['Date'] });
    vi.setSystemTime(new Date('2026-12-02T05:30:00Z')); // Tuesday 23:30 in Chicago, Wednesday in UTC
    const tool = { code: 'T-0007', name: 'Air drill', category: 'air_drill', loanDays: 7, accessories: [] } as unknown as CatalogueTool;
    renderWithProviders(<OfflineCheckoutForm copy={{} as StoredCatalogue} tool={tool} />);
    expect(screen.getByText('Tuesday, December 8')).toBeTruthy();
  });
});

describe('CheckoutForm', () => {
  const tool = (defaultDueAt: string) => ({ code: 'T-0007', category: 'air_drill', accessories: [], missingAccessories: [], forYou: { defaultDueAt } }) as unknown as ToolForYou;
  const csrf = { status: 200, body: { token: 'csrf-token' } };

  it('offers the due day of the chapter, not the UTC date of the due moment, and sends no date when it is kept', async () => {
    setChapterTimeZone('America/Chicago');
    const calls = fakeFetch((call) => (call.path === '/api/auth/csrf' ? csrf : call.path.endsWith('/checkout') ? { status: 201, body: { id: 1, code: 'T-0007', dueAt: '2026-12-09T05:59:59.999Z', accessories: [] } } : undefined));
    renderWithProviders(<CheckoutForm tool={tool('2026-12-09T05:59:59.999Z')} />); // the end of Tuesday, December 8 in Chicago
    expect(screen.getByLabelText<HTMLInputElement>('Bring it back by').value).toBe('2026-12-08');
    await userEvent.click(screen.getByRole('button', { name: 'Check out T-0007' }));
    expect(calls.find((c) => c.path.endsWith('/checkout'))?.body).toEqual({});
  });

  it('makes a chosen day due at the end of that chapter day', async () => {
    setChapterTimeZone('America/Chicago');
    const calls = fakeFetch((call) => (call.path === '/api/auth/csrf' ? csrf : call.path.endsWith('/checkout') ? { status: 201, body: { id: 1, code: 'T-0007', dueAt: '2026-12-11T05:59:59.999Z', accessories: [] } } : undefined));
    renderWithProviders(<CheckoutForm tool={tool('2026-12-09T05:59:59.999Z')} />);
    const field = screen.getByLabelText('Bring it back by');
    await userEvent.clear(field);
    await userEvent.type(field, '2026-12-10');
    await userEvent.click(screen.getByRole('button', { name: 'Check out T-0007' }));
    expect(calls.find((c) => c.path.endsWith('/checkout'))?.body).toEqual({ dueAt: '2026-12-11T05:59:59.999Z' });
  });
});
