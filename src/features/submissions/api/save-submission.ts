import { useMutation, useQueryClient } from '@tanstack/react-query';
import { SubmissionDTO, type SubmissionCreateInput, type SubmissionDraftPatch } from '@shared/schemas/submission';
import { api } from '@/lib/api-client';
import { submissionKeys } from './submission-keys';

type SaveInput = { id: number | null; projectId: number; draft: Required<SubmissionDraftPatch> };

/** Creates the piece on its first save, and writes the draft on later ones. */
function saveDraft({ id, projectId, draft }: SaveInput) {
  if (id === null) {
    const body: SubmissionCreateInput = { projectId, ...draft };
    return api('/submissions', { method: 'POST', body, schema: SubmissionDTO });
  }
  return api(`/submissions/${id}`, { method: 'PATCH', body: draft, schema: SubmissionDTO });
}

export function useSaveDraft() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: saveDraft,
    onSuccess: (saved) => {
      client.setQueryData(submissionKeys.detail(saved.id), saved);
      return client.invalidateQueries({ queryKey: submissionKeys.all });
    },
  });
}

/**
 * Saves then sends: the piece goes to the mentors' queue. Queries are only marked stale, not refetched, while the form
 * is on screen; the caller puts the sent piece in the cache as it moves to the piece's page.
 */
export function useSaveAndSend() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: async (input: SaveInput) => {
      const saved = await saveDraft(input);
      return api(`/submissions/${saved.id}/send`, { method: 'POST', schema: SubmissionDTO });
    },
    onSettled: () => client.invalidateQueries({ queryKey: submissionKeys.all, refetchType: 'none' }),
  });
}
