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
    onSuccess: async () => {
      // The piece itself is the submissions feature's query; its key is refreshed by prefix.
      await client.invalidateQueries({ queryKey: ['submissions'] });
      await client.invalidateQueries({ queryKey: reviewKeys.all });
    },
  });
}
