import { screen, waitFor } from '@testing-library/react';
import type { LoaderFunction } from 'react-router';
import { describe, expect, it, vi } from 'vitest';
import type { Role } from '@shared/roles';
import type { User } from '@shared/schemas/auth';
import { binsLoader } from '@/app/routes/app/bins';
import { forecastLoader } from '@/app/routes/app/forecast';
import { settingsLoader } from '@/app/routes/app/settings';
import { tabLoader, TabRoute } from '@/app/routes/app/tab';
import { RouteError } from '@/app/routes/route-error';
import { renderRoutes, testQueryClient } from '../helpers/render';

const person = (role: Role): User => ({ id: 4, email: 'quinn@example.test', name: 'Quinn Crib', role });

const answer = (status: number, body: unknown) => new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

/**
 * A server whose sign-in check answers slowly (a cold load on hangar Wi-Fi); records when each request
 * starts and when the check answers. Signed out, every data request is refused with a 401 at once.
 */
function slowSignInCheck(user: User | null) {
  const events: string[] = [];
  vi.stubGlobal(
    'fetch',
    vi.fn(async (input: string) => {
      const path = input.split('?')[0];
      events.push(`asked ${path}`);
      if (path === '/api/auth/me') {
        await new Promise((resolve) => setTimeout(resolve, 30));
        events.push('signed-in check answered');
        return answer(200, { user, timeZone: 'America/Chicago' });
      }
      if (!user) return answer(401, { error: { code: 'UNAUTHENTICATED', message: 'Sign in first.' } });
      return answer(200, {});
    }),
  );
  return events;
}

const runLoader = (loader: LoaderFunction, path: string) =>
  Promise.resolve(loader({ request: new Request(`http://localhost${path}`), params: {}, context: undefined, unstable_pattern: path } as never)).catch((err: unknown) => err);

describe('a page loader on a cold load', () => {
  it.each([
    ['My tab', tabLoader, '/tab', 'member', '/api/stock/tab'],
    ['Bins', binsLoader, '/bins', 'member', '/api/bins'],
    ['Forecast', forecastLoader, '/forecast', 'quartermaster', '/api/forecast'],
    ['Settings', settingsLoader, '/settings', 'member', '/api/settings/planning'],
  ] as const)('%s asks for its data while the sign-in check is still out', async (_page, loader, path, role, dataPath) => {
    const events = slowSignInCheck(person(role));
    await runLoader(loader(testQueryClient()), path);
    expect(events).toContain(`asked ${dataPath}`);
    expect(events.indexOf(`asked ${dataPath}`)).toBeLessThan(events.indexOf('signed-in check answered'));
  });

  it('keeps the lead-only figures of Settings behind the check: a member never asks for them', async () => {
    const events = slowSignInCheck(person('member'));
    await runLoader(settingsLoader(testQueryClient()), '/settings');
    expect(events).not.toContain('asked /api/waste');
  });

  it('asks for the lead-only figures of Settings once the check says a lead is signed in', async () => {
    const events = slowSignInCheck(person('lead'));
    await runLoader(settingsLoader(testQueryClient()), '/settings');
    expect(events.indexOf('asked /api/waste')).toBeGreaterThan(events.indexOf('signed-in check answered'));
  });

  it('signed out, sends the person to sign-in even though the data requests were refused first', async () => {
    const events = slowSignInCheck(null);
    const thrown = await runLoader(tabLoader(testQueryClient()), '/tab?paid=1');
    expect(events).toContain('asked /api/stock/tab');
    expect(events.indexOf('asked /api/stock/tab')).toBeLessThan(events.indexOf('signed-in check answered'));
    expect(thrown).toBeInstanceOf(Response);
    expect((thrown as Response).headers.get('Location')).toBe('/sign-in?next=%2Ftab%3Fpaid%3D1');
  });

  it('signed out, a cold load of My tab lands on sign-in, not on the error page', async () => {
    slowSignInCheck(null);
    const queryClient = testQueryClient();
    const router = renderRoutes(
      queryClient,
      [
        { path: '/tab', loader: tabLoader(queryClient), Component: TabRoute, ErrorBoundary: RouteError, HydrateFallback: () => null },
        { path: '/sign-in', Component: () => <h1>Sign in</h1> },
      ],
      '/tab',
    );
    expect(await screen.findByRole('heading', { name: 'Sign in' })).toBeTruthy();
    await waitFor(() => expect(router.state.location.pathname).toBe('/sign-in'));
    expect(screen.queryByRole('alert')).toBeNull();
  });

  it('signed in with too small a role, shows the role refusal rather than a refused data request', async () => {
    slowSignInCheck(person('member'));
    const thrown = await runLoader(forecastLoader(testQueryClient()), '/forecast');
    expect(thrown).toMatchObject({ init: { status: 403 }, data: { message: 'Only a quartermaster can open this page.' } });
  });
});
