import { createBrowserRouter, type LoaderFunctionArgs } from 'react-router-dom';
import { isCalculatorName } from '@shared/calc/names';
import { Loading } from '@/components/ui/states';
import { loadForm } from '@/features/calculators/forms/load-form';
import { queryClient } from './query-client';
import { AppShell } from './app-shell';
import { RouteError } from './route-error';

// Shown while the first page's code loads; without it the router renders nothing and warns.
const opening = <Loading label="Opening Tickwright…" />;

// These loaders only start downloads, so that a page's data or calculator arrives alongside the page's own code
// instead of after it; they never wait, and the page shows its own loading and error states.
function startLesson({ params }: LoaderFunctionArgs) {
  const { slug = '', lessonSlug = '' } = params;
  void import('@/features/courses/api/get-lesson').then(({ lessonQueryOptions }) =>
    queryClient.prefetchQuery(lessonQueryOptions(slug, lessonSlug)),
  );
  return null;
}

function startCalculator({ params }: LoaderFunctionArgs) {
  if (params.name && isCalculatorName(params.name)) void loadForm(params.name).catch(() => undefined);
  return null;
}

/** Created once, outside React; every page module is loaded on demand. */
export const router = createBrowserRouter([
  {
    path: '/sign-in',
    lazy: () => import('./routes/sign-in'),
    errorElement: <RouteError />,
    hydrateFallbackElement: opening,
  },
  {
    path: '/invitation/:token',
    lazy: () => import('./routes/accept-invitation'),
    errorElement: <RouteError />,
    hydrateFallbackElement: opening,
  },
  {
    path: '/forgot-password',
    lazy: () => import('./routes/forgot-password'),
    errorElement: <RouteError />,
    hydrateFallbackElement: opening,
  },
  {
    path: '/reset-password/:token',
    lazy: () => import('./routes/reset-password'),
    errorElement: <RouteError />,
    hydrateFallbackElement: opening,
  },
  {
    path: '/verify/:code',
    lazy: () => import('./routes/verify'),
    errorElement: <RouteError />,
    hydrateFallbackElement: opening,
  },
  {
    element: <AppShell />,
    errorElement: <RouteError />,
    hydrateFallbackElement: opening,
    children: [
      { index: true, lazy: () => import('./routes/today') },
      // Feature pages are listed here, one line each.
      { path: 'courses', lazy: () => import('./routes/courses/course-list') },
      { path: 'courses/:slug', lazy: () => import('./routes/courses/course-page') },
      { path: 'courses/:slug/:lessonSlug', loader: startLesson, lazy: () => import('./routes/courses/lesson-page') },
      { path: 'search', lazy: () => import('./routes/search') },
      { path: 'calculators', lazy: () => import('./routes/calculators/calculators-index') },
      { path: 'calculators/saved', lazy: () => import('./routes/calculators/saved-calculations') },
      {
        path: 'calculators/:name',
        loader: startCalculator,
        lazy: () => import('./routes/calculators/calculator-page'),
      },
      { path: 'bench-log', lazy: () => import('./routes/bench-log/bench-log-page') },
      { path: 'bench-log/:id', lazy: () => import('./routes/bench-log/log-entry-page') },
      { path: 'account', lazy: () => import('./routes/account') },
      { path: 'guild-office', lazy: () => import('./routes/guild-office/guild-office') },
      { path: 'guild-office/people', lazy: () => import('./routes/guild-office/people') },
      { path: 'guild-office/invitations', lazy: () => import('./routes/guild-office/invitations') },
      { path: 'guild-office/activity', lazy: () => import('./routes/guild-office/activity') },
      { path: 'guild-office/mail', lazy: () => import('./routes/guild-office/mail') },
      { path: 'classes', lazy: () => import('./routes/classes/classes') },
      { path: 'classes/:id', lazy: () => import('./routes/classes/class') },
      { path: 'pieces', lazy: () => import('./routes/pieces/my-pieces') },
      { path: 'pieces/new', lazy: () => import('./routes/pieces/new-piece') },
      { path: 'pieces/:id', lazy: () => import('./routes/pieces/piece') },
      { path: 'pieces/:id/edit', lazy: () => import('./routes/pieces/edit-piece') },
      { path: 'review', lazy: () => import('./routes/review/review-queue') },
      { path: 'review/:submissionId', lazy: () => import('./routes/review/review-piece') },
      { path: 'notifications', lazy: () => import('./routes/notifications') },
      { path: 'record', lazy: () => import('./routes/record/my-record') },
      { path: 'apprentices/:id/record', lazy: () => import('./routes/record/apprentice-record') },
      { path: '*', lazy: () => import('./routes/not-found') },
    ],
  },
]);
