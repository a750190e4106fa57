import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeEach, describe, expect, it } from 'vitest';
import type { RivetLineInput } from '@shared/estimate/estimate-line';
import { lineRules, totalsRules } from '@shared/estimate/line-rules';
import { cautionsFor, DRILLING_CAUTION } from '@shared/safety/estimate-cautions';
import type { AssemblyEstimate, KitHoldsResult } from '@shared/schemas/builds';
import { AssemblyDetailRoute, assemblyDetailLoader } from '@/app/routes/app/assembly-detail';
import { setCsrfToken } from '@/lib/api-client';
import { estimateFixture, rudderFixture } from '../helpers/assembly-fixture';
import { fakeFetch, renderRoutes, testQueryClient, type FakeCall } from '../helpers/render';

const OWNER = { id: 2, name: 'Ruth Lindqvist', email: 'member@example.org', role: 'member' };
const QUARTERMASTER = { id: 3, name: 'Marco Bellweather', email: 'qm@example.org', role: 'quartermaster' };

const ASSEMBLY = rudderFixture({ status: 'planned' });

const CAUTION = 'Gripline plans stock and tools; it does not design structures. The kit’s plans, approved data and licensed practice govern.';

/** The server's answer for that assembly: figures as the shared estimate gives them for the line (see assembly-editor.test.tsx). */
const FIGURES = { holesPerRow: 21, holes: 21, pitch: 0.9625, edgeDistance: 0.375, grip: 2, drillSequence: ['#40', '#30', '#20'], tempFasteners: { '3/32': 7, '1/8': 7, '5/32': 7 }, warnings: [], flushPrep: null, shopHead: null, halfLength: null };
const ESTIMATE: AssemblyEstimate = estimateFixture(7, {
  // The rules the shared estimate gives that line: edge given on the line, pitch from the target pitch, blind grip band.
  lines: [{ label: 'Skin to spar', ...FIGURES, rules: lineRules(ASSEMBLY.lines[0] as RivetLineInput, FIGURES, { unit: 'in' }) }],
  totals: { rivets: 21, rivetsWithWaste: 23, drillHoles: { '#40': 21, '#30': 21, '#20': 21 }, tempFasteners: { '3/32': 7, '1/8': 7, '5/32': 7 }, rules: totalsRules(5, 'chapter') },
  cautions: cautionsFor(false),
  bill: [
    {
      description: 'Blind, structural, dome, 5056, steel stem · 5/32 in · grip −2 (0.063–0.125 in)',
      kind: 'blind_structural',
      diameter32: 5,
      grip: 2,
      lines: [0],
      estimated: 21,
      withWaste: 23,
      bin: { code: 'B-0107', designation: 'Blind, structural, dome, 5056, steel stem · 5/32 in · grip −2 (0.063–0.125 in)', onHand: 10, location: 'Cabinet R, drawer 3' },
      unstocked: null,
      shortBy: 3,
      drawn: 10,
      toDraw: 13,
    },
    {
      description: 'MS20470AD4-4',
      kind: 'solid_rivet',
      diameter32: 4,
      grip: 4,
      lines: [1],
      estimated: 22,
      withWaste: 24,
      bin: null,
      unstocked: 'No bin stocks a 1/8 in universal head 2117-T4 solid rivet 1/4 in long (−4).',
      shortBy: 24,
      drawn: 0,
      toDraw: 24,
    },
    {
      description: 'Screw #8-32 × 1/2 pan head',
      kind: 'screw',
      diameter32: null,
      grip: null,
      lines: [],
      estimated: 24,
      withWaste: 24,
      bin: { code: 'B-0210', designation: 'Screw #8-32 × 1/2 pan head', onHand: 400, location: 'Cabinet S, drawer 1' },
      unstocked: null,
      shortBy: 0,
      drawn: 0,
      toDraw: 24,
    },
  ],
  kit: [
    { role: 'puller', need: 'A rivet puller for 5/32 in blind rivets', count: null, tool: { code: 'T-0012', name: 'Hand rivet puller', status: 'available', category: 'hand_rivet_puller' }, note: null },
    { role: 'drill_bit', need: '#30 drill bit', count: 21, tool: { code: 'T-0031', name: '#30 drill bit, 6 in long', status: 'on_loan', category: 'drill_bit' }, note: null },
    { role: 'temporary_fastener_tray', need: '3/32 in temporary fasteners', count: 7, tool: null, note: 'No tray of 3/32 in temporary fasteners in the crib.' },
  ],
  caution: CAUTION,
});

const HOLDS: KitHoldsResult = {
  placed: [{ code: 'T-0012', name: 'Hand rivet puller' }],
  skipped: [
    { code: 'T-0031', reason: 'It is on loan; you are next in its queue.' },
    { code: 'T-0040', reason: 'T-0040 needs the "Rivet gun" sign-off, which you do not have yet. Ask Dana Okafor (chapter lead) to sign you off.' },
  ],
  holdsFrom: '2027-01-05',
};

function serve(me = OWNER, hold: { status: number; body: unknown } = { status: 201, body: HOLDS }) {
  return fakeFetch((call) => {
    if (call.path === '/api/auth/me') return { status: 200, body: { user: me } };
    if (call.method === 'GET' && call.path === '/api/assemblies/7') return { status: 200, body: ASSEMBLY };
    if (call.method === 'GET' && call.path === '/api/assemblies/7/estimate') return { status: 200, body: ESTIMATE };
    if (call.method === 'POST' && call.path === '/api/assemblies/7/kit/holds') return hold;
    return undefined;
  });
}

function renderPage() {
  const queryClient = testQueryClient();
  renderRoutes(queryClient, [{ path: '/assemblies/:id', loader: assemblyDetailLoader(queryClient), Component: AssemblyDetailRoute, HydrateFallback: () => null }], '/assemblies/7');
  return screen.findByRole('heading', { level: 1, name: 'Rudder' });
}

const billItem = (description: string) => within(screen.getByRole('listitem', { name: description }));
const estimateGets = (calls: FakeCall[]) => calls.filter((c) => c.method === 'GET' && c.path === '/api/assemblies/7/estimate');

beforeEach(() => setCsrfToken('tok'));

describe('the assembly estimate page', () => {
  it('shows the caution first, then each bill line with its bin, on hand, short-by and drawn against estimated, or that no bin stocks it', async () => {
    serve();
    await renderPage();
    expect(screen.getByText(CAUTION)).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Edit the assembly' }).getAttribute('href')).toBe('/assemblies/7/edit');

    const rivets = billItem(ESTIMATE.bill[0]!.description);
    expect(rivets.getByRole('link', { name: 'B-0107' }).getAttribute('href')).toBe('/bins/B-0107');
    expect(rivets.getByText('21 (23 with 5 % waste)')).toBeTruthy();
    expect(rivets.getByText('10 of 21 estimated')).toBeTruthy();
    expect(rivets.getByText(/Short by 3/).parentElement!.textContent).toBe('Short by 3: the bin has 10 on hand, 13 are still to draw.');

    const solid = billItem(ESTIMATE.bill[1]!.description);
    expect(solid.getByText(/Not stocked/).parentElement!.textContent).toBe('Not stocked: No bin stocks a 1/8 in universal head 2117-T4 solid rivet 1/4 in long (−4).');
    expect(solid.queryByRole('link')).toBeNull();

    const screws = billItem('Screw #8-32 × 1/2 pan head');
    expect(screws.getByText('Enough on hand.')).toBeTruthy();
    expect(screws.getByRole('link', { name: 'B-0210' })).toBeTruthy();
  });

  it('lists the crib kit with each tool’s status or the note, and the rivet line worked out', async () => {
    serve();
    await renderPage();
    const kit = within(screen.getByRole('heading', { name: 'From the crib' }).parentElement!);
    expect(kit.getByRole('link', { name: 'T-0012' }).getAttribute('href')).toBe('/tools/T-0012');
    expect(kit.getByText('Available')).toBeTruthy();
    expect(kit.getByText('On loan')).toBeTruthy();
    expect(kit.getByText('No tray of 3/32 in temporary fasteners in the crib.')).toBeTruthy();

    const lines = within(screen.getByRole('heading', { name: 'Rivet lines' }).parentElement!);
    expect(lines.getByRole('heading', { name: 'Skin to spar' })).toBeTruthy();
    expect(lines.getByText('−2 (0.063–0.125 in)')).toBeTruthy();
    expect(lines.getByText('#40 → #30 → #20')).toBeTruthy();
  });

  it('shows the cautions once, and beside each number a “Why?” that opens its rule and source', async () => {
    serve();
    await renderPage();
    expect(screen.getAllByText(DRILLING_CAUTION)).toHaveLength(1);
    expect(screen.getByText(/certificated aircraft, use approved data/)).toBeTruthy();

    const lines = within(screen.getByRole('heading', { name: 'Rivet lines' }).parentElement!);
    const why = lines.getByRole('button', { name: 'Why? Edge distance' });
    expect(why.getAttribute('aria-expanded')).toBe('false');
    const panel = document.getElementById(why.getAttribute('aria-controls')!)!;
    expect(panel.hidden).toBe(true);
    await userEvent.click(why);
    expect(why.getAttribute('aria-expanded')).toBe('true');
    expect(panel.hidden).toBe(false);
    // The line gives its edge distance: the rule says so, with what it was checked against and the sources.
    expect(panel.textContent).toMatch(/^Given on the line, checked against 2D \(protruding head\)/);
    expect(panel.textContent).toContain('Source: AC 43.13-1B ch. 4; TM 10-5410-229-13&P para 5-6');

    await userEvent.click(lines.getByRole('button', { name: 'Why? Grip' }));
    expect(lines.getByText(/1\/16 in band covers the stack/).parentElement!.textContent).toContain('Source: TM 10-5410-221-14/1 Table 4-3');

    const totals = within(screen.getByRole('heading', { name: 'Totals' }).parentElement!);
    await userEvent.click(totals.getByRole('button', { name: 'Why? With 5 % waste' }));
    expect(totals.getByText(/chapter’s waste allowance of 5 %/)).toBeTruthy();
  });

  it('holds the kit in one tap and says which holds were placed and which were not, with the reason', async () => {
    const calls = serve();
    await renderPage();
    expect(estimateGets(calls)).toHaveLength(1);
    expect(screen.getByText(/you join each tool's queue now, and the tools are set aside for you from that morning/)).toBeTruthy();
    await userEvent.click(screen.getByRole('button', { name: 'Hold the kit' }));
    const result = await screen.findByText('Holds placed');
    const box = within(result.closest('[role="status"]') as HTMLElement);
    expect(box.getByText('T-0012').parentElement!.textContent).toBe('T-0012 Hand rivet puller');
    expect(box.getByText('Not held')).toBeTruthy();
    expect(box.getByText('T-0031').parentElement!.textContent).toBe('T-0031: It is on loan; you are next in its queue.');
    expect(box.getByText('T-0040').parentElement!.textContent).toMatch(/^T-0040: T-0040 needs the "Rivet gun" sign-off/);
    expect(box.getByText('Set aside for you from Jan 5, 2027; you are in each queue now.')).toBeTruthy();
    expect(calls.filter((c) => c.method === 'POST').map((c) => c.path)).toEqual(['/api/assemblies/7/kit/holds']);
    // The kit's statuses changed: the estimate is asked for again.
    await waitFor(() => expect(estimateGets(calls)).toHaveLength(2));
  });

  it('shows the server’s sentence when no hold can be placed', async () => {
    serve(OWNER, { status: 409, body: { error: { code: 'KIT_EMPTY', message: 'The crib has none of this kit’s tools.' } } });
    await renderPage();
    await userEvent.click(screen.getByRole('button', { name: 'Hold the kit' }));
    expect((await screen.findByRole('alert')).textContent).toContain('The crib has none of this kit’s tools.');
  });

  it('lets someone else read the estimate but neither edit it nor hold its kit', async () => {
    serve(QUARTERMASTER);
    await renderPage();
    expect(screen.getByText(/Ruth Lindqvist/)).toBeTruthy();
    expect(screen.queryByRole('link', { name: 'Edit the assembly' })).toBeNull();
    expect(screen.queryByRole('button', { name: 'Hold the kit' })).toBeNull();
  });
});
