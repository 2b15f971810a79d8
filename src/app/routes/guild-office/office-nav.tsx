import { NavLink } from 'react-router-dom';
import { paths } from '@/config/paths';
import { DevMailLink } from '@/features/auth/components/dev-mail-link';

const TABS = [
  { to: paths.guildOffice, label: 'Classes' },
  { to: paths.people, label: 'People' },
  { to: paths.invitations, label: 'Invitations' },
  { to: paths.activity, label: 'Activity' },
  { to: paths.outgoingMail, label: 'Outgoing mail' },
];

/** The guild office's own sections, with the development inbox beside them while mail stays local. */
export function OfficeNav() {
  return (
    <div className="mb-6 flex flex-wrap items-center justify-between gap-3">
      <nav aria-label="Guild office" className="flex flex-wrap gap-1">
        {TABS.map((t) => (
          <NavLink
            key={t.to}
            to={t.to}
            end
            className={({ isActive }) =>
              `flex min-h-11 items-center rounded-md border px-4 text-sm font-semibold no-underline ${
                isActive ? 'border-brass bg-brass/15 text-ink' : 'border-rule bg-card text-muted hover:text-ink'
              }`
            }
          >
            {t.label}
          </NavLink>
        ))}
      </nav>
      <DevMailLink />
    </div>
  );
}
