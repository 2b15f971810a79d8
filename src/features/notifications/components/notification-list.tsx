import { CheckCheck } from 'lucide-react';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { NOTIFICATIONS_PAGE_SIZE } from '@shared/schemas/notification';
import { Button } from '@/components/ui/button';
import { EmptyState, ErrorNotice, Loading } from '@/components/ui/states';
import { useMarkAllRead, useMarkRead, useNotifications } from '../api/get-notifications';

const when = (iso: string) =>
  new Date(iso).toLocaleString(undefined, { day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit' });

/** Notices newest first; opening one marks it read. */
export function NotificationList() {
  const [page, setPage] = useState(1);
  const { data, isPending, error } = useNotifications(page);
  const markRead = useMarkRead();
  const markAll = useMarkAllRead();
  if (isPending) return <Loading />;
  if (error) return <ErrorNotice error={error} />;
  const pages = Math.max(1, Math.ceil(data.total / NOTIFICATIONS_PAGE_SIZE));
  if (data.total === 0)
    return (
      <EmptyState title="No notices yet">Pieces sent, reviews and other news for you will be listed here.</EmptyState>
    );
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <p className="text-muted">
          <span className="num">{data.unreadCount}</span> unread of <span className="num">{data.total}</span>
        </p>
        <Button
          variant="secondary"
          disabled={data.unreadCount === 0}
          busy={markAll.isPending}
          onClick={() => markAll.mutate()}
        >
          <CheckCheck className="size-4" aria-hidden />
          Mark all as read
        </Button>
      </div>
      <ul className="divide-y divide-rule rounded-lg border border-rule bg-card">
        {data.items.map((n) => (
          <li key={n.id} className={`flex flex-wrap items-start gap-3 p-4 ${n.readAt ? '' : 'bg-brass/5'}`}>
            <span
              aria-hidden
              className={`mt-2 size-2.5 shrink-0 rounded-full ${n.readAt ? 'bg-transparent' : 'bg-brass'}`}
            />
            <div className="min-w-0 flex-1">
              <p className="font-semibold">
                {n.link ? (
                  <Link to={n.link} onClick={() => !n.readAt && markRead.mutate(n.id)}>
                    {n.title}
                  </Link>
                ) : (
                  n.title
                )}
                {!n.readAt && <span className="sr-only"> (unread)</span>}
              </p>
              <p className="text-sm text-ink">{n.body}</p>
              <p className="text-xs text-muted">{when(n.createdAt)}</p>
            </div>
            {!n.readAt && (
              <Button variant="quiet" onClick={() => markRead.mutate(n.id)} aria-label={`Mark “${n.title}” as read`}>
                Mark read
              </Button>
            )}
          </li>
        ))}
      </ul>
      {pages > 1 && (
        <nav aria-label="Pages of notices" className="flex items-center gap-3">
          <Button variant="secondary" disabled={page === 1} onClick={() => setPage(page - 1)}>
            Newer
          </Button>
          <span className="num text-sm">
            Page {page} of {pages}
          </span>
          <Button variant="secondary" disabled={page >= pages} onClick={() => setPage(page + 1)}>
            Older
          </Button>
        </nav>
      )}
    </div>
  );
}
