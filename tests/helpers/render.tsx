import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import type { ReactElement } from 'react';
import { createMemoryRouter, RouterProvider, type RouteObject } from 'react-router';
import { vi } from 'vitest';
import { createQueryClient } from '@/app/provider';

/**
 * The app's own QueryClient (so a mutation refreshes what its meta declares), fresh, never
 * retrying and never holding an answer fresh, so a failing fake answer shows at once.
 */
export function testQueryClient(): QueryClient {
  const queryClient = createQueryClient();
  queryClient.setDefaultOptions({ queries: { retry: false }, mutations: { retry: false } });
  return queryClient;
}

/** Renders `routes` in a memory router opened at `path`, inside `queryClient`; the router lets a test see where it went. */
export function renderRoutes(queryClient: QueryClient, routes: RouteObject[], path: string) {
  const router = createMemoryRouter(routes, { initialEntries: [path] });
  render(
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
  return router;
}

/** Renders a component inside a fresh QueryClient and a memory router. */
export function renderWithProviders(ui: ReactElement, path = '/') {
  const queryClient = testQueryClient();
  const router = createMemoryRouter([{ path: '*', element: ui }], { initialEntries: [path] });
  return {
    queryClient,
    ...render(
      <QueryClientProvider client={queryClient}>
        <RouterProvider router={router} />
      </QueryClientProvider>,
    ),
  };
}

export interface FakeCall {
  method: string;
  path: string;
  headers: Record<string, string>;
  body: unknown;
}

type Responder = (call: FakeCall) => { status: number; body?: unknown } | undefined;

/** Replaces fetch with a fake server; records every call. */
export function fakeFetch(responder: Responder) {
  const calls: FakeCall[] = [];
  const fn = vi.fn((input: string, init: RequestInit = {}) => {
    const call: FakeCall = {
      method: init.method ?? 'GET',
      path: input,
      headers: (init.headers ?? {}) as Record<string, string>,
      body: typeof init.body === 'string' ? JSON.parse(init.body) : undefined,
    };
    calls.push(call);
    const answer = responder(call) ?? { status: 404, body: { error: { code: 'NOT_FOUND', message: 'not faked' } } };
    return Promise.resolve(
      new Response(answer.status === 204 ? null : JSON.stringify(answer.body), {
        status: answer.status,
        headers: { 'Content-Type': 'application/json' },
      }),
    );
  });
  vi.stubGlobal('fetch', fn);
  return calls;
}
