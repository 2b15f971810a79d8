import { QueryClient } from '@tanstack/react-query';
import { ApiError } from '@/lib/api-client';

/** 4xx answers are final: retrying a 404 or 403 only delays the message. */
const retry = (count: number, error: unknown) =>
  !(error instanceof ApiError && error.status >= 400 && error.status < 500) && count < 2;

/** The app's one query cache, outside React so that route loaders can start a page's data with its code. */
export const queryClient = new QueryClient({ defaultOptions: { queries: { retry, refetchOnWindowFocus: false } } });
