import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { MemoryRouter } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { RecordSkill } from '@shared/schemas/record';
import { SignOffDialog } from '@/features/record/components/sign-off-dialog';

const skill: RecordSkill = {
  key: 'pivots',
  label: 'Turning and burnishing pivots',
  standard: 'Turns a pivot to size with a square shoulder and burnishes it bright.',
  status: 'ready',
  evidence: [
    {
      kind: 'submission',
      id: 41,
      title: 'Two burnished pivots',
      date: '2026-11-12',
      outcome: 'passed',
      score: 3,
      photoIds: [7],
    },
    {
      kind: 'submission',
      id: 40,
      title: 'First pivots',
      date: '2026-11-01',
      outcome: 'rework',
      score: 2,
      photoIds: [],
    },
    { kind: 'log-entry', id: 9, title: 'Turned the centre-wheel pivots', date: '2026-11-10', score: 3, photoIds: [] },
  ],
  signOff: null,
  withdrawn: [],
  minutes: 150,
};

const fetchMock = vi.fn();
beforeEach(() => {
  fetchMock.mockReset();
  vi.stubGlobal('fetch', fetchMock);
});
afterEach(() => vi.unstubAllGlobals());

function show(onClose = vi.fn()) {
  const client = new QueryClient({ defaultOptions: { mutations: { retry: false } } });
  render(
    <QueryClientProvider client={client}>
      <MemoryRouter>
        <SignOffDialog apprentice={{ id: 5, name: 'Ned Pellow' }} courseId={1} skill={skill} onClose={onClose} />
      </MemoryRouter>
    </QueryClientProvider>,
  );
  return onClose;
}

const reply = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });

describe('sign-off dialog', () => {
  it('when it opens, then the passed piece is chosen and focused, and it cannot be sent without a note', async () => {
    show();
    const dialog = screen.getByRole('dialog', { name: 'Sign off “Turning and burnishing pivots” for Ned Pellow' });
    const passed = screen.getByRole('checkbox', { name: /Piece: Two burnished pivots/ });
    expect(dialog).toContainElement(passed);
    expect(passed).toBeChecked();
    expect(passed).toHaveFocus();
    expect(screen.getByRole('checkbox', { name: /Piece: First pivots/ })).not.toBeChecked();
    expect(screen.getByRole('button', { name: 'Sign off' })).toBeDisabled();
  });

  it('when the mentor adds the log entry and a note, then the chosen evidence and the note are sent and the dialog closes', async () => {
    fetchMock.mockResolvedValueOnce(reply(201, { id: 77 }));
    const onClose = show();
    await userEvent.click(screen.getByRole('checkbox', { name: /Log entry: Turned the centre-wheel pivots/ }));
    await userEvent.type(screen.getByLabelText('Note for the record'), 'Square and bright.');
    await userEvent.click(screen.getByRole('button', { name: 'Sign off' }));
    await waitFor(() => expect(onClose).toHaveBeenCalled());
    const [url, init] = fetchMock.mock.calls[0];
    expect(url).toBe('/api/apprentices/5/sign-offs');
    expect(init.method).toBe('POST');
    expect(JSON.parse(init.body)).toEqual({
      courseId: 1,
      skillKey: 'pivots',
      note: 'Square and bright.',
      evidence: [
        { kind: 'submission', id: 41 },
        { kind: 'log-entry', id: 9 },
      ],
    });
  });

  it('when the server answers EVIDENCE_REQUIRED, then its reason shows beside the evidence and the dialog stays open', async () => {
    fetchMock.mockResolvedValueOnce(
      reply(422, {
        error: {
          code: 'EVIDENCE_REQUIRED',
          message: 'A sign-off rests on at least one passed piece for this skill; choose one.',
          fields: { evidence: ['A sign-off rests on at least one passed piece for this skill; choose one.'] },
        },
      }),
    );
    const onClose = show();
    await userEvent.click(screen.getByRole('checkbox', { name: /Piece: Two burnished pivots/ }));
    await userEvent.click(screen.getByRole('checkbox', { name: /Piece: First pivots/ }));
    await userEvent.type(screen.getByLabelText('Note for the record'), 'Nearly there.');
    await userEvent.click(screen.getByRole('button', { name: 'Sign off' }));
    expect(await screen.findByText(/at least one passed piece for this skill; choose one/)).toBeVisible();
    expect(onClose).not.toHaveBeenCalled();
  });
});
