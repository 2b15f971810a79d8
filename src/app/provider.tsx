import { QueryClientProvider } from '@tanstack/react-query';
import { lazy, Suspense, type ReactNode } from 'react';
import { queryClient } from './query-client';
import { useHeadingTitle } from './use-heading-title';

// Loaded after the first screen: nothing toasts before the user has done something.
const Toaster = lazy(() => import('sonner').then((m) => ({ default: m.Toaster })));

export function AppProvider({ children }: { children: ReactNode }) {
  useHeadingTitle();
  return (
    <QueryClientProvider client={queryClient}>
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
