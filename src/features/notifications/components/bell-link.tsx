import { Bell } from 'lucide-react';
import { NavLink } from 'react-router-dom';
import { paths } from '@/config/paths';
import { useUnreadCount } from '../api/get-notifications';

/** The header's way to the notices, with the number not yet read. */
export function BellLink() {
  const { data: unread = 0 } = useUnreadCount();
  return (
    <NavLink
      to={paths.notifications}
      className={({ isActive }) =>
        `relative flex size-11 items-center justify-center rounded-md no-underline hover:bg-rule/40 ${isActive ? 'bg-brass/15 text-ink' : 'text-muted'}`
      }
      aria-label={unread > 0 ? `Notifications, ${unread} unread` : 'Notifications'}
    >
      <Bell className="size-5" aria-hidden />
      {unread > 0 && (
        <span
          aria-hidden
          className="num absolute -top-0.5 -right-0.5 min-w-5 rounded-full bg-brass-dark px-1 text-center text-xs leading-5 text-white"
        >
          {unread > 99 ? '99+' : unread}
        </span>
      )}
    </NavLink>
  );
}
