import type { ReviewQueueQuery } from '@shared/schemas/review';

export const reviewKeys = {
  all: ['reviews'] as const,
  queue: (q: ReviewQueueQuery) => [...reviewKeys.all, 'queue', q] as const,
  count: () => [...reviewKeys.all, 'queue-count'] as const,
  filters: () => [...reviewKeys.all, 'queue-filters'] as const,
  recent: (limit: number) => [...reviewKeys.all, 'recent', limit] as const,
};
