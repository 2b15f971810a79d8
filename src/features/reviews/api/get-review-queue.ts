import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import {
  QueueCount,
  RecentReviews,
  ReviewQueueFilters,
  ReviewQueuePage,
  type ReviewQueueQuery,
} from '@shared/schemas/review';
import { api } from '@/lib/api-client';
import { reviewKeys } from './review-keys';

const toSearch = (q: ReviewQueueQuery) => {
  const params = new URLSearchParams({ sort: q.sort, dir: q.dir, page: String(q.page) });
  for (const key of ['classId', 'courseId', 'projectId'] as const) if (q[key]) params.set(key, String(q[key]));
  return params.toString();
};

const reviewQueueQueryOptions = (q: ReviewQueueQuery) =>
  queryOptions({
    queryKey: reviewKeys.queue(q),
    queryFn: () => api(`/review-queue?${toSearch(q)}`, { schema: ReviewQueuePage }),
    placeholderData: keepPreviousData,
  });

/** One page of waiting pieces, sorted and filtered by the server. */
export const useReviewQueue = (q: ReviewQueueQuery) => useQuery(reviewQueueQueryOptions(q));

export const useQueueFilters = () =>
  useQuery({
    queryKey: reviewKeys.filters(),
    queryFn: () => api('/review-queue/filters', { schema: ReviewQueueFilters }),
    staleTime: 5 * 60_000,
  });

/** The number beside "To review"; refreshed every minute while the app is open. */
export const useQueueCount = (enabled: boolean) =>
  useQuery({
    queryKey: reviewKeys.count(),
    queryFn: () => api('/review-queue/count', { schema: QueueCount }),
    enabled,
    refetchInterval: 60_000,
    select: (d) => d.count,
  });

export const useRecentReviews = (limit = 5) =>
  useQuery({
    queryKey: reviewKeys.recent(limit),
    queryFn: () => api(`/reviews?limit=${limit}`, { schema: RecentReviews }),
    select: (d) => d.items,
  });
