import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { fireEvent, render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { MemoryRouter } from 'react-router-dom';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { CalculatorName } from '@shared/calc/names';
import { authKeys } from '@/features/auth/api/auth-keys';
import { CalculatorShell } from '@/features/calculators/components/calculator-shell';
import { FORMS } from '@/features/calculators/forms';

function renderForm(name: CalculatorName) {
  const form = FORMS[name];
  if (!form) throw new Error(`no form for ${name}`);
  const client = new QueryClient({ defaultOptions: { queries: { retry: false, staleTime: Infinity } } });
  // Nobody signed in: the unit choice stays on the page and nothing is fetched.
  client.setQueryData(authKeys.me, null);
  return render(
    <QueryClientProvider client={client}>
      <MemoryRouter>
        <CalculatorShell form={form} />
      </MemoryRouter>
    </QueryClientProvider>,
  );
}

/** Replaces a field's text the way a user would: select all, type anew. */
async function retype(field: HTMLElement, text: string) {
  await userEvent.clear(field);
  if (text) await userEvent.type(field, text);
}

/** The figure beside a result's name in the results list (the working below repeats the names). */
function figure(label: string): string {
  const dt = screen.getAllByText(label).find((el) => el.tagName === 'DT');
  if (!dt) throw new Error(`no result named ${label}`);
  return dt.nextElementSibling?.textContent ?? '';
}

afterEach(() => {
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

describe('dividing form', () => {
  it('when 127 divisions are asked of the Brown & Sharpe plates, then the page says it is not possible with these circles', async () => {
    // TRADE.md §7: 127 has no plain solution on either plate (computed)
    renderForm('dividing');
    await retype(screen.getByLabelText('Divisions (teeth to cut)'), '127');
    const notice = await screen.findByRole('alert', { name: '' });
    expect(within(notice).getByText('Not possible with these circles')).toBeInTheDocument();
    expect(notice).toHaveTextContent('a multiple of 127');
    expect(screen.queryByTestId('indexing-row')).not.toBeInTheDocument();
  });

  it('when 64 divisions are asked, then the smallest circle is 10 holes on the 16 circle', async () => {
    // TRADE.md §7: 64 → 10/16 (B&S) (computed)
    renderForm('dividing');
    const rows = await screen.findAllByTestId('indexing-row');
    expect(rows[0]).toHaveTextContent('10/16');
    expect(screen.getByText(/set the sector arms 10 spaces apart/)).toBeInTheDocument();
  });

  it('when the own circles hold a word, then the field names the bad circle and no result is shown', async () => {
    renderForm('dividing');
    await userEvent.selectOptions(screen.getByLabelText('Hole circles'), 'own');
    await retype(screen.getByLabelText('Your hole circles'), '24, twenty');
    expect(await screen.findByText('Hole circle 2: Enter a number.')).toBeInTheDocument();
    expect(document.body.textContent).not.toMatch(/NaN|Infinity/);
  });
});

describe('planting form', () => {
  it('when an arbor is asked to sit at distances the circles cannot meet, then the reason is shown instead of a point', async () => {
    // ANU "Intersection between two circles (3)": no solution if d > r₀ + r₁
    renderForm('planting');
    const escape = screen.getAllByTestId('arbor-editor')[2];
    const [toCentre, toThird] = within(escape).getAllByLabelText(/^Centre distance to it/);
    await retype(toCentre, '5');
    await retype(toThird, '30');
    const problem = await screen.findByTestId('planting-problem');
    expect(problem).toHaveTextContent('Escape');
    expect(problem).toHaveTextContent('more than 5 + 30 = 35 mm: the circles do not meet');
    expect(screen.getAllByTestId('drilling-row').map((r) => r.textContent)).not.toContain(
      expect.stringContaining('Escape'),
    );
  });

  it('when the example layout is shown, then the escape arbor lies 25 mm from the centre and 30 mm from the third', async () => {
    // TRADE.md §8: C at 25 from A(0,0) and 30 from B(40,0) is (16.5625, 18.7265) (computed); here A sits at (40, 40)
    renderForm('planting');
    const escape = screen.getAllByTestId('drilling-row').find((r) => r.textContent?.startsWith('Escape'));
    expect(escape).toHaveTextContent('56.5625');
    expect(escape).toHaveTextContent('58.7265');
  });

  it('when Download SVG is pressed, then a planting-<date>.svg file with the arbors and circles is handed to the browser', async () => {
    const blobs: Blob[] = [];
    vi.stubGlobal(
      'URL',
      Object.assign(URL, { createObjectURL: (b: Blob) => (blobs.push(b), 'blob:x'), revokeObjectURL: () => undefined }),
    );
    const clicked: string[] = [];
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      clicked.push(this.download);
    });
    renderForm('planting');
    fireEvent.click(screen.getByRole('button', { name: 'Download SVG' }));
    expect(clicked[0]).toMatch(/^planting-\d{4}-\d{2}-\d{2}\.svg$/);
    const text = await blobs[0].text();
    expect(text.startsWith('<svg')).toBe(true);
    expect(text).toContain('width="');
    expect(text).toMatch(/width="[\d.]+mm"/);
    for (const name of ['Centre', 'Third', 'Escape']) expect(text).toContain(`>${name}</text>`);
    expect(text).toContain('<circle');
    expect(text).not.toContain('class=');
  });
});

describe('fusee form', () => {
  it('when five adjusting-rod readings are entered, then the radii table gives one radius per turn', async () => {
    // TRADE.md §6: T = 900/750/600/450 N·mm → r = 5.0/6.0/7.5/10.0 mm from the largest radius alone (computed); the
    // same weight at 45, 60, 75, 90 and 112.5 mm gives torques in that proportion, and 112.5 mm gives 4 mm (computed).
    // Radii show to 0.01 mm, what a fusee is cut to.
    renderForm('fusee');
    fireEvent.click(screen.getByRole('button', { name: 'Clear the example' }));
    expect(screen.queryByText('Example readings')).not.toBeInTheDocument();
    const distances = ['45', '60', '75', '90', '112.5'];
    for (const [i, x] of distances.entries()) {
      fireEvent.change(screen.getByLabelText(`Turn ${i + 1} weight (g)`), { target: { value: '100' } });
      fireEvent.change(screen.getByLabelText(`Turn ${i + 1} balance distance (mm)`), { target: { value: x } });
    }
    fireEvent.change(screen.getByLabelText(/^Largest fusee radius/), { target: { value: '10' } });
    const rows = await screen.findAllByTestId('radius-row');
    expect(rows).toHaveLength(5);
    expect(rows.map((r) => r.querySelectorAll('td')[3].textContent)).toEqual(['10.00', '7.50', '6.00', '5.00', '4.00']);
    expect(figure('Spread of the torque')).toMatch(/→ 0 %$/);
  });

  it('when the page opens, then the readings are the labelled example, and a blank reading cell is reported not plotted', async () => {
    renderForm('fusee');
    expect(screen.getByText('Example readings')).toBeInTheDocument();
    await userEvent.clear(screen.getByLabelText('Turn 2 weight (g)'));
    expect(await screen.findByText('Enter a number.')).toBeInTheDocument();
    expect(screen.queryByTestId('radius-row')).not.toBeInTheDocument();
    expect(document.body.textContent).not.toMatch(/NaN|Infinity/);
  });
});

describe('unit toggle on the row editors', () => {
  it('when inches and ounces are chosen, then the readings and radii are shown in them and typed inches are kept as mm', async () => {
    // 1 in = 25.4 mm and 1 oz = 28.349523125 g (definitions, from memory)
    renderForm('fusee');
    fireEvent.click(screen.getByLabelText(/Imperial/));
    const weight = screen.getByLabelText('Turn 1 weight (oz)');
    expect(weight).toHaveValue('7.0548'); // 200 g / 28.349523125 = 7.0547924 oz, shown to 5 figures (computed)
    expect(screen.getByRole('columnheader', { name: 'Fusee radius (in)' })).toBeInTheDocument();
    // The first radius is the largest, 10 mm: 0.3937 in, to 0.0001 in (computed)
    expect(screen.getAllByTestId('radius-row')[0].querySelectorAll('td')[3]).toHaveTextContent('0.3937');
    fireEvent.change(screen.getByLabelText('Turn 1 balance distance (in)'), { target: { value: '2' } });
    fireEvent.click(screen.getByLabelText(/Metric/));
    expect(screen.getByLabelText('Turn 1 balance distance (mm)')).toHaveValue('50.8');
  });
});

describe('wheel and pinion form', () => {
  it('when module 0.5 with 64 teeth and 8 leaves is shown, then the centre distance is 18 mm and the mesh is drawn', async () => {
    // TRADE.md §4: m = 0.5, 64 : 8 → a = 18.00 mm; wheel blank 33.38 mm (forum rule) (computed)
    renderForm('wheel-pinion');
    expect(figure('Centre distance')).toBe('18\u00a0mm');
    expect(figure('Wheel blank diameter')).toBe('33.38\u00a0mm');
    expect(screen.getByTestId('mesh-drawing')).toHaveAccessibleName(/centre distance 18\smm/);
    expect(screen.getByText('unverified')).toBeInTheDocument();
  });

  it('when a lantern trundle wider than the tooth space is given, then the check says it does not fit', async () => {
    // TRADE.md §4: a trundle must be narrower than the tooth space πm/2 = 0.785 mm at m = 0.5 (computed)
    renderForm('wheel-pinion');
    fireEvent.click(screen.getByLabelText('Lantern pinion'));
    expect(await screen.findByText(/A lantern pinion needs the trundle diameter|Enter a number/)).toBeInTheDocument();
    await userEvent.type(screen.getByLabelText(/^Trundle diameter/), '0.9');
    expect(figure('Trundle in the tooth space')).toBe('does not fit');
    await retype(screen.getByLabelText(/^Trundle diameter/), '0.78');
    // 0.785 − 0.78 = 0.005 mm of play, under a tenth of the tooth space (computed): not "fits"
    expect(figure('Trundle in the tooth space')).toBe('too tight');
    await retype(screen.getByLabelText(/^Trundle diameter/), '0.7');
    expect(figure('Trundle in the tooth space')).toBe('fits');
  });
});

describe('train and pendulum form', () => {
  it('when the starting train is shown, then it beats 3600 an hour and a suggested train can be put into the rows', async () => {
    // TRADE.md §5: 80/12 × 72/8 × 30 × 2 = 3600 BPH (computed)
    renderForm('train-pendulum');
    expect(figure('Beats per hour')).toBe('3600\u00a0beats/h');
    await userEvent.type(screen.getByLabelText(/^Find trains for this beat/), '5400');
    const use = await screen.findAllByRole('button', { name: /^Use the train/ });
    fireEvent.click(use[0]);
    expect(figure('Beats per hour')).toBe('5400\u00a0beats/h');
  });

  it('when a uniform rod of 1.5 m is checked, then its equivalent simple length is 1000 mm', async () => {
    // HyperPhysics "Rod pendulum": uniform rod 1.5 m → L_eq = 1.000 m, T = 2.00641 s
    renderForm('train-pendulum');
    fireEvent.click(screen.getByLabelText('Uniform rod'));
    expect(figure("Your pendulum's equivalent simple length")).toBe('1000.0\u00a0mm'); // to 0.1 mm, what is measured
    expect(figure("Your pendulum's full period")).toBe('2.00641\u00a0s');
  });

  it('when a row is added and left blank, then its cells ask for numbers and no figure reads NaN', async () => {
    renderForm('train-pendulum');
    fireEvent.click(screen.getByRole('button', { name: 'Add a wheel and pinion' }));
    expect(screen.getAllByTestId('train-row')).toHaveLength(3);
    expect(await screen.findAllByText('Enter a number.')).toHaveLength(2);
    expect(document.body.textContent).not.toMatch(/NaN|Infinity/);
  });
});
