import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeEach, describe, expect, it } from 'vitest';
import { BinDetailRoute, binDetailLoader } from '@/app/routes/app/bin-detail';
import { ToolDetailRoute, toolDetailLoader } from '@/app/routes/app/tool-detail';
import { RouteError } from '@/app/routes/route-error';
import { setCsrfToken } from '@/lib/api-client';
import { fakeFetch, renderRoutes, testQueryClient } from '../helpers/render';

const ME = { user: { id: 2, name: 'Ruth Lindqvist', email: 'member@example.org', role: 'member' }, timeZone: 'America/Chicago' };

/** A server that knows nobody's codes: every tool and bin answers 404 with the server's own sentence. */
function serveUnknownCodes() {
  return fakeFetch((call) => {
    if (call.path === '/api/auth/me') return { status: 200, body: ME };
    const tool = /^\/api\/tools\/([^/?]+)$/.exec(call.path);
    if (tool) return { status: 404, body: { error: { code: 'TOOL_NOT_FOUND', message: `No tool has the code ${tool[1]}. Check the label, or type the code.` } } };
    const bin = /^\/api\/bins\/([^/?]+)$/.exec(call.path);
    if (bin) return { status: 404, body: { error: { code: 'BIN_NOT_FOUND', message: `No bin has the code ${bin[1]}. Check the label, or type the code.` } } };
    return undefined;
  });
}

function open(path: string) {
  const queryClient = testQueryClient();
  return renderRoutes(
    queryClient,
    [
      { path: '/tools/:code', loader: toolDetailLoader(queryClient), Component: ToolDetailRoute, ErrorBoundary: RouteError, HydrateFallback: () => null },
      { path: '/bins/:code', loader: binDetailLoader(queryClient), Component: BinDetailRoute, ErrorBoundary: RouteError, HydrateFallback: () => null },
      { path: '/scan', element: <p>scan page</p> },
    ],
    path,
  );
}

beforeEach(() => setCsrfToken('tok'));

describe('a scanned code that no tool or bin has', () => {
  it('says the tool code was not found, not that something went wrong, and offers Scan again and typing the code', async () => {
    serveUnknownCodes();
    const router = open('/tools/T-9999');
    expect((await screen.findByRole('heading', { level: 1 })).textContent).toBe('Code not found');
    expect(screen.queryByText('Something went wrong')).toBeNull();
    expect(screen.getByText('No tool has the code T-9999. Check the label, or type the code.')).toBeTruthy();
    expect(screen.getByRole('link', { name: 'Scan again' }).getAttribute('href')).toBe('/scan');
    await userEvent.type(screen.getByLabelText('Or type the code on the label'), 'b-0107{Enter}');
    await screen.findByText('No bin has the code B-0107. Check the label, or type the code.');
    expect(router.state.location.pathname).toBe('/bins/B-0107');
  });

  it('says so for a bin code too, and names both kinds of code when the typed one is not a label', async () => {
    serveUnknownCodes();
    const router = open('/bins/B-9999');
    await screen.findByText('No bin has the code B-9999. Check the label, or type the code.');
    await userEvent.type(screen.getByLabelText('Or type the code on the label'), 'hello{Enter}');
    expect(screen.getByText(/Tool codes look like T-0042, bin codes like B-0107/)).toBeTruthy();
    expect(router.state.location.pathname).toBe('/bins/B-9999');
    await userEvent.click(screen.getByRole('link', { name: 'Scan again' }));
    expect(await screen.findByText('scan page')).toBeTruthy();
  });
});
