import { Suspense } from 'react';
import { Link, Navigate, NavLink, Outlet, useLocation } from 'react-router-dom';
import { paths } from '@/config/paths';
import { Loading } from '@/components/ui/states';
import { useMe } from '@/features/auth/api/get-me';
import { UserMenu } from '@/features/auth/components/user-menu';
import { BellLink } from '@/features/notifications/components/bell-link';
import { NAV } from './nav';
import { NavBadge } from './nav-badge';

/** Header, role navigation and the page; anyone not signed in is sent to sign-in and brought back afterwards. */
export function AppShell() {
  const { data: user, isPending } = useMe();
  const location = useLocation();
  if (isPending) return <Loading label="Opening Tickwright…" />;
  if (!user) return <Navigate to={paths.signIn(location.pathname + location.search)} replace />;
  return (
    <div className="min-h-screen">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:rounded focus:bg-card focus:p-2"
      >
        Skip to content
      </a>
      <header className="no-print border-b border-rule bg-card">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3">
          <Link
            to={paths.home}
            className="flex items-center gap-2 font-serif text-2xl font-semibold text-ink no-underline"
          >
            <img src="/favicon.svg" alt="" className="size-7" />
            Tickwright
          </Link>
          <nav aria-label="Main" className="flex flex-1 flex-wrap gap-1">
            {NAV[user.role].map((item) => (
              <NavLink
                key={item.to}
                to={item.to}
                end={item.to === paths.home}
                className={({ isActive }) =>
                  `flex min-h-11 items-center gap-2 rounded-md px-3 text-sm font-semibold no-underline ${
                    isActive
                      ? 'bg-brass/15 text-ink underline decoration-brass decoration-2 underline-offset-8'
                      : 'text-muted hover:text-ink'
                  }`
                }
              >
                {item.label}
                {item.badge && <NavBadge name={item.badge} />}
              </NavLink>
            ))}
          </nav>
          <BellLink />
          <UserMenu user={user} />
        </div>
      </header>
      <main id="main" className="mx-auto max-w-6xl px-4 py-8">
        <Suspense fallback={<Loading />}>
          <Outlet />
        </Suspense>
      </main>
    </div>
  );
}
