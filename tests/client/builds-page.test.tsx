import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeEach, describe, expect, it } from 'vitest';
import type { Build } from '@shared/schemas/builds';
import { BuildsRoute, buildsLoader } from '@/app/routes/app/builds';
import { setCsrfToken } from '@/lib/api-client';
import { buildFixture } from '../helpers/assembly-fixture';
import { fakeFetch, renderRoutes, testQueryClient } from '../helpers/render';

const MEMBER = { id: 2, name: 'Ruth Lindqvist', email: 'member@example.org', role: 'member' };
const QUARTERMASTER = { id: 3, name: 'Marco Bellweather', email: 'qm@example.org', role: 'quartermaster' };

const MINE: Build = buildFixture(1, {
  name: 'Two-seat low wing',
  edgeFloorIn: 0.375,
  assemblies: [
    { id: 7, name: 'Rudder', status: 'in_progress', plannedStart: '2027-01-10', plannedFinish: '2027-02-01' },
    { id: 8, name: 'Left elevator', status: 'planned', plannedStart: null, plannedFinish: null },
  ],
});
const THEIRS: Build = buildFixture(5, { owner: { id: 4, name: 'Ines Okafor' }, name: 'Tool chest' });

function serve(me: typeof MEMBER, preferredUnit: 'in' | 'mm' = 'in') {
  return fakeFetch((call) => {
    if (call.path === '/api/auth/me') return { status: 200, body: { user: me } };
    if (call.path === '/api/me/preferences') return { status: 200, body: { preferredUnit } };
    if (call.method === 'GET' && call.path === '/api/builds') return { status: 200, body: { data: me.id === MEMBER.id ? [MINE] : [] } };
    if (call.method === 'GET' && call.path === '/api/builds?all=true') return { status: 200, body: { data: [MINE, THEIRS] } };
    if (call.method === 'POST' && call.path === '/api/builds') return { status: 201, body: buildFixture(9, call.body as Partial<Build>) };
    return undefined;
  });
}

function renderPage() {
  const queryClient = testQueryClient();
  renderRoutes(queryClient, [{ path: '/builds', loader: buildsLoader(queryClient), Component: BuildsRoute, HydrateFallback: () => null }], '/builds');
  return screen.findByRole('heading', { level: 1 });
}

beforeEach(() => setCsrfToken('tok'));

describe('the builds page', () => {
  it('lists my builds with their assemblies, status and planned dates, and offers to add an assembly', async () => {
    serve(MEMBER);
    expect((await renderPage()).textContent).toBe('My builds');
    const assemblies = within(screen.getByRole('list', { name: 'Assemblies of Two-seat low wing' }));
    expect(assemblies.getByRole('link', { name: 'Rudder' }).getAttribute('href')).toBe('/assemblies/7');
    expect(assemblies.getByText('In progress')).toBeTruthy();
    expect(assemblies.getByText('Jan 10, 2027 to Feb 1, 2027')).toBeTruthy();
    expect(assemblies.getByText('no dates planned')).toBeTruthy();
    expect(screen.getByText('Edge distance floor 0.375 in')).toBeTruthy();
    // Its name starts with the words it shows (WCAG 2.2, success criterion 2.5.3, label in name).
    const add = screen.getByRole('link', { name: 'Add assembly to Two-seat low wing' });
    expect(add.getAttribute('href')).toBe('/builds/1/assemblies/new');
    expect(add.getAttribute('aria-label')).toBeNull();
    expect(screen.queryByLabelText('Show every member’s builds')).toBeNull();
  });

  it('starts a build with the edge distance floor typed in millimetres and kept in inches', async () => {
    const calls = serve(MEMBER, 'mm');
    await renderPage();
    await userEvent.click(screen.getByRole('button', { name: 'New build' }));
    await userEvent.type(screen.getByLabelText('Build name'), 'Trailer skin');
    await userEvent.type(screen.getByLabelText('Edge distance floor (mm, optional)'), '10');
    await userEvent.click(screen.getByRole('button', { name: 'Start the build' }));
    await waitFor(() => expect(calls.filter((c) => c.method === 'POST')).toHaveLength(1));
    const body = calls.find((c) => c.method === 'POST')!.body as { name: string; edgeFloorIn: number };
    expect(body.name).toBe('Trailer skin');
    // 10 mm / 25.4 mm per inch = 0.3937 in (exact by definition of the inch).
    expect(body.edgeFloorIn).toBeCloseTo(0.393701, 6);
  });

  it('lets a quartermaster see every member’s builds with the owner named', async () => {
    serve(QUARTERMASTER);
    await renderPage();
    expect(screen.getByText(/No builds yet/)).toBeTruthy();
    await userEvent.click(screen.getByLabelText('Show every member’s builds'));
    expect(await screen.findByText('Ines Okafor’s build')).toBeTruthy();
    expect(screen.getByRole('heading', { level: 1 }).textContent).toBe('All builds');
    expect(screen.queryByRole('link', { name: 'Add assembly to Tool chest' })).toBeNull();
  });
});
