import { screen } from '@testing-library/react';
import { data, Outlet } from 'react-router';
import { describe, expect, it } from 'vitest';
import { RouteError } from '@/app/routes/route-error';
import { MainLandmark } from '@/components/ui/main-landmark';
import { renderRoutes, testQueryClient } from '../helpers/render';

function renderNotFound(shell: boolean) {
  const missing = {
    path: 'tools/:code',
    loader: () => {
      throw data({ message: 'No tool has the code NOPE.' }, { status: 404 });
    },
    Component: () => null,
    ErrorBoundary: RouteError,
  };
  const routes = shell
    ? [{ path: '/', element: <MainLandmark id="main"><Outlet /></MainLandmark>, children: [missing] }]
    : [{ ...missing, path: '/tools/:code' }];
  renderRoutes(testQueryClient(), routes, '/tools/NOPE');
}

describe('a page that is not found', () => {
  it('inside the app shell keeps the one main landmark of the shell', async () => {
    renderNotFound(true);
    expect(await screen.findByRole('heading', { name: 'Page not found' })).toBeTruthy();
    expect(screen.getAllByRole('main')).toHaveLength(1);
    expect(screen.getByRole('main').id).toBe('main');
  });

  it('outside the shell is a main landmark of its own', async () => {
    renderNotFound(false);
    expect(await screen.findByRole('heading', { name: 'Page not found' })).toBeTruthy();
    expect(screen.getAllByRole('main')).toHaveLength(1);
  });
});
