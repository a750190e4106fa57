import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { setCsrfToken } from '@/lib/api-client';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { fakeFetch, renderWithProviders } from '../helpers/render';

const LEAD = { id: 1, email: 'lead@example.org', name: 'Dana Okafor', role: 'lead' };

beforeEach(() => setCsrfToken(undefined));

describe('SignInForm', () => {
  it('says what is missing without calling the server', async () => {
    const calls = fakeFetch(() => undefined);
    renderWithProviders(<SignInForm onSignedIn={vi.fn()} />);
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Enter your password.')).toBeTruthy();
    expect(screen.getByText(/valid e-mail address/)).toBeTruthy();
    expect(calls).toHaveLength(0);
  });

  it('puts the cursor in the first field to fix, and clears a message once the field is right', async () => {
    fakeFetch(() => undefined);
    renderWithProviders(<SignInForm onSignedIn={vi.fn()} />);
    await userEvent.type(screen.getByLabelText('Password'), 'gripline-demo');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText(/valid e-mail address/)).toBeTruthy();
    expect(document.activeElement).toBe(screen.getByLabelText('E-mail'));
    expect(screen.queryByText('Enter your password.')).toBeNull();
    await userEvent.type(screen.getByLabelText('E-mail'), 'lead@example.org');
    expect(screen.queryByText(/valid e-mail address/)).toBeNull();
  });

  it('fetches a CSRF token, sends it with the sign-in and reports success', async () => {
    const calls = fakeFetch(({ path }) => {
      if (path === '/api/auth/csrf') return { status: 200, body: { token: 'tok-1' } };
      if (path === '/api/auth/login') return { status: 200, body: { user: LEAD, csrfToken: 'tok-2' } };
    });
    const onSignedIn = vi.fn();
    renderWithProviders(<SignInForm onSignedIn={onSignedIn} />);
    await userEvent.type(screen.getByLabelText('E-mail'), 'Lead@Example.org');
    await userEvent.type(screen.getByLabelText('Password'), 'gripline-demo');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    await waitFor(() => expect(onSignedIn).toHaveBeenCalledOnce());
    const login = calls.find((c) => c.path === '/api/auth/login')!;
    expect(login.method).toBe('POST');
    expect(login.headers['X-CSRF-Token']).toBe('tok-1');
    expect(login.body).toEqual({ email: 'lead@example.org', password: 'gripline-demo' });
  });

  it('shows the server message when the credentials are wrong', async () => {
    fakeFetch(({ path }) => {
      if (path === '/api/auth/csrf') return { status: 200, body: { token: 'tok-1' } };
      if (path === '/api/auth/login') {
        return { status: 401, body: { error: { code: 'BAD_CREDENTIALS', message: 'That e-mail and password do not match an account.' } } };
      }
    });
    const onSignedIn = vi.fn();
    renderWithProviders(<SignInForm onSignedIn={onSignedIn} />);
    await userEvent.type(screen.getByLabelText('E-mail'), 'lead@example.org');
    await userEvent.type(screen.getByLabelText('Password'), 'wrong');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('That e-mail and password do not match an account.')).toBeTruthy();
    expect(onSignedIn).not.toHaveBeenCalled();
  });
});
