import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import { MemoryRouter, Route, Routes, useLocation } from 'react-router-dom';
import { vi } from 'vitest';
import type { UserDTO } from '@shared/schemas/user';
import { authKeys } from '@/features/auth/api/auth-keys';
import { CalculatorShell } from '@/features/calculators/components/calculator-shell';
import type { AnyCalculatorForm } from '@/features/calculators/lib/define-form';

export const ned: UserDTO = {
  id: 7,
  name: 'Ned Pellow',
  email: 'ned@saltmarsh-guild.test',
  role: 'apprentice',
  unitSystem: 'metric',
};

function Address() {
  return <output data-testid="address">{useLocation().search}</output>;
}

/** A calculator page as the router shows it, for a signed-in user whose account the test chooses. */
export function renderCalculator(form: AnyCalculatorForm, { user = ned, search = '' } = {}) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  client.setQueryData(authKeys.me, user);
  const path = `/calculators/${form.calculator.name}`;
  render(
    <QueryClientProvider client={client}>
      <MemoryRouter initialEntries={[`${path}${search}`]}>
        <Routes>
          <Route
            path="/calculators/:name"
            element={
              <>
                <CalculatorShell form={form} syncUrl />
                <Address />
              </>
            }
          />
        </Routes>
      </MemoryRouter>
    </QueryClientProvider>,
  );
  return { client };
}

/** Answers every request with the user's account as the server would store it, and records what was sent. */
export function fakeServer(user: UserDTO = ned) {
  let current = user;
  const fetchMock = vi.fn(async (url: string, init?: RequestInit) => {
    const body = init?.body ? JSON.parse(String(init.body)) : undefined;
    if (url === '/api/account' && init?.method === 'PATCH') current = { ...current, ...body };
    const reply =
      url === '/api/calculations' && init?.method === 'POST'
        ? { id: 1, userId: current.id, ...body, results: {}, warnings: [], createdAt: new Date().toISOString() }
        : { user: current };
    return new Response(JSON.stringify(reply), {
      status: init?.method === 'POST' ? 201 : 200,
      headers: { 'Content-Type': 'application/json' },
    });
  });
  vi.stubGlobal('fetch', fetchMock);
  return fetchMock;
}

/** The figure beside a result's name, as the user reads it (value and unit). */
export function resultOf(label: string): string {
  const term = screen.getByText(label, { selector: 'dt' });
  return (term.nextElementSibling?.textContent ?? '').replace(/\s+/g, ' ').trim();
}
