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
    // The lesson's five-sided broach: k = 0.02 read corner to flat, 0.50 mm at the mark, 1.05 mm at mid-plate of a
    // 2 mm plate -> 23.49 mm (computed; worked out in tests/shared/calc/broach-taper.test.ts)
    expect(resultOf('Insertion depth')).toBe('23.49 mm');
    await userEvent.selectOptions(
      screen.getByRole('combobox', { name: /Section of the cutting broach/ }),
      'Round, or readings already cutting diameters',
    );
    // Round: (1.05 − 0.5) / 0.02 + 2/2 = 28.5 mm (computed)
    expect(resultOf('Insertion depth')).toBe('28.5 mm');
    await userEvent.clear(field(/Target hole diameter/));
    await userEvent.type(field(/Target hole diameter/), '1.2');
    // (1.2 − 0.5) / 0.02 + 2/2 = 36 mm (computed)
    expect(resultOf('Insertion depth')).toBe('36 mm');
    expect(screen.getByTestId('address').textContent).toContain('targetDiameterMm=1.2');
  });

  it('when the page opens from a shared address, then it shows that address’s inputs and results', () => {
    fakeServer();
    renderCalculator(broachTaperForm, {
      search: '?broachSides=0&taperPerMm=0.0077&targetDiameterMm=1.05&refDiameterMm=0.5',
    });
    // TRADE.md §1: k = 0.0077, tip 0.50 mm, target 1.05 mm -> 71.43 mm to the face, + 1 mm to mid-plate (computed)
    expect(resultOf('Insertion depth')).toBe('72.43 mm');
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
    // 1.05 mm / 25.4 = 0.041338583 in, shown to 5 figures as 0.041339; 23.487 mm / 25.4 = 0.9247 in (computed)
    expect(field(/Target hole diameter/)).toHaveValue('0.041339');
    expect(resultOf('Insertion depth')).toBe('0.9247 in');
    await waitFor(() =>
      expect(server).toHaveBeenCalledWith(
        '/api/account',
        expect.objectContaining({ method: 'PATCH', body: JSON.stringify({ unitSystem: 'imperial' }) }),
      ),
    );
    await userEvent.clear(field(/Target hole diameter/));
    await userEvent.type(field(/Target hole diameter/), '0.05');
    // 0.05 in = 1.27 mm at mid-plate; five-sided broach: 33.436 mm = 1.316 in (computed)
    expect(resultOf('Insertion depth')).toBe('1.316 in');
    expect(screen.getByTestId('address').textContent).toContain('targetDiameterMm=1.27');
    await userEvent.click(screen.getByRole('radio', { name: /Metric/ }));
    expect(field(/Target hole diameter/)).toHaveValue('1.27');
    expect(resultOf('Insertion depth')).toBe('33.44 mm');
  });

  it('when the taper is given as a ratio or as two readings, then it gives the same depth as typing it', async () => {
    fakeServer();
    renderCalculator(broachTaperForm);
    await userEvent.click(screen.getByRole('radio', { name: 'Ratio' }));
    expect(field(/Taper as a ratio/)).toHaveValue('1:50');
    expect(resultOf('Insertion depth')).toBe('23.49 mm'); // the same k = 0.02 as typed (computed)
    await userEvent.clear(field(/Taper as a ratio/));
    await userEvent.type(field(/Taper as a ratio/), '1:130');
    // Five-sided, k = 1/130: (1.0585/1.10557 − 0.50) × 130 = 59.47 mm (computed)
    expect(resultOf('Insertion depth')).toBe('59.47 mm');
    await userEvent.clear(field(/Taper as a ratio/));
    await userEvent.type(field(/Taper as a ratio/), 'fifty');
    expect(screen.getByText('Write the taper as 1:50, 1/50 or a plain number.')).toBeInTheDocument();
    await userEvent.click(screen.getByRole('radio', { name: 'Two readings' }));
    await userEvent.type(field(/Diameter, first station/), '0.5');
    await userEvent.type(field(/Diameter, second station/), '1');
    // 0.50 and 1.00 mm over 25 mm: k = 0.02, about 1:50 (computed)
    expect(resultOf('Insertion depth')).toBe('23.49 mm');
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
      inputs: {
        taperPerMm: 0.02,
        refDiameterMm: 0.5,
        targetDiameterMm: 1.05,
        plateThicknessMm: 2,
        pivotDiameterMm: 1,
        broachSides: 5,
        openedFrom: 'both',
      },
    });
  });

  it('when a mentor uses a calculator, then it works but offers no saving', () => {
    fakeServer();
    renderCalculator(broachTaperForm, { user: { ...ned, id: 3, role: 'mentor' } });
    expect(resultOf('Insertion depth')).toBe('23.49 mm');
    expect(screen.queryByRole('button', { name: 'Save result' })).not.toBeInTheDocument();
    expect(
      within(screen.getByRole('complementary', { name: 'Caution at the bench' })).getByText(/glass-hard/),
    ).toBeInTheDocument();
  });
});
