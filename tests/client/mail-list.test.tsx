import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeEach, describe, expect, it } from 'vitest';
import type { MailMessage } from '@shared/schemas/mail';
import { setCsrfToken } from '@/lib/api-client';
import { MailList } from '@/features/mail/components/mail-list';
import { fakeFetch, renderWithProviders } from '../helpers/render';

const base: MailMessage = {
  id: 1,
  to: 'member@example.org',
  subject: 'Reset your Gripline password',
  text: 'Open this link: http://gripline.test/reset-password/••••••',
  links: ['http://gripline.test/reset-password/••••••'],
  state: 'sent',
  attempts: 0,
  lastError: null,
  nextAttemptAt: null,
  createdAt: '2026-12-01T12:00:00.000Z',
  sentAt: '2026-12-01T12:00:01.000Z',
};
const failed: MailMessage = { ...base, id: 2, to: 'qm@example.org', subject: 'Overdue tools', text: 'Hello', links: [], state: 'failed', attempts: 8, lastError: '421 mail server busy', sentAt: null };
const waiting: MailMessage = { ...failed, id: 3, state: 'waiting', attempts: 2, nextAttemptAt: '2026-12-01T12:04:00.000Z' };

beforeEach(() => setCsrfToken('tok'));

describe('MailList', () => {
  it('says the state of each message in words, with attempts and what the mail server said', () => {
    fakeFetch(() => undefined);
    renderWithProviders(<MailList messages={[base, failed, waiting]} canRetry empty="none" />);
    expect(screen.getByText('Sent')).toBeTruthy();
    expect(screen.getByText('Failed')).toBeTruthy();
    expect(screen.getByText('Waiting to send')).toBeTruthy();
    expect(screen.getByText('8 failed attempts; no more tries until retried')).toBeTruthy();
    expect(screen.getByText(/^2 failed attempts; next try/)).toBeTruthy();
    expect(screen.getAllByText('The mail server said: 421 mail server busy')).toHaveLength(2);
    // Only the failed one can be retried.
    expect(screen.getAllByRole('button', { name: /^Retry/ })).toHaveLength(1);
  });

  it('shows a masked reset link as words, never as a link to open', () => {
    fakeFetch(() => undefined);
    renderWithProviders(<MailList messages={[base]} empty="none" />);
    expect(screen.getByText('The reset link is hidden: only member@example.org may open it.')).toBeTruthy();
    expect(screen.queryByRole('link', { name: /reset link/ })).toBeNull();
  });

  it('offers no Retry without canRetry (My mail)', () => {
    fakeFetch(() => undefined);
    renderWithProviders(<MailList messages={[failed]} empty="none" />);
    expect(screen.queryByRole('button', { name: /^Retry/ })).toBeNull();
  });

  it('retries a failed message through the server', async () => {
    const calls = fakeFetch(({ method, path }) => {
      if (method === 'POST' && path === '/api/mail/2/retry') return { status: 200, body: { ...failed, state: 'waiting', attempts: 0 } };
      if (path === '/api/mail') return { status: 200, body: { data: [], catching: true } };
    });
    renderWithProviders(<MailList messages={[failed]} canRetry empty="none" />);
    await userEvent.click(screen.getByRole('button', { name: 'Retry the message to qm@example.org: Overdue tools' }));
    await waitFor(() => expect(calls.some((c) => c.method === 'POST' && c.path === '/api/mail/2/retry')).toBe(true));
  });

  it('says so when there is nothing', () => {
    fakeFetch(() => undefined);
    renderWithProviders(<MailList messages={[]} empty="Gripline has not written to you yet." />);
    expect(screen.getByText('Gripline has not written to you yet.')).toBeTruthy();
  });
});
