import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import type { CreateToolBody, Tool } from '@shared/schemas/tools';
import { ToolForm } from '@/features/tools/components/tool-form';
import { ToolSummary } from '@/features/tools/components/tool-summary';
import { renderWithProviders } from '../helpers/render';

function renderForm() {
  const onSubmit = vi.fn((_body: CreateToolBody) => Promise.resolve());
  renderWithProviders(<ToolForm signoffs={[]} submitLabel="Add the tool" onSubmit={onSubmit} />);
  return onSubmit;
}

const optionTexts = (label: string) => within(screen.getByLabelText(label)).getAllByRole('option').map((o) => o.textContent);

describe('the tool form: the rivet size a cutter or dies are for', () => {
  it('asks a countersink cutter for its rivet size and its pilot, and sends both', async () => {
    const onSubmit = renderForm();
    expect(screen.queryByLabelText('For rivet size')).toBeNull();
    await userEvent.type(screen.getByLabelText('Name'), '100° countersink cutter, 1/8 in');
    await userEvent.selectOptions(screen.getByLabelText('Kind'), 'countersink_cutter');
    expect(optionTexts('For rivet size')).toEqual(['Choose the rivet size', '3/32 in', '1/8 in', '5/32 in', '3/16 in', '1/4 in']);
    await userEvent.selectOptions(screen.getByLabelText('For rivet size'), '1/8 in');
    await userEvent.type(screen.getByLabelText('Pilot'), '#30');
    await userEvent.click(screen.getByRole('button', { name: 'Add the tool' }));
    expect(onSubmit).toHaveBeenCalledOnce();
    expect(onSubmit.mock.calls[0]![0]).toMatchObject({ category: 'countersink_cutter', rivetDiameter32: 4, drillSize: '#30' });
  });

  it('asks dimple dies for the rivet size only, and sends no size for another kind of tool', async () => {
    const onSubmit = renderForm();
    await userEvent.type(screen.getByLabelText('Name'), '100° dimple dies, 3/32 in');
    await userEvent.selectOptions(screen.getByLabelText('Kind'), 'dimple_dies');
    expect(screen.queryByLabelText('Pilot')).toBeNull();
    expect(screen.queryByLabelText('Drill size')).toBeNull();
    await userEvent.selectOptions(screen.getByLabelText('For rivet size'), '3/32 in');
    // Changing the kind away drops the size from what is sent.
    await userEvent.selectOptions(screen.getByLabelText('Kind'), 'spacing_fan');
    expect(screen.queryByLabelText('For rivet size')).toBeNull();
    await userEvent.click(screen.getByRole('button', { name: 'Add the tool' }));
    expect(onSubmit.mock.calls[0]![0]).toMatchObject({ category: 'spacing_fan', rivetDiameter32: null, drillSize: null });
  });
});

describe('the tool page: what a cutter is for', () => {
  const cutter = {
    id: 61,
    code: 'T-0061',
    name: '100° countersink cutter, 1/8 in',
    category: 'countersink_cutter',
    location: 'Cabinet A, drawer 2',
    replacementValueCents: 3400,
    loanDays: 14,
    loanDaysOverride: null,
    requiredSignoff: null,
    serviceIntervalDays: null,
    lastServiceAt: null,
    serviceDueAt: null,
    status: 'available',
    statusNote: null,
    // ASME B94.11M: #30 = 0.1285 in (3.264 mm).
    drillSize: { name: '#30', inch: 0.1285, mm: 3.264 },
    rivetDiameter32: 4,
    traySize: null,
    trayCapacity: null,
    accessories: [],
    notes: '',
    loan: null,
    missingAccessories: [],
    holds: { waiting: 0, offeredTo: null, offerExpiresAt: null },
    photoIds: [],
  } satisfies Tool;

  it('shows the rivet size and names the drill size the pilot', () => {
    renderWithProviders(<ToolSummary tool={cutter} />);
    const term = (text: string) => screen.getByText(text, { selector: 'dt' }).nextElementSibling?.textContent;
    expect(term('For rivet size')).toBe('1/8 in');
    expect(term('Pilot')).toContain('#30');
    expect(screen.queryByText('Drill size', { selector: 'dt' })).toBeNull();
  });
});
