import { useMe } from '@/features/auth/api/get-me';
import { useQueueCount } from '@/features/reviews/api/get-review-queue';
import type { NavItem } from './nav';

/** Counts beside navigation items; each badge name is filled in by the feature that owns the count. */
export function NavBadge({ name }: { name: NonNullable<NavItem['badge']> }) {
  const count = useBadgeCount(name);
  if (!count) return null;
  return (
    <>
      <span className="num rounded-full bg-brass-dark px-2 text-xs text-white" aria-hidden>
        {count}
      </span>
      <span className="sr-only">, {count} waiting</span>
    </>
  );
}

function useBadgeCount(name: NonNullable<NavItem['badge']>): number {
  const { data: user } = useMe();
  const reviewer = user?.role === 'mentor' || user?.role === 'admin';
  const { data: waiting = 0 } = useQueueCount(name === 'reviewQueue' && reviewer);
  return name === 'reviewQueue' ? waiting : 0;
}
