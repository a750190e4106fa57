import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeEach, describe, expect, it } from 'vitest';
import { DRILLING_CAUTION, SOFT_RIVET_CAUTION } from '@shared/safety/estimate-cautions';
import type { Assembly, Build } from '@shared/schemas/builds';
import { AssemblyEditRoute, assemblyEditLoader, AssemblyNewRoute, assemblyNewLoader } from '@/app/routes/app/assembly-edit';
import { setCsrfToken } from '@/lib/api-client';
import { assemblyFixture, buildFixture, rudderFixture } from '../helpers/assembly-fixture';
import { fakeFetch, renderRoutes, testQueryClient, type FakeCall } from '../helpers/render';

const ME = { id: 2, name: 'Ruth Lindqvist', email: 'member@example.org', role: 'member' };

interface Serve {
  build?: Build;
  assembly?: Assembly;
  /** The person's usual unit; absent means the server does not answer it. */
  preferredUnit?: 'in' | 'mm';
  settings?: { wastePercent: number; maxPitchDiameters: number };
}

function serve({ build = buildFixture(1), assembly, preferredUnit, settings }: Serve = {}) {
  return fakeFetch((call) => {
    if (call.path === '/api/auth/me') return { status: 200, body: { user: ME } };
    if (call.method === 'GET' && call.path === `/api/builds/${build.id}`) return { status: 200, body: build };
    if (call.method === 'GET' && call.path === '/api/me/preferences' && preferredUnit) return { status: 200, body: { preferredUnit } };
    if (call.method === 'GET' && call.path === '/api/settings/planning' && settings) return { status: 200, body: { ...settings, serviceLevel: 0.95, orderCost: 15, holdingRate: 0.25 } };
    if (assembly && call.method === 'GET' && call.path === `/api/assemblies/${assembly.id}`) return { status: 200, body: assembly };
    if (call.method === 'POST' && call.path === `/api/builds/${build.id}/assemblies`) return { status: 201, body: assemblyFixture(41, call.body as Partial<Assembly>) };
    if (assembly && call.method === 'PATCH' && call.path === `/api/assemblies/${assembly.id}`) return { status: 200, body: { ...assembly, ...(call.body as Partial<Assembly>) } };
    return undefined;
  });
}

function renderEditor(path = '/builds/1/assemblies/new') {
  const queryClient = testQueryClient();
  return renderRoutes(
    queryClient,
    [
      { path: '/builds/:id/assemblies/new', loader: assemblyNewLoader(queryClient), Component: AssemblyNewRoute, HydrateFallback: () => null },
      { path: '/assemblies/:id/edit', loader: assemblyEditLoader(queryClient), Component: AssemblyEditRoute, HydrateFallback: () => null },
      { path: '/assemblies/:id', element: <p>estimate page</p> },
    ],
    path,
  );
}

const line = (n: number) => within(screen.getByRole('group', { name: `Rivet line ${n}` }));
const lineEstimate = (n: number) => screen.getByRole('region', { name: `Estimate for rivet line ${n}` });
/** The value shown beside a term of an estimate. */
const fact = (region: HTMLElement, term: string) => within(region).getByText(term, { selector: 'dt' }).nextElementSibling?.textContent;
const save = () => screen.getByRole('button', { name: 'Save the assembly' });
const posts = (calls: FakeCall[]) => calls.filter((c) => c.method === 'POST' || c.method === 'PATCH');

beforeEach(() => setCsrfToken('tok'));

describe('the assembly editor', () => {
  it('has headings that go down one level at a time, each rivet line a heading of its own', async () => {
    serve();
    renderEditor();
    await screen.findByLabelText('Assembly name');
    const levels = screen.getAllByRole('heading').map((h) => Number(h.tagName.slice(1)));
    expect(screen.getByRole('heading', { name: 'Rivet line 1' }).tagName).toBe('H3');
    levels.slice(1).forEach((level, i) => {
      expect(level, `heading ${i + 2} of ${levels.join(', ')}`).toBeLessThanOrEqual((levels[i] ?? 1) + 1);
    });
  });

  it('works out a typed rivet line as the member types, then saves it and opens the estimate', async () => {
    const calls = serve();
    const router = renderEditor();
    await userEvent.type(await screen.findByLabelText('Assembly name'), 'Rudder');
    // Nothing says the person's unit: the editor starts in inches.
    expect(screen.getByRole<HTMLInputElement>('radio', { name: 'Inches (in)' }).checked).toBe(true);

    await userEvent.type(line(1).getByLabelText('Length (in)'), '20');
    await userEvent.type(line(1).getByLabelText('Target pitch (in)'), '1');
    await userEvent.type(line(1).getByLabelText('Edge distance (in, optional)'), '0.375');
    await userEvent.click(line(1).getByRole('button', { name: 'Add a 0.032 in sheet' }));
    await userEvent.click(line(1).getByRole('button', { name: 'Add a 0.032 in sheet' }));
    expect(line(1).getByLabelText<HTMLInputElement>('Sheet 2 thickness (in)').value).toBe('0.032');
    await userEvent.selectOptions(line(1).getByLabelText('Diameter'), '5/32 in (−5)');

    // Worked check, trade-checks.md §3 (our own arithmetic): L = 20 in, e = 0.375 in, p = 1.0 in → ⌈19.25⌉ + 1 = 21 holes at 0.9625 in.
    await waitFor(() => expect(fact(lineEstimate(1), 'Holes')).toBe('21'));
    expect(fact(lineEstimate(1), 'Pitch')).toBe('0.9625 in');
    expect(fact(lineEstimate(1), 'Edge distance')).toBe('0.375 in');
    // Stack 0.064 in falls in grip −2, 0.063–0.125 in: TM 10-5410-221-14/1 Table 4-3.
    expect(fact(lineEstimate(1), 'Grip')).toBe('−2 (0.063–0.125 in)');
    // A 5/32 blind rivet: #40 → #30 → #20 (trade-checks.md §2, common practice; #20 from the TM's 0.160–0.164 in hole range).
    expect(fact(lineEstimate(1), 'Drill steps')).toBe('#40 → #30 → #20');
    // A temporary fastener about every third hole per step (common practice): ⌈21 / 3⌉ = 7 of each step's size (NAVEDTRA 14315 sizes).
    expect(fact(lineEstimate(1), 'Temporary fasteners')).toBe('3/32 in × 7, 1/8 in × 7, 5/32 in × 7');
    // 21 × 1.05 = 22.05 → 23 with the usual 5 % waste (arithmetic, rounded up).
    expect(screen.getByTestId('live-totals').textContent).toBe('21 rivets · 23 with 5 % waste');

    await userEvent.click(save());
    await waitFor(() => expect(router.state.location.pathname).toBe('/assemblies/41'));
    const [post] = posts(calls);
    expect(post!.path).toBe('/api/builds/1/assemblies');
    expect(post!.body).toMatchObject({
      name: 'Rudder',
      status: 'planned',
      unit: 'in',
      lines: [{ length: 20, rows: 1, pitch: 1, edgeDistance: 0.375, stack: [0.032, 0.032], structural: true, rivet: { kind: 'blind-structural', head: 'dome', diameter32: 5 } }],
      extraItems: [],
    });
    expect((post!.body as { lines: object[] }).lines[0]).not.toHaveProperty('holesPerRow');
  });

  it('asks for the row pattern and spacing once a line has more than one row, and shows the transverse pitch', async () => {
    const calls = serve();
    renderEditor();
    await userEvent.type(await screen.findByLabelText('Assembly name'), 'Spar doubler');
    // 1/8 in rivets, 20.5 in, edge 2D = 0.25 in → 21 holes a row at 1 in (our own arithmetic).
    await userEvent.type(line(1).getByLabelText('Length (in)'), '20.5');
    await userEvent.type(line(1).getByLabelText('Target pitch (in)'), '1');
    await userEvent.click(line(1).getByRole('button', { name: 'Add a 0.032 in sheet' }));
    await userEvent.selectOptions(line(1).getByLabelText('Diameter'), '1/8 in (−4)');
    await waitFor(() => expect(fact(lineEstimate(1), 'Holes')).toBe('21'));
    expect(line(1).queryByRole('group', { name: 'Row pattern' })).toBeNull();
    expect(within(lineEstimate(1)).queryByText('Transverse pitch (between rows)')).toBeNull();

    await userEvent.type(line(1).getByLabelText('Rows'), '{Backspace}2');
    await userEvent.click(line(1).getByRole('radio', { name: 'Staggered' }));
    // Staggered by half a pitch: 21 + 20 = 41; rows 75 % of the 1 in pitch apart (FAA-H-8083-31, secondary).
    await waitFor(() => expect(fact(lineEstimate(1), 'Holes')).toBe('41 (2 staggered rows of 21 and 20)'));
    expect(fact(lineEstimate(1), 'Transverse pitch (between rows)')).toBe('0.75 in');

    // Below 2.5D = 0.3125 in (TM 10-5410-229-13&P: rows never less than 2 1/2 diameters apart): kept, with a caution.
    await userEvent.type(line(1).getByLabelText('Row spacing (in, optional)'), '0.25');
    await waitFor(() => expect(fact(lineEstimate(1), 'Transverse pitch (between rows)')).toBe('0.25 in'));
    expect(lineEstimate(1).textContent).toContain('Row spacing 0.25 in is below the published minimum of 2.5D = 0.3125 in for a 1/8 in rivet.');

    await userEvent.click(save());
    await waitFor(() => expect(posts(calls)).toHaveLength(1));
    expect((posts(calls)[0]!.body as { lines: object[] }).lines[0]).toMatchObject({ rows: 2, rowPattern: 'staggered', rowSpacing: 0.25 });
  });

  it('asks how a countersunk head’s top sheet is prepared, shows the shop head and half length, and marks a repair', async () => {
    const calls = serve();
    renderEditor();
    await userEvent.type(await screen.findByLabelText('Assembly name'), 'Aileron skin');
    await userEvent.type(line(1).getByLabelText('Length (in)'), '20');
    await userEvent.type(line(1).getByLabelText('Target pitch (in)'), '1');
    await userEvent.click(line(1).getByRole('button', { name: 'Add a 0.032 in sheet' }));
    await userEvent.click(line(1).getByRole('button', { name: 'Add a 0.032 in sheet' }));
    await userEvent.selectOptions(line(1).getByLabelText('Rivet kind'), 'Solid rivet');
    await userEvent.selectOptions(line(1).getByLabelText('Diameter'), '1/8 in (−4)');
    expect(line(1).queryByLabelText('Flush preparation')).toBeNull();
    // Solid 1/8 in: 0.064 + 1.5 × 0.125 = 0.2515 in → −5 (5/16 in); −4.5 = 0.28125 in also fits. Shop head 1.5D × 0.5D (FAA-H-8083-31, secondary).
    await waitFor(() => expect(fact(lineEstimate(1), 'Rivet length')).toBe('length −5 (5/16 in), shop head about 0.1875 in wide, 0.0625 in high'));
    expect(fact(lineEstimate(1), 'Half length')).toBe('−4.5 (9/32 in) also fits; which half lengths are stocked varies by supplier');

    await userEvent.selectOptions(line(1).getByLabelText('Head'), '100° countersunk');
    const prep = line(1).getByLabelText<HTMLSelectElement>('Flush preparation');
    expect([...prep.options].map((o) => o.text)).toEqual(['As the rule says', 'Countersink', 'Dimple']);
    // 0.032 in top sheet, below the 0.050 in minimum for a 1/8 in machine countersink (TM 9-2320-363-34-2): dimpled.
    await waitFor(() => expect(fact(lineEstimate(1), 'Flush preparation')).toBe('Dimple the top sheet (100°)'));
    await userEvent.selectOptions(prep, 'Countersink');
    await waitFor(() => expect(fact(lineEstimate(1), 'Flush preparation')).toBe('Countersink the top sheet (100°)'));
    expect(lineEstimate(1).textContent).toContain('leave a knife edge');

    await userEvent.click(line(1).getByLabelText('Repair of drilled-out rivets (one size up)'));
    // One size up, 5/32 in: edge 2.5D = 0.390625 in for the countersunk head.
    await waitFor(() => expect(fact(lineEstimate(1), 'Repair rivet')).toBe('5/32 in, one size up'));
    expect(fact(lineEstimate(1), 'Edge distance')).toBe('0.3906 in');
    expect(lineEstimate(1).textContent).toContain('Repair: 1/8 in holes drilled out, 5/32 in rivets');

    await userEvent.click(save());
    await waitFor(() => expect(posts(calls)).toHaveLength(1));
    expect((posts(calls)[0]!.body as { lines: object[] }).lines[0]).toMatchObject({ flushPrep: 'countersink', repair: true, rivet: { kind: 'solid', head: 'countersunk', diameter32: 4 } });
  });

  it('refuses a general-purpose blind rivet on a structural line with the caution, and will not save until it is changed', async () => {
    const calls = serve();
    renderEditor();
    await userEvent.type(await screen.findByLabelText('Assembly name'), 'Canopy frame');
    await userEvent.type(line(1).getByLabelText('Length (in)'), '12');
    await userEvent.type(line(1).getByLabelText('Target pitch (in)'), '1');
    await userEvent.type(line(1).getByLabelText('Sheet 1 thickness (in)'), '0.040');
    await userEvent.selectOptions(line(1).getByLabelText('Rivet kind'), 'General-purpose blind rivet');

    // AC 43.13-1B p. 4-24: pull-type blind rivets made for non-aircraft use are not approved for certificated structure.
    await waitFor(() => expect(lineEstimate(1).textContent).toMatch(/A general-purpose blind rivet cannot go on a structural line/));
    expect(lineEstimate(1).textContent).toContain('not approved for certificated aircraft structure');
    expect(save()).toHaveProperty('disabled', true);
    expect(screen.getByTestId('live-totals').textContent).toBe('Fix 1 line before saving.');

    await userEvent.click(line(1).getByLabelText('Structural line (carries load)'));
    await waitFor(() => expect(save()).toHaveProperty('disabled', false));
    // A 0.040 in sheet takes grip −1, 0.020–0.062 in (TM 10-5410-221-14/1 Table 4-3).
    expect(fact(lineEstimate(1), 'Grip')).toBe('−1 (0.020–0.062 in)');
    expect(posts(calls)).toHaveLength(0);
  });

  it('keeps a large flange head on the list when a line becomes solid, says why at the head on save, and saves once it is changed', async () => {
    const calls = serve();
    renderEditor();
    await userEvent.type(await screen.findByLabelText('Assembly name'), 'Fairing');
    await userEvent.type(line(1).getByLabelText('Length (in)'), '12');
    await userEvent.type(line(1).getByLabelText('Target pitch (in)'), '1');
    await userEvent.type(line(1).getByLabelText('Sheet 1 thickness (in)'), '0.040');
    await userEvent.selectOptions(line(1).getByLabelText('Head'), 'Large flange');
    await userEvent.selectOptions(line(1).getByLabelText('Rivet kind'), 'Solid rivet');
    // AC 43.13-1B para 4-57a; NAVEDTRA 14315 Table 3-1: solid rivet heads are universal and 100° countersunk.
    expect(line(1).getByLabelText<HTMLSelectElement>('Head').selectedOptions[0]!.textContent).toBe('Large flange');
    await userEvent.click(save());
    expect(await line(1).findByText('A solid rivet’s head is universal or 100° countersunk; large flange is a blind-rivet head.')).toBeTruthy();
    expect(posts(calls)).toHaveLength(0);
    await userEvent.selectOptions(line(1).getByLabelText('Head'), 'Universal head');
    await userEvent.click(save());
    await waitFor(() => expect(posts(calls)).toHaveLength(1));
    expect(posts(calls)[0]!.body).toMatchObject({ lines: [{ rivet: { kind: 'solid', head: 'dome' } }] });
  });

  it('shows a “Why?” beside each number of a line with its rule and source, and the cautions once, the soft blind rivet one when chosen', async () => {
    serve();
    renderEditor();
    await userEvent.type(await screen.findByLabelText('Assembly name'), 'Fairing');
    const cautionBox = () => screen.getByText('Caution: a plan for stock, not a design').parentElement!;
    expect(within(cautionBox()).getByText(DRILLING_CAUTION)).toBeTruthy();
    expect(within(cautionBox()).queryByText(SOFT_RIVET_CAUTION)).toBeNull();

    // 12 in, 1 in target pitch, 3/32 in countersunk blind rivets, edge left to the rule: 2.5D = 0.234375 in (FAA-H-8083-31).
    await userEvent.type(line(1).getByLabelText('Length (in)'), '12');
    await userEvent.type(line(1).getByLabelText('Target pitch (in)'), '1');
    await userEvent.type(line(1).getByLabelText('Sheet 1 thickness (in)'), '0.040');
    await userEvent.selectOptions(line(1).getByLabelText('Head'), 'countersunk');
    await waitFor(() => expect(fact(lineEstimate(1), 'Edge distance')).toBe('0.2344 in'));
    const why = within(lineEstimate(1)).getByRole('button', { name: 'Why? Edge distance' });
    const panel = document.getElementById(why.getAttribute('aria-controls')!)!;
    expect(panel.hidden).toBe(true);
    await userEvent.click(why);
    expect(why.getAttribute('aria-expanded')).toBe('true');
    expect(panel.textContent).toBe('2.5D, countersunk head. Source: FAA-H-8083-31.');
    await userEvent.click(within(lineEstimate(1)).getByRole('button', { name: 'Why? Holes' }));
    expect(within(lineEstimate(1)).getByText(/n = ⌈\(L − 2e\) \/ p⌉ \+ 1/).textContent).toContain('Source: common practice.');

    await userEvent.click(line(1).getByLabelText('Structural line (carries load)'));
    await userEvent.selectOptions(line(1).getByLabelText('Rivet kind'), 'General-purpose blind rivet');
    await waitFor(() => expect(within(cautionBox()).getByText(SOFT_RIVET_CAUTION)).toBeTruthy());
    expect(screen.getAllByText(DRILLING_CAUTION)).toHaveLength(1);
  });

  it('says at the line when a hole count packs the rivets below the minimum pitch', async () => {
    serve();
    renderEditor();
    await userEvent.type(await screen.findByLabelText('Assembly name'), 'Doubler');
    await userEvent.type(line(1).getByLabelText('Length (in)'), '20');
    await userEvent.click(line(1).getByRole('radio', { name: 'By holes per row' }));
    await userEvent.type(line(1).getByLabelText('Holes per row'), '60');
    await userEvent.type(line(1).getByLabelText('Edge distance (in, optional)'), '0.375');
    await userEvent.type(line(1).getByLabelText('Sheet 1 thickness (in)'), '0.063');
    await userEvent.selectOptions(line(1).getByLabelText('Diameter'), '5/32 in (−5)');
    // 19.25 in / 59 spaces = 0.326 in, below 3D = 0.46875 in for 5/32 (AC 43.13-1B; NAVEDTRA 14018 ch. 13: at least 3D).
    await waitFor(() => expect(lineEstimate(1).textContent).toContain('60 holes give a pitch of 0.3263 in, below the published minimum of 3D = 0.4688 in'));
    expect(save()).toHaveProperty('disabled', true);
  });

  it('adds a second line, takes the build’s edge distance floor, and totals both lines with waste per rivet kind', async () => {
    const calls = serve({ build: buildFixture(1, { edgeFloorIn: 0.5 }) });
    renderEditor();
    await userEvent.type(await screen.findByLabelText('Assembly name'), 'Left elevator');
    expect(screen.getByText(/sets an edge distance floor of/).textContent).toContain('0.5 in');
    await userEvent.type(line(1).getByLabelText('Length (in)'), '20');
    await userEvent.type(line(1).getByLabelText('Target pitch (in)'), '1');
    await userEvent.click(line(1).getByRole('button', { name: 'Add a 0.025 in sheet' }));
    await userEvent.selectOptions(line(1).getByLabelText('Diameter'), '5/32 in (−5)');

    await userEvent.click(screen.getByRole('button', { name: 'Add a rivet line' }));
    await userEvent.type(line(2).getByLabelText('Length (in)'), '10');
    await userEvent.type(line(2).getByLabelText('Rows'), '{Backspace}2');
    await userEvent.click(line(2).getByRole('radio', { name: 'By holes per row' }));
    await userEvent.type(line(2).getByLabelText('Holes per row'), '11');
    await userEvent.type(line(2).getByLabelText('Edge distance (in, optional)'), '0.5');
    await userEvent.click(line(2).getByRole('button', { name: 'Add a 0.025 in sheet' }));
    await userEvent.click(line(2).getByRole('button', { name: 'Add a 0.025 in sheet' }));
    await userEvent.selectOptions(line(2).getByLabelText('Rivet kind'), 'Solid rivet');
    // A solid rivet's protruding head is the universal head (MS20470); a blind rivet's stays dome (trade-checks.md §4).
    const headShown = (n: number) => line(n).getByLabelText<HTMLSelectElement>('Head').selectedOptions[0]!.textContent;
    expect(headShown(2)).toBe('Universal head');
    expect(headShown(1)).toBe('Dome');
    // Solid rivet heads: universal (MS20470) and 100° countersunk (MS20426) only (AC 43.13-1B para 4-57a;
    // NAVEDTRA 14315 Table 3-1); a large flange is a blind-rivet head.
    const headChoices = (n: number) => [...line(n).getByLabelText<HTMLSelectElement>('Head').options].map((o) => o.textContent);
    expect(headChoices(2)).toEqual(['Universal head', '100° countersunk']);
    expect(headChoices(1)).toEqual(['Dome', '100° countersunk', 'Large flange']);

    // Line 1 has no edge distance: the larger of 2D = 0.3125 in and the build's 0.5 in floor; (20 − 1) / 1 → 20 holes at 1 in (arithmetic).
    await waitFor(() => expect(fact(lineEstimate(1), 'Holes')).toBe('20'));
    expect(fact(lineEstimate(1), 'Edge distance')).toBe('0.5 in');
    expect(fact(lineEstimate(1), 'Pitch')).toBe('1 in');
    // Line 2: 11 holes a row over 9 in → 0.9 in; 2 rows → 22 holes. Solid 1/8 in, stack 0.050 in:
    // 0.050 + 1.5 × 0.125 = 0.2375 → next 1/16 up is −4 (NAVEDTRA 14018 ch. 13; trade-checks.md §4).
    await waitFor(() => expect(fact(lineEstimate(2), 'Holes')).toBe('22 (11 a row × 2 rows)'));
    expect(fact(lineEstimate(2), 'Pitch')).toBe('0.9 in');
    // Its shop head about 1.5D × 0.5D (FAA-H-8083-31, secondary); −3.5 (0.21875 in) is too short, so no half length.
    expect(fact(lineEstimate(2), 'Rivet length')).toBe('length −4 (1/4 in), shop head about 0.1875 in wide, 0.0625 in high');
    expect(within(lineEstimate(2)).queryByText('Half length')).toBeNull();
    // Solid 1/8 in: #40 then #30 (FAA-H-8083-31 final drills).
    expect(fact(lineEstimate(2), 'Drill steps')).toBe('#40 → #30');
    // Waste per rivet kind, rounded up: ⌈20 × 1.05⌉ = 21, ⌈22 × 1.05⌉ = ⌈23.1⌉ = 24 → 45 (arithmetic).
    expect(screen.getByTestId('live-totals').textContent).toBe('42 rivets · 45 with 5 % waste');
    const whole = screen.getByRole('heading', { name: 'Estimate for the whole assembly' }).parentElement!;
    // #40 on every hole of both lines, #30 on both, #20 on line 1 only.
    expect(fact(whole, 'Holes per drill')).toBe('#40: 42, #30: 42, #20: 20');
    expect(within(whole).getByText(/Rivet puller with a 5\/32 in nosepiece/)).toBeTruthy();
    // One vocabulary with the crib kit: an MS20470 head is set with a universal-head rivet set (trade-checks.md §4).
    expect(within(whole).getByText(/Rivet gun with a 1\/8 in universal-head rivet set/)).toBeTruthy();

    await userEvent.click(save());
    await waitFor(() => expect(posts(calls)).toHaveLength(1));
    const body = posts(calls)[0]!.body as { lines: Record<string, unknown>[] };
    expect(body.lines[0]).not.toHaveProperty('edgeDistance');
    expect(body.lines[1]).toMatchObject({ length: 10, rows: 2, holesPerRow: 11, edgeDistance: 0.5, stack: [0.025, 0.025], rivet: { kind: 'solid', diameter32: 4 } });
  });

  it('starts in millimetres for a member who prefers them, with the chapter’s waste, and converts when switched to inches', async () => {
    serve({ preferredUnit: 'mm', settings: { wastePercent: 10, maxPitchDiameters: 10 } });
    renderEditor();
    await userEvent.type(await screen.findByLabelText('Assembly name'), 'Tool chest lid');
    expect(screen.getByRole<HTMLInputElement>('radio', { name: 'Millimetres (mm)' }).checked).toBe(true);
    // Sheet gauges are inch sizes: not offered in millimetres.
    expect(line(1).queryByRole('button', { name: /in sheet$/ })).toBeNull();

    await userEvent.type(line(1).getByLabelText('Length (mm)'), '500');
    await userEvent.type(line(1).getByLabelText('Target pitch (mm)'), '25');
    await userEvent.type(line(1).getByLabelText('Edge distance (mm, optional)'), '10');
    await userEvent.type(line(1).getByLabelText('Sheet 1 thickness (mm)'), '1');
    await userEvent.click(line(1).getByRole('button', { name: 'Add a sheet' }));
    await userEvent.type(line(1).getByLabelText('Sheet 2 thickness (mm)'), '1,0');
    await userEvent.selectOptions(line(1).getByLabelText('Diameter'), '5/32 in (−5)');

    // (500 − 2 × 10) / 25 = 19.2 → 20 spaces, 21 holes at 24 mm (arithmetic, as in trade-checks.md §3).
    await waitFor(() => expect(fact(lineEstimate(1), 'Holes')).toBe('21'));
    expect(fact(lineEstimate(1), 'Pitch')).toBe('24 mm');
    // 2 mm = 0.0787 in → grip −2 (TM 10-5410-221-14/1 Table 4-3).
    expect(fact(lineEstimate(1), 'Grip')).toBe('−2 (0.063–0.125 in)');
    // The chapter's 10 %: ⌈21 × 1.1⌉ = ⌈23.1⌉ = 24.
    expect(screen.getByTestId('live-totals').textContent).toBe('21 rivets · 24 with 10 % waste');

    await userEvent.click(screen.getByRole('radio', { name: 'Inches (in)' }));
    // 500 mm / 25.4 = 19.685 in, 10 mm = 0.3937 in (25.4 mm to the inch, exact by definition).
    expect(line(1).getByLabelText<HTMLInputElement>('Length (in)').value).toBe('19.685');
    expect(line(1).getByLabelText<HTMLInputElement>('Edge distance (in, optional)').value).toBe('0.3937');
    expect(line(1).getByRole('button', { name: 'Add a 0.032 in sheet' })).toBeTruthy();
    await waitFor(() => expect(fact(lineEstimate(1), 'Holes')).toBe('21'));
  });

  it('shows the schema’s words at the fields when a line is incomplete on save', async () => {
    const calls = serve();
    renderEditor();
    await screen.findByLabelText('Assembly name');
    await userEvent.click(save());
    expect(await screen.findByText('Name the assembly.')).toBeTruthy();
    expect(line(1).getByText('Enter the line length as a number.')).toBeTruthy();
    expect(line(1).getByText('Enter the sheet thickness as a number.')).toBeTruthy();
    expect(posts(calls)).toHaveLength(0);
  });

  it('edits a saved assembly: its lines come back with their estimate and the change is sent as a PATCH', async () => {
    const assembly = rudderFixture();
    const calls = serve({ assembly });
    const router = renderEditor('/assemblies/7/edit');
    expect(await screen.findByRole('heading', { name: 'Edit Rudder' })).toBeTruthy();
    expect(screen.getByLabelText<HTMLInputElement>('Planned start').value).toBe('2027-01-10');
    await waitFor(() => expect(fact(lineEstimate(1), 'Holes')).toBe('21'));
    expect(screen.getByLabelText<HTMLInputElement>('Bin code').value).toBe('B-0210');

    await userEvent.selectOptions(screen.getByLabelText('Status'), 'Done');
    await userEvent.click(save());
    await waitFor(() => expect(router.state.location.pathname).toBe('/assemblies/7'));
    const [patch] = posts(calls);
    expect(patch).toMatchObject({ method: 'PATCH', path: '/api/assemblies/7', body: { status: 'done', extraItems: [{ binCode: 'B-0210', quantity: 24 }] } });
    expect((patch!.body as { lines: unknown[] }).lines[0]).toMatchObject({ label: 'Skin to spar', length: 20, pitch: 1 });
  });
});
