import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { NotificationDTO, NotificationList, UnreadCount } from '@shared/schemas/notification';
import { api } from '@/lib/api-client';
import { notificationKeys } from './notification-keys';

export const useNotifications = (page: number) =>
  useQuery({
    queryKey: notificationKeys.page(page),
    queryFn: () => api(`/notifications?page=${page}`, { schema: NotificationList }),
    placeholderData: keepPreviousData,
  });

/** The unread number on the bell; refreshed every minute and whenever a notice is read. */
export const useUnreadCount = () =>
  useQuery({
    queryKey: notificationKeys.count(),
    queryFn: () => api('/notifications/count', { schema: UnreadCount }),
    refetchInterval: 60_000,
    select: (d) => d.unreadCount,
  });

export function useMarkRead() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api(`/notifications/${id}/read`, { method: 'POST', schema: NotificationDTO }),
    onSuccess: () => client.invalidateQueries({ queryKey: notificationKeys.all }),
  });
}

export function useMarkAllRead() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => api('/notifications/read-all', { method: 'POST', schema: UnreadCount }),
    onSuccess: () => client.invalidateQueries({ queryKey: notificationKeys.all }),
  });
}
