import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { lazy, Suspense, useState, type ReactNode } from 'react';
import { ApiError } from '@/lib/api-client';
import { useHeadingTitle } from './use-heading-title';

// Loaded after the first screen: nothing toasts before the user has done something.
const Toaster = lazy(() => import('sonner').then((m) => ({ default: m.Toaster })));

/** 4xx answers are final: retrying a 404 or 403 only delays the message. */
const retry = (count: number, error: unknown) =>
  !(error instanceof ApiError && error.status >= 400 && error.status < 500) && count < 2;

export function AppProvider({ children }: { children: ReactNode }) {
  const [client] = useState(
    () => new QueryClient({ defaultOptions: { queries: { retry, refetchOnWindowFocus: false } } }),
  );
  useHeadingTitle();
  return (
    <QueryClientProvider client={client}>
      {children}
      <Suspense fallback={null}>
        <Toaster
          position="bottom-right"
          closeButton
          // Plain toasts: green is kept for "passed", so a saved entry is not shown in it; failures stay in the error red.
          toastOptions={{ classNames: { error: 'border-error/40! text-error!' } }}
        />
      </Suspense>
    </QueryClientProvider>
  );
}
