import { act, renderHook } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { EntryFormSchema, formToInput } from '@/features/bench-log/lib/entry-form-schema';
import { resultLines } from '@/features/bench-log/lib/result-lines';
import { useBenchTimer } from '@/features/bench-log/lib/use-bench-timer';

describe('bench timer', () => {
  beforeEach(() => {
    localStorage.clear();
    vi.useFakeTimers();
    vi.setSystemTime(new Date('2026-11-02T08:00:00Z'));
  });
  afterEach(() => vi.useRealTimers());

  it('when the page is reloaded while it runs, then it carries on from the stored start and stops with whole minutes', () => {
    const first = renderHook(() => useBenchTimer(7));
    act(() => first.result.current.start());
    first.unmount();
    vi.setSystemTime(new Date('2026-11-02T09:24:40Z'));
    const again = renderHook(() => useBenchTimer(7));
    expect(again.result.current.running).toBe(true);
    expect(again.result.current.elapsedMs).toBe((84 * 60 + 40) * 1000);
    let minutes = 0;
    act(() => {
      minutes = again.result.current.stop();
    });
    expect(minutes).toBe(85);
    expect(again.result.current.running).toBe(false);
    expect(localStorage.getItem('tickwright.bench-timer.7')).toBeNull();
  });

  it('when it is paused, then the time stands still and another person on the same tablet has their own timer', () => {
    const ned = renderHook(() => useBenchTimer(7));
    act(() => ned.result.current.start());
    vi.setSystemTime(new Date('2026-11-02T08:10:00Z'));
    act(() => ned.result.current.pause());
    vi.setSystemTime(new Date('2026-11-02T10:00:00Z'));
    expect(renderHook(() => useBenchTimer(7)).result.current.elapsedMs).toBe(10 * 60 * 1000);
    expect(renderHook(() => useBenchTimer(8)).result.current.elapsedMs).toBe(0);
  });
});

describe('entry form', () => {
  const values = {
    date: '2026-10-05',
    hours: '2',
    minutes: '30',
    title: ' Third-wheel holes ',
    notes: '',
    lessonId: '',
    measurements: [{ name: 'end shake', value: '0,15', unit: ' mm ' }],
    calculationIds: [4],
  };

  it('when hours, minutes and a comma decimal are typed, then the API gets minutes and a number', () => {
    expect(formToInput(EntryFormSchema.parse(values), [9])).toEqual({
      date: '2026-10-05',
      minutes: 150,
      title: 'Third-wheel holes',
      notes: '',
      lessonId: null,
      measurements: [{ name: 'end shake', value: 0.15, unit: 'mm' }],
      uploadIds: [9],
      calculationIds: [4],
    });
  });

  it('when no time or more than a day is typed, or a reading has no unit, then the form names the field', () => {
    const issues = (v: object) =>
      EntryFormSchema.safeParse({ ...values, ...v }).error?.issues.map((i) => i.path.join('.')) ?? [];
    expect(issues({ hours: '', minutes: '0' })).toEqual(['minutes']);
    expect(issues({ hours: '24', minutes: '1' })).toEqual(['minutes']);
    expect(issues({ measurements: [{ name: 'side shake', value: '0.03', unit: '' }] })).toEqual([
      'measurements.0.unit',
    ]);
    expect(issues({ measurements: [{ name: 'side shake', value: 'abc', unit: 'mm' }] })).toEqual([
      'measurements.0.value',
    ]);
  });
});

describe('attached results', () => {
  it('when a saved result has plain numbers, then each reads as words with its unit and nested tables are left out', () => {
    // Figures invented for the formatting only.
    const lines = resultLines({
      insertionDepthMm: 27.5,
      frictionTorqueNmm: 0.95123,
      tiltDeg: 1.5,
      table: [1, 2],
      spindleRpm: 9549,
    });
    expect(lines).toEqual([
      { label: 'Insertion depth', value: '27.5\u00a0mm' },
      { label: 'Friction torque', value: '0.9512\u00a0N·mm' },
      { label: 'Tilt', value: '1.5°' },
      { label: 'Spindle', value: '9549\u00a0rpm' },
    ]);
  });
});
