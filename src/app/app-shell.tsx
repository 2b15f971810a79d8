import { Suspense } from 'react';
import { Link, Navigate, NavLink, Outlet, useLocation } from 'react-router-dom';
import { paths } from '@/config/paths';
import { Loading } from '@/components/ui/states';
import { useMe } from '@/features/auth/api/get-me';
import { UserMenu } from '@/features/auth/components/user-menu';
import { BellLink } from '@/features/notifications/components/bell-link';
import { NAV, type NavItem } from './nav';
import { NavBadge } from './nav-badge';

const underPrefix = (pathname: string, prefix: string) => pathname === prefix || pathname.startsWith(`${prefix}/`);

/** Header, role navigation and the page; anyone not signed in is sent to sign-in and brought back afterwards. */
export function AppShell() {
  const { data: user, isPending } = useMe();
  const location = useLocation();
  if (isPending) return <Loading label="Opening Tickwright…" />;
  if (!user) return <Navigate to={paths.signIn(location.pathname + location.search)} replace />;
  const marked = (item: NavItem, isActive: boolean) =>
    isActive || (item.alsoOn ?? []).some((prefix) => underPrefix(location.pathname, prefix));
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
          {/* Below laptop width the navigation takes its own row, so that no item wraps under another. */}
          <nav aria-label="Main" className="order-last flex w-full flex-wrap gap-1 lg:order-none lg:w-auto lg:flex-1">
            {NAV[user.role].map((item) => (
              <NavLink
                key={item.to}
                to={item.to}
                end={item.to === paths.home}
                className={({ isActive }) =>
                  `flex min-h-11 items-center gap-2 rounded-md px-3 text-sm font-semibold no-underline ${
                    marked(item, isActive)
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
          <div className="ml-auto flex items-center gap-2">
            <BellLink />
            <UserMenu user={user} />
          </div>
        </div>
      </header>
      {/* tabIndex lets the skip link move focus here, not only the scroll position. */}
      <main id="main" tabIndex={-1} className="mx-auto max-w-6xl px-4 py-8 focus:outline-none">
        <Suspense fallback={<Loading />}>
          <Outlet />
        </Suspense>
      </main>
    </div>
  );
}
