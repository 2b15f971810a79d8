import { expect } from 'vitest';
import { localToday } from '@shared/schemas/log-entry';
import type { TestApp } from './test-app';

export type Agent = Awaited<ReturnType<TestApp['signIn']>>['agent'];

/** A calendar date n days before today in the local time zone, as the server judges "today". */
export function daysAgo(n: number): string {
  const [y, m, d] = localToday().split('-').map(Number);
  return new Date(Date.UTC(y, m - 1, d - n)).toISOString().slice(0, 10);
}

/** A valid entry body; the measurement values are invented for the test. */
export const entryBody = (fields: Record<string, unknown> = {}) => ({
  date: daysAgo(1),
  minutes: 150,
  title: 'Opened the third-wheel pivot holes',
  notes: 'Broached from the inside face, **smoothed** after.',
  measurements: [
    { name: 'end shake', value: 0.15, unit: 'mm' },
    { name: 'side shake', value: 0.03, unit: 'mm' },
  ],
  ...fields,
});

export async function addEntry(agent: Agent, fields: Record<string, unknown> = {}) {
  const res = await agent.post('/api/log-entries').send(entryBody(fields));
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as { id: number; version: number; date: string; minutes: number };
}
