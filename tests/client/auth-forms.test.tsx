import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { ReactNode } from 'react';
import { MemoryRouter } from 'react-router-dom';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { ResetPasswordForm } from '@/features/auth/components/reset-password-form';
import { SignInForm } from '@/features/auth/components/sign-in-form';

function wrap(children: ReactNode) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  return render(
    <QueryClientProvider client={client}>
      <MemoryRouter>{children}</MemoryRouter>
    </QueryClientProvider>,
  );
}

function replyWith(status: number, body: unknown, headers: Record<string, string> = {}) {
  const fetchMock = vi.fn(
    async () =>
      new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json', ...headers } }),
  );
  vi.stubGlobal('fetch', fetchMock);
  return fetchMock;
}

afterEach(() => vi.unstubAllGlobals());

describe('sign-in form', () => {
  it('when the server refuses with 429 and Retry-After, then the page says in how many minutes to try again', async () => {
    replyWith(
      429,
      { error: { code: 'TOO_MANY_ATTEMPTS', message: 'Too many failed sign-ins.' } },
      { 'Retry-After': '781' },
    );
    wrap(<SignInForm onSignedIn={() => undefined} />);
    await userEvent.type(screen.getByLabelText('E-mail'), 'ned@saltmarsh-guild.test');
    await userEvent.type(screen.getByLabelText('Password'), 'a-wrong-guess');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('Too many attempts. Try again in 14 minutes.')).toBeInTheDocument();
  });
});

describe('reset-password form', () => {
  it('when the new password is shorter than 10 characters, then the form says so and sends nothing', async () => {
    const fetchMock = replyWith(204, {});
    wrap(<ResetPasswordForm token="abc" />);
    await userEvent.type(screen.getByLabelText('New password'), 'nine-char');
    await userEvent.type(screen.getByLabelText('New password again'), 'nine-char');
    await userEvent.click(screen.getByRole('button', { name: 'Set new password' }));
    expect(await screen.findByText('Use at least 10 characters.')).toBeInTheDocument();
    // The only call is the page's check that the link is still open; no new password was sent.
    const methods = fetchMock.mock.calls.map((call) => (call as unknown as [string, RequestInit])[1]?.method);
    expect(methods).not.toContain('POST');
  });

  it('when the link has been used, then the page says so on arrival and offers a way of asking for a new one', async () => {
    replyWith(410, {
      error: { code: 'RESET_LINK_GONE', message: 'This link has already been used or is more than an hour old.' },
    });
    wrap(<ResetPasswordForm token="spent" />);
    expect(await screen.findByText('This link no longer works')).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Ask for a new link' })).toHaveAttribute('href', '/forgot-password');
  });
});
