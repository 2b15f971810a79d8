import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { ReviewInput } from '@shared/schemas/review';
import { SubmissionDTO } from '@shared/schemas/submission';
import { api } from '@/lib/api-client';
import { reviewKeys } from './review-keys';

export function useCreateReview(submissionId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: ReviewInput) =>
      api(`/submissions/${submissionId}/reviews`, { method: 'POST', body: input, schema: SubmissionDTO }),
    onSuccess: () => {
      // The piece is the submissions feature's query (refreshed by prefix). It is only marked stale here: refetching it
      // while the review page is still open would swap the form for "not waiting" before the page moves on.
      void client.invalidateQueries({ queryKey: ['submissions'], refetchType: 'none' });
      return client.invalidateQueries({ queryKey: reviewKeys.all });
    },
  });
}
