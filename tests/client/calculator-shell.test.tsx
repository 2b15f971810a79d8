import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { broachTaperForm } from '@/features/calculators/forms/broach-taper';
import { fakeServer, ned, renderCalculator, resultOf } from './calculator-support';

// Typing key by key through the router is slow under jsdom; the figures, not the speed, are under test here.
vi.setConfig({ testTimeout: 30_000 });
afterEach(() => vi.unstubAllGlobals());

const field = (name: RegExp) => screen.getByRole('textbox', { name });

describe('calculator shell (broach taper)', () => {
  it('when a target diameter is typed, then the insertion depth follows at once and the address keeps the inputs', async () => {
    fakeServer();
    renderCalculator(broachTaperForm);
    // TRADE.md §1: k = 1/50, broach 0.50 mm, target 1.05 mm -> 27.5 mm (computed)
    expect(resultOf('Insertion depth')).toBe('27.5 mm');
    await userEvent.clear(field(/Target hole diameter/));
    await userEvent.type(field(/Target hole diameter/), '1.2');
    // (1.2 − 0.5) / 0.02 = 35 mm (computed)
    expect(resultOf('Insertion depth')).toBe('35 mm');
    expect(screen.getByTestId('address').textContent).toContain('targetDiameterMm=1.2');
  });

  it('when the page opens from a shared address, then it shows that address’s inputs and results', () => {
    fakeServer();
    renderCalculator(broachTaperForm, { search: '?taperPerMm=0.0077&targetDiameterMm=1.05&refDiameterMm=0.5' });
    // TRADE.md §1: k = 0.0077, tip 0.50 mm, target 1.05 mm -> 71.4 mm (computed)
    expect(resultOf('Insertion depth')).toBe('71.43 mm');
    expect(field(/Taper of the broach/)).toHaveValue('0.0077');
  });

  it('when an input is not a number or out of range, then the field says so and no NaN or Infinity is shown', async () => {
    fakeServer();
    renderCalculator(broachTaperForm);
    await userEvent.clear(field(/Plate thickness/));
    await userEvent.type(field(/Plate thickness/), 'abc');
    expect(field(/Plate thickness/)).toHaveAttribute('aria-invalid', 'true');
    expect(screen.getByText('Enter a number.')).toBeInTheDocument();
    expect(screen.queryByText('Insertion depth')).not.toBeInTheDocument();
    expect(screen.getByText('Correct the marked inputs to see the results.')).toBeInTheDocument();
    await userEvent.clear(field(/Plate thickness/));
    await userEvent.type(field(/Plate thickness/), '0');
    expect(screen.getByText('Enter at least 0.01 mm.')).toBeInTheDocument();
    expect(document.body.textContent).not.toMatch(/NaN|Infinity/);
    expect(screen.getByRole('button', { name: 'Save result' })).toBeDisabled();
  });

  it('when imperial is chosen, then lengths show in inches, the account keeps the choice, and inches typed compute in mm', async () => {
    const server = fakeServer();
    renderCalculator(broachTaperForm);
    await userEvent.click(screen.getByRole('radio', { name: /Imperial/ }));
    // 1.05 mm / 25.4 = 0.041338583 in, shown to 5 figures as 0.041339; 27.5 mm / 25.4 = 1.083 in (computed)
    expect(field(/Target hole diameter/)).toHaveValue('0.041339');
    expect(resultOf('Insertion depth')).toBe('1.083 in');
    await waitFor(() =>
      expect(server).toHaveBeenCalledWith(
        '/api/account',
        expect.objectContaining({ method: 'PATCH', body: JSON.stringify({ unitSystem: 'imperial' }) }),
      ),
    );
    await userEvent.clear(field(/Target hole diameter/));
    await userEvent.type(field(/Target hole diameter/), '0.05');
    // 0.05 in = 1.27 mm; (1.27 − 0.5) / 0.02 = 38.5 mm = 1.516 in (computed)
    expect(resultOf('Insertion depth')).toBe('1.516 in');
    expect(screen.getByTestId('address').textContent).toContain('targetDiameterMm=1.27');
    await userEvent.click(screen.getByRole('radio', { name: /Metric/ }));
    expect(field(/Target hole diameter/)).toHaveValue('1.27');
    expect(resultOf('Insertion depth')).toBe('38.5 mm');
  });

  it('when the taper is given as a ratio or as two readings, then it gives the same depth as typing it', async () => {
    fakeServer();
    renderCalculator(broachTaperForm);
    await userEvent.click(screen.getByRole('radio', { name: 'Ratio' }));
    expect(field(/Taper as a ratio/)).toHaveValue('1:50');
    expect(resultOf('Insertion depth')).toBe('27.5 mm'); // TRADE.md §1 (computed)
    await userEvent.clear(field(/Taper as a ratio/));
    await userEvent.type(field(/Taper as a ratio/), '1:130');
    // (1.05 − 0.50) × 130 = 71.5 mm (computed)
    expect(resultOf('Insertion depth')).toBe('71.5 mm');
    await userEvent.clear(field(/Taper as a ratio/));
    await userEvent.type(field(/Taper as a ratio/), 'fifty');
    expect(screen.getByText('Write the taper as 1:50, 1/50 or a plain number.')).toBeInTheDocument();
    await userEvent.click(screen.getByRole('radio', { name: 'Two readings' }));
    await userEvent.type(field(/Diameter, first station/), '0.5');
    await userEvent.type(field(/Diameter, second station/), '1');
    // 0.50 and 1.00 mm over 25 mm: k = 0.02, about 1:50 (computed)
    expect(resultOf('Insertion depth')).toBe('27.5 mm');
    expect(screen.getByText('1:50')).toBeInTheDocument();
  });

  it('when an apprentice saves, then the title and inputs are sent and never any result', async () => {
    const server = fakeServer();
    renderCalculator(broachTaperForm);
    await userEvent.click(screen.getByRole('button', { name: 'Save result' }));
    const title = screen.getByRole('textbox', { name: 'Title for this result' });
    expect(title).toHaveValue('Broach taper');
    await userEvent.clear(title);
    await userEvent.type(title, 'Centre wheel, front plate');
    await userEvent.click(screen.getByRole('button', { name: 'Save' }));
    expect(await screen.findByRole('link', { name: 'See your saved results' })).toBeInTheDocument();
    const post = server.mock.calls.find(([url, init]) => url === '/api/calculations' && init?.method === 'POST');
    expect(JSON.parse(String(post?.[1]?.body))).toEqual({
      calculator: 'broach-taper',
      title: 'Centre wheel, front plate',
      inputs: { taperPerMm: 0.02, refDiameterMm: 0.5, targetDiameterMm: 1.05, plateThicknessMm: 2, pivotDiameterMm: 1 },
    });
  });

  it('when a mentor uses a calculator, then it works but offers no saving', () => {
    fakeServer();
    renderCalculator(broachTaperForm, { user: { ...ned, id: 3, role: 'mentor' } });
    expect(resultOf('Insertion depth')).toBe('27.5 mm');
    expect(screen.queryByRole('button', { name: 'Save result' })).not.toBeInTheDocument();
    expect(
      within(screen.getByRole('complementary', { name: 'Caution at the bench' })).getByText(/glass-hard/),
    ).toBeInTheDocument();
  });
});
