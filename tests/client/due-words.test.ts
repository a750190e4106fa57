import { describe, expect, it } from 'vitest';
import { dueState } from '@/features/tools/due-words';

const now = new Date(2026, 11, 1, 10, 0);

describe('dueState', () => {
  it('says how many days are left', () => {
    expect(dueState(new Date(2026, 11, 8, 10, 0), now)).toEqual({ words: 'due in 7 days', overdue: false, soon: false });
    expect(dueState(new Date(2026, 11, 3, 9, 0), now)).toEqual({ words: 'due in 2 days', overdue: false, soon: true });
    expect(dueState(new Date(2026, 11, 2, 9, 0), now).words).toBe('due tomorrow');
    expect(dueState(new Date(2026, 11, 1, 18, 0), now).words).toBe('due today');
  });

  it('says how late an overdue loan is, in words', () => {
    // Whole days elapsed, at least 1: the count the lead's Overdue page and the reminder e-mails use.
    expect(dueState(new Date(2026, 10, 28, 18, 0), now)).toEqual({ words: '2 days late', overdue: true, soon: false });
    expect(dueState(new Date(2026, 10, 28, 10, 0), now).words).toBe('3 days late');
    expect(dueState(new Date(2026, 10, 30, 18, 0), now).words).toBe('1 day late');
    expect(dueState(new Date(2026, 11, 1, 8, 0), now)).toEqual({ words: '1 day late', overdue: true, soon: false });
  });
});
