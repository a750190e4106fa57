import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { Suspense } from 'react';
import { beforeEach, describe, expect, it } from 'vitest';
import type { Role } from '@shared/roles';
import type { ActualWaste, PlanningSettingsDto } from '@shared/schemas/forecast';
import type { PaymentSettingsView, UpdatePaymentSettingsBody } from '@shared/schemas/payments';
import { SettingsRoute } from '@/app/routes/app/settings';
import { setCsrfToken } from '@/lib/api-client';
import { fakeFetch, renderWithProviders, type FakeCall } from '../helpers/render';

// The defaults: 5 % waste (common practice), 10D maximum pitch, 95 % service level, $15 an order, 25 % a year.
const SETTINGS: PlanningSettingsDto = { wastePercent: 5, maxPitchDiameters: 10, serviceLevel: 0.95, orderCost: 15, holdingRate: 0.25 };

// (2,146 − 2,000) / 2,000 = 7.3 % drawn beyond the estimate on finished assemblies.
const WASTE: ActualWaste = {
  chapter: { estimated: 2000, drawn: 2146, wastePercent: 7.3 },
  members: [
    { member: { id: 2, name: 'Mia Member' }, estimated: 1200, drawn: 1260, wastePercent: 5 },
    { member: { id: 4, name: 'Otto Other' }, estimated: 800, drawn: 886, wastePercent: 10.8 },
  ],
  currentAllowance: 5,
};

const NAMES: Record<Role, string> = { member: 'Mia Member', quartermaster: 'Quinn Quartermaster', lead: 'Lee Lead' };

function renderSettings(role: Role, respond?: (call: FakeCall) => { status: number; body?: unknown } | undefined) {
  let settings = SETTINGS;
  let payments: PaymentSettingsView = { offered: true, currency: 'usd', minimumCents: 50, provider: 'local-fake' };
  const calls = fakeFetch((call) => {
    const own = respond?.(call);
    if (own) return own;
    if (call.path === '/api/auth/me') return { status: 200, body: { user: { id: 1, name: NAMES[role], email: `${role}@example.org`, role } } };
    if (call.path === '/api/settings/planning' && call.method === 'GET') return { status: 200, body: settings };
    if (call.path === '/api/settings/planning' && call.method === 'PATCH') {
      settings = { ...settings, ...(call.body as Partial<PlanningSettingsDto>) };
      return { status: 200, body: settings };
    }
    if (call.path === '/api/settings/crib' && call.method === 'GET') return { status: 200, body: { holdHours: 48, timeZone: 'America/Chicago' } };
    if (call.path === '/api/payments/settings' && call.method === 'GET') return { status: 200, body: payments };
    if (call.path === '/api/payments/settings' && call.method === 'PUT') {
      payments = { ...payments, ...(call.body as UpdatePaymentSettingsBody) };
      return { status: 200, body: payments };
    }
    if (call.path === '/api/waste') return { status: 200, body: { ...WASTE, currentAllowance: settings.wastePercent } };
    return undefined;
  });
  renderWithProviders(
    <Suspense fallback={<p>Loading…</p>}>
      <SettingsRoute />
    </Suspense>,
    '/settings',
  );
  return calls;
}

const valueOf = (name: string | RegExp) => screen.getByRole<HTMLInputElement>('spinbutton', { name }).value;

beforeEach(() => setCsrfToken('tok'));

describe('Settings', () => {
  it('gives the lead the form in percent and dollars, each setting explained', async () => {
    renderSettings('lead');
    const form = await screen.findByRole('form', { name: 'Planning settings' });
    expect(valueOf('Waste allowance (%)')).toBe('5');
    expect(valueOf('Maximum pitch (rivet diameters)')).toBe('10');
    expect(valueOf('Service level (%)')).toBe('95');
    expect(valueOf('Cost per order ($)')).toBe('15');
    expect(valueOf('Holding rate (% of unit cost per year)')).toBe('25');
    expect(screen.getByRole('spinbutton', { name: 'Service level (%)' }).getAttribute('aria-describedby')).toBeTruthy();
    expect(within(form).getByText(/runs short about one lead time in twenty/)).toBeTruthy();
    // Both published maxima are named, as the estimate's pitch rule names them: 8D (NAVEDTRA 14018 ch. 13) and 10D (FAA-derived sources).
    expect(within(form).getByText(/8D \(NAVEDTRA 14018 ch\. 13\).*10D \(FAA-derived sources, secondary\)/)).toBeTruthy();
    expect(within(form).getByText(/Measured on finished assemblies:/).textContent).toContain('7.3 %');
    // A table that scrolls sideways on a phone can be reached and scrolled with the keyboard.
    expect(screen.getByRole('region', { name: 'Waste by member' }).getAttribute('tabindex')).toBe('0');
    const rows = within(screen.getByRole('table', { name: 'Waste by member' })).getAllByRole('row').slice(1);
    expect(rows.map((r) => [...r.children].map((c) => c.textContent))).toEqual([
      ['Mia Member', '1,200', '1,260', '5 %'],
      ['Otto Other', '800', '886', '10.8 %'],
    ]);
  });

  it('gives the lead the hold time and the time zone forms on the same page', async () => {
    renderSettings('lead');
    expect(await screen.findByRole('heading', { name: 'Settings', level: 1 })).toBeTruthy();
    expect(screen.getByRole('form', { name: 'Hold time' })).toBeTruthy();
    expect(screen.getByRole('form', { name: 'Time zone' })).toBeTruthy();
    expect(screen.getByLabelText<HTMLInputElement>('Hours a returned tool waits').value).toBe('48');
  });

  it.each(['member', 'quartermaster'] as const)('shows a %s the chapter settings without a form (only their own PIN) and does not ask for measured waste', async (role) => {
    const calls = renderSettings(role);
    expect(await screen.findByRole('heading', { name: 'Settings', level: 1 })).toBeTruthy();
    expect(screen.getAllByRole('form').map((f) => f.getAttribute('aria-label'))).toEqual(['Station PIN']);
    expect(screen.queryByRole('spinbutton')).toBeNull();
    expect(screen.queryByRole('combobox')).toBeNull();
    expect(screen.getAllByRole('button').map((b) => b.textContent)).toEqual(['Save PIN']);
    expect(screen.getByText(/Only the chapter lead changes them\.$/)).toBeTruthy();
    expect(screen.getByText('48 hours (2 days)')).toBeTruthy();
    expect(screen.getByText('America/Chicago', { selector: 'strong' })).toBeTruthy();
    const shown = Object.fromEntries([...document.querySelectorAll('dt')].map((dt) => [dt.textContent, dt.nextElementSibling?.firstChild?.textContent]));
    expect(shown).toEqual({
      'Waste allowance': '5 %',
      'Maximum pitch': '10 D',
      'Service level': '95 %',
      'Cost per order': '$15.00',
      'Holding rate': '25 % a year',
    });
    expect(calls.map((c) => c.path)).not.toContain('/api/waste');
  });

  it('uses the measured waste as the allowance with one PATCH', async () => {
    const calls = renderSettings('lead');
    await screen.findByRole('form', { name: 'Planning settings' });
    await userEvent.click(screen.getByRole('button', { name: 'Use measured waste (7.3 %)' }));
    await waitFor(() => expect(calls.filter((c) => c.method === 'PATCH')).toHaveLength(1));
    expect(calls.find((c) => c.method === 'PATCH')).toMatchObject({ path: '/api/settings/planning', body: { wastePercent: 7.3 } });
    await waitFor(() => expect(valueOf('Waste allowance (%)')).toBe('7.3'));
    expect(await screen.findByText('The allowance already matches what was measured.')).toBeTruthy();
  });

  it('sends percentages as the fractions the API speaks, and checks ranges first', async () => {
    const calls = renderSettings('lead');
    await screen.findByRole('form', { name: 'Planning settings' });
    const service = screen.getByRole('spinbutton', { name: 'Service level (%)' });
    await userEvent.clear(service);
    await userEvent.type(service, '100');
    await userEvent.click(screen.getByRole('button', { name: 'Save settings' }));
    expect(await screen.findByText('The service level is at most 99.9 %.')).toBeTruthy();
    expect(calls.filter((c) => c.method === 'PATCH')).toEqual([]);

    await userEvent.clear(service);
    await userEvent.type(service, '97.5');
    const holding = screen.getByRole('spinbutton', { name: 'Holding rate (% of unit cost per year)' });
    await userEvent.clear(holding);
    await userEvent.type(holding, '29');
    await userEvent.click(screen.getByRole('button', { name: 'Save settings' }));
    await waitFor(() => expect(calls.filter((c) => c.method === 'PATCH')).toHaveLength(1));
    // 29 % is 0.29 exactly, not 0.29000000000000004
    expect(calls.find((c) => c.method === 'PATCH')!.body).toEqual({ wastePercent: 5, maxPitchDiameters: 10, serviceLevel: 0.975, orderCost: 15, holdingRate: 0.29 });
  });

  it('puts the server’s refusal on the form', async () => {
    renderSettings('lead', ({ method, path }) =>
      method === 'PATCH' && path === '/api/settings/planning'
        ? { status: 403, body: { error: { code: 'FORBIDDEN', message: 'Only a chapter lead can change the planning settings.' } } }
        : undefined,
    );
    await screen.findByRole('form', { name: 'Planning settings' });
    await userEvent.click(screen.getByRole('button', { name: 'Save settings' }));
    expect(await screen.findByText('Only a chapter lead can change the planning settings.')).toBeTruthy();
  });

  it('gives the lead the online payment form: offer off, or another currency, sent whole', async () => {
    const calls = renderSettings('lead');
    const form = await screen.findByRole('form', { name: 'Online payment' });
    expect(screen.getByText('Members may pay their tab online, in US dollars, from $0.50 up.')).toBeTruthy();
    expect(screen.getByText(/uses its local stand-in for the payment provider/)).toBeTruthy();
    const offer = within(form).getByRole('checkbox', { name: 'Offer online payment to members' });
    expect((offer as HTMLInputElement).checked).toBe(true);
    await userEvent.click(offer);
    await userEvent.selectOptions(within(form).getByLabelText('Currency of online payments'), 'Canadian dollars (CAD)');
    await userEvent.click(within(form).getByRole('button', { name: 'Save online payment' }));
    await waitFor(() => expect(calls.find((c) => c.method === 'PUT')).toMatchObject({ path: '/api/payments/settings', body: { offered: false, currency: 'cad' } }));
    expect(await screen.findAllByText('Online payment is off: members pay their tab in cash to the quartermaster.')).not.toHaveLength(0);
  });

  it('shows a member the online payment setting and the provider without a form or any key', async () => {
    renderSettings('member', ({ path }) =>
      path === '/api/payments/settings' ? { status: 200, body: { offered: true, currency: 'eur', minimumCents: 50, provider: 'connected' } } : undefined,
    );
    expect(await screen.findByText('Members may pay their tab online, in euros, from €0.50 up.')).toBeTruthy();
    expect(screen.getByText('Gripline is connected to the payment provider with the chapter’s own account.')).toBeTruthy();
    expect(screen.getByText('Only the chapter lead changes online payment.')).toBeTruthy();
    expect(screen.queryByRole('form', { name: 'Online payment' })).toBeNull();
  });
});
