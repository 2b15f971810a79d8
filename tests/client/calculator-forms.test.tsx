import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { pivotBurnishForm } from '@/features/calculators/forms/pivot-burnish';
import { springTemperForm } from '@/features/calculators/forms/spring-temper';
import { fakeServer, renderCalculator, resultOf } from './calculator-support';

vi.setConfig({ testTimeout: 30_000 });
afterEach(() => vi.unstubAllGlobals());

describe('pivot & burnish form', () => {
  it('when the friction comes from the table or is typed, then the torque and speed follow the chosen figure', async () => {
    fakeServer();
    renderCalculator(pivotBurnishForm);
    // The lesson's third arbor: F = 1.42 N, a = 0.75 mm, σ_allow = 200 MPa ->
    // d_min = (32 × 1.42 × 0.75 / (π × 200))^(1/3) = 0.3785 mm (computed)
    expect(resultOf('Smallest safe diameter')).toBe('0.3785 mm');
    // μ 0.19 brass on steel, lubricated (Schneider Co. chart): T = 0.19 × 1.42 N × 0.5 mm = 0.1349 N·mm (computed)
    expect(resultOf('Friction torque')).toBe('0.1349 N·mm');
    await userEvent.selectOptions(screen.getByRole('combobox', { name: 'Friction coefficient' }), 'typed');
    await userEvent.clear(screen.getByRole('textbox', { name: /Friction coefficient μ/ }));
    await userEvent.type(screen.getByRole('textbox', { name: /Friction coefficient μ/ }), '0.11');
    expect(resultOf('Friction torque')).toBe('0.0781 N·mm'); // 0.11 × 1.42 × 0.5 (computed)
    await userEvent.selectOptions(screen.getByRole('combobox', { name: 'Surface speed for turning' }), 'typed');
    await userEvent.clear(screen.getByRole('textbox', { name: /Surface speed/ }));
    await userEvent.type(screen.getByRole('textbox', { name: /Surface speed/ }), '30');
    // TRADE.md §2: v = 30 m/min on a 1.0 mm pivot -> 9 549 rpm (computed)
    expect(resultOf('Spindle speed for turning')).toBe('9549 rpm');
  });
});

describe('spring temper form', () => {
  it('when a tempering heat is typed for O1, then the colour and the hardness come from the cited tables', async () => {
    fakeServer();
    renderCalculator(springTemperForm);
    // Sheffield Gauge Plate chart: 230 °C is yellow; Eastern Tool Steel O-1 data sheet: 450 °F/230 °C -> 61 HRC
    expect(resultOf('Temper colour at that heat')).toBe('Yellow');
    expect(resultOf('Hardness after tempering')).toBe('61 HRC');
    await userEvent.click(screen.getByRole('button', { name: /Light blue/ }));
    // Sheffield Gauge Plate chart: light blue (springs) 310 °C, 590 °F
    expect(resultOf('Temperature for light blue')).toBe('310 °C');
    await userEvent.click(screen.getByRole('radio', { name: /Imperial/ }));
    expect(resultOf('Temperature for light blue')).toBe('590 °F');
  });

  it('when brass is hammered two numbers hard, then the reduction and temper match the published table', () => {
    fakeServer();
    renderCalculator(springTemperForm, { search: '?mode=brass&numbersHard=2' });
    // TRADE.md §3c: ½ hard (H02), 2 numbers, 20.7 % (Precision Steel Warehouse); formula 20.70 % (computed)
    expect(resultOf('Thickness reduction')).toBe('20.7 %');
    expect(resultOf('Temper')).toBe('½ hard');
    // Olin Brass C26000 ½ hard: yield 350 MPa
    expect(resultOf('Yield strength (C26000 strip)')).toBe('350 MPa');
  });

  it('when a click spring’s material is changed, then the force follows its modulus', async () => {
    fakeServer();
    renderCalculator(springTemperForm, { search: '?mode=click-spring' });
    // TRADE.md §3d: E = 206 GPa, b = 2, t = 0.3, L = 20, δ = 1 mm -> F = 0.348 N, σ = 231.8 MPa (computed)
    expect(resultOf('Force at the tip')).toBe('0.3476 N');
    expect(resultOf('Root stress')).toBe('231.8 MPa');
    await userEvent.selectOptions(screen.getByRole('combobox', { name: 'Material' }), 'c26000-hard');
    // Same spring, C26000 E = 110 GPa -> F = 0.186 N (computed); σ 123.8 MPa (computed)
    expect(resultOf('Force at the tip')).toBe('0.1856 N');
    expect(resultOf('Root stress')).toBe('123.8 MPa');
  });

  it('when a steel click spring is bent past its elastic limit, then no force is shown and the warning gives the ratio', () => {
    fakeServer();
    renderCalculator(springTemperForm, {
      search: '?mode=click-spring&widthMm=2&thicknessMm=1&lengthMm=5&deflectionMm=0.5',
    });
    // σ = 1.5 × 206 000 × 1 × 0.5 / 25 = 6180 MPa against 895 MPa (computed; limit from the ASM Metals Handbook figure)
    expect(resultOf('Force at the tip')).toBe('not reached');
    expect(resultOf('Root stress, by the elastic formula')).toBe('6180 MPa');
    expect(screen.getByText(/6180 MPa is 6\.905 × the elastic limit of 895 MPa/)).toBeInTheDocument();
  });

  it('when O1 is chosen, then the flat-spring temper from its data sheet is shown in whole HRC', () => {
    fakeServer();
    renderCalculator(springTemperForm);
    // Eastern Tool Steel O-1 data sheet: 800 °F/425 °C 49 HRC, 900 °F/480 °C 44 HRC
    expect(resultOf('Temper for a flat spring (about 44–50 HRC)')).toBe('425 °C to 480 °C, 49–44 HRC');
  });
});
