import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { act, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { MemoryRouter, useLocation } from 'react-router-dom';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { authKeys } from '@/features/auth/api/auth-keys';
import { CalculatorWidget } from '@/features/calculators/components/calculator-widget';
import { fakeServer, ned, resultOf } from './calculator-support';

vi.setConfig({ testTimeout: 30_000 });
afterEach(() => vi.unstubAllGlobals());

function Address() {
  return <output data-testid="address">{useLocation().search}</output>;
}

function renderInLesson(name: string) {
  const client = new QueryClient();
  client.setQueryData(authKeys.me, ned);
  render(
    <QueryClientProvider client={client}>
      <MemoryRouter initialEntries={['/courses/going-train-wall-regulator/broaching?step=2']}>
        <CalculatorWidget name={name} />
        <Address />
      </MemoryRouter>
    </QueryClientProvider>,
  );
}

describe('calculator widget', () => {
  it('when a lesson embeds a calculator by name, then it computes as you type and leaves the page address alone', async () => {
    fakeServer();
    // The calculator's own chunk arrives after the lesson's text; rendering suspends until it has.
    await act(async () => renderInLesson('broach-taper'));
    expect(await screen.findByText('Broach taper calculator', {}, { timeout: 15_000 })).toBeInTheDocument();
    // The lesson's five-sided broach example (computed in tests/shared/calc/broach-taper.test.ts)
    expect(resultOf('Insertion depth')).toBe('23.49 mm');
    const target = screen.getByRole('textbox', { name: /Target hole diameter/ });
    await userEvent.clear(target);
    await userEvent.type(target, '1.1');
    // 1.1 mm at mid-plate: entry 1.1221 mm, read 1.01495 mm at the mark, (1.01495 − 0.5) / 0.02 = 25.75 mm (computed)
    expect(resultOf('Insertion depth')).toBe('25.75 mm');
    expect(screen.getByTestId('address').textContent).toBe('?step=2');
    expect(screen.getByRole('link', { name: /Open on its own page/ })).toHaveAttribute(
      'href',
      '/calculators/broach-taper',
    );
  });

  it('when the name is not a calculator, then the widget says so instead of failing the lesson', () => {
    fakeServer();
    renderInLesson('escapement');
    expect(screen.getByText('There is no calculator called “escapement”.')).toBeInTheDocument();
  });
});
