import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import type { OverdueLoan, ServiceDueItem } from '@shared/schemas/overdue';
import { LastRunNote } from '@/features/overdue/components/last-run-note';
import { OverdueTable } from '@/features/overdue/components/overdue-table';
import { ServiceDueTable } from '@/features/service/components/service-due-table';
import { fakeFetch, renderWithProviders } from '../helpers/render';

const loan = (loanId: number, code: string, daysLate: number, extra: Partial<OverdueLoan> = {}): OverdueLoan => ({
  loanId,
  tool: { code, name: `Tool ${code}`, location: 'Cabinet B', replacementValueCents: 25_000 },
  holder: { id: loanId, name: `Holder ${loanId}`, email: `holder${loanId}@example.org`, phone: loanId === 1 ? '555-0100' : null },
  dueAt: '2026-11-20T12:00:00.000Z',
  daysLate,
  lastReminderAt: null,
  remindedToday: false,
  ...extra,
});

const rows = () => screen.getAllByRole('row').slice(1);
const csrf = { status: 200, body: { token: 'csrf-token' } };

describe('OverdueTable', () => {
  it('lists the latest back first, says how late in words, and links to the holder’s e-mail and phone', () => {
    renderWithProviders(<OverdueTable loans={[loan(1, 'T-0001', 2), loan(2, 'T-0002', 9)]} />);
    expect(rows().map((r) => within(r).getAllByRole('cell')[0]!.textContent)).toEqual(['T-0002 Tool T-0002Lives at Cabinet B', 'T-0001 Tool T-0001Lives at Cabinet B']);
    expect(screen.getByText('9 days late')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'holder1@example.org' }).getAttribute('href')).toBe('mailto:holder1@example.org');
    expect(screen.getByRole('link', { name: '555-0100' }).getAttribute('href')).toBe('tel:5550100');
    expect(screen.getByText('2 tools are overdue, worth $500.00 to replace.')).toBeTruthy();
  });

  it('sends a reminder, and keeps the button disabled with the reason once one went out today', async () => {
    const calls = fakeFetch((call) => (call.path === '/api/auth/csrf' ? csrf : call.path === '/api/overdue/1/remind' ? { status: 201, body: { loanId: 1, sentTo: 'holder1@example.org', sentAt: '', day: '' } } : undefined));
    renderWithProviders(<OverdueTable loans={[loan(1, 'T-0001', 2), loan(2, 'T-0002', 9, { remindedToday: true, lastReminderAt: '2026-12-01T07:00:00.000Z' })]} />);
    const [late, early] = rows();
    const sent = within(late!).getByRole('button', { name: 'Send reminder' });
    expect((sent as HTMLButtonElement).disabled).toBe(true);
    expect(within(late!).getByText('Already reminded today; the next one can go tomorrow.')).toBeTruthy();
    await userEvent.click(within(early!).getByRole('button', { name: 'Send reminder' }));
    await waitFor(() => expect(calls.some((c) => c.method === 'POST' && c.path === '/api/overdue/1/remind')).toBe(true));
  });

  it('says when nothing is overdue', () => {
    renderWithProviders(<OverdueTable loans={[]} />);
    expect(screen.getByText('Nothing is overdue. Every tool on loan is within its time.')).toBeTruthy();
  });
});

describe('LastRunNote', () => {
  it('says when the reminders last went out automatically and what they did', () => {
    renderWithProviders(<LastRunNote run={{ startedAt: '2026-12-01T07:00:00.000Z', finishedAt: '2026-12-01T07:00:02.000Z', summary: '3 reminders, digest to 1 lead', error: null }} />);
    expect(screen.getByText(/^Reminders last sent automatically on /)).toBeTruthy();
    expect(screen.getByText(/3 reminders, digest to 1 lead/)).toBeTruthy();
  });
});

const item = (code: string, status: ServiceDueItem['status'], urgency: ServiceDueItem['urgency'], words: string): ServiceDueItem => ({
  code,
  name: `Torque wrench ${code}`,
  category: 'torque_wrench',
  location: '',
  status,
  outOfServiceReason: status === 'out_of_service' ? 'Sent for calibration' : null,
  serviceKind: 'calibration',
  serviceIntervalDays: 365,
  lastServiceAt: '2025-11-20T12:00:00.000Z',
  serviceDueAt: '2026-11-20T12:00:00.000Z',
  daysUntilDue: -11,
  urgency,
  missingAccessories: [],
  words,
});

describe('ServiceDueTable', () => {
  it('asks for a note, then brings the tool back in service as serviced', async () => {
    const calls = fakeFetch((call) => (call.path === '/api/auth/csrf' ? csrf : call.path.endsWith('/back-in-service') ? { status: 200, body: { status: 'available' } } : undefined));
    renderWithProviders(<ServiceDueTable withinDays={14} items={[item('T-0007', 'out_of_service', 'overdue', 'Out of service: Sent for calibration; Calibration overdue by 11 days')]} />);
    expect(screen.getByText('Out of service: Sent for calibration; Calibration overdue by 11 days')).toBeTruthy();
    await userEvent.click(screen.getByRole('button', { name: 'Back in service (serviced)' }));
    await userEvent.click(screen.getByRole('button', { name: 'Back in service (serviced)' }));
    expect(await screen.findByText('Give the reason.')).toBeTruthy();
    await userEvent.type(screen.getByLabelText('What was done'), 'Calibrated, certificate filed');
    await userEvent.click(screen.getByRole('button', { name: 'Back in service (serviced)' }));
    await waitFor(() => expect(calls.find((c) => c.path === '/api/tools/T-0007/back-in-service')?.body).toEqual({ note: 'Calibrated, certificate filed', serviced: true }));
  });

  it('tells the quartermaster a tool on loan must come back first', () => {
    renderWithProviders(<ServiceDueTable withinDays={14} items={[item('T-0008', 'on_loan', 'overdue', 'Calibration overdue by 11 days')]} />);
    expect(screen.getByText('On loan: ask for it back before servicing.')).toBeTruthy();
  });
});
