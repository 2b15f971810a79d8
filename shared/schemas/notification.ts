import { z } from 'zod';

export const NotificationDTO = z.object({
  id: z.number().int(),
  kind: z.string(),
  title: z.string(),
  body: z.string(),
  /** An in-app path such as /pieces/12, or null. */
  link: z.string().nullable(),
  readAt: z.string().nullable(),
  createdAt: z.string(),
});
export type NotificationDTO = z.infer<typeof NotificationDTO>;

export const NOTIFICATIONS_PAGE_SIZE = 30;
export const NotificationListQuery = z.object({ page: z.coerce.number().int().min(1).max(10_000).default(1) });

export const NotificationList = z.object({
  items: z.array(NotificationDTO),
  unreadCount: z.number().int(),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
});
export type NotificationList = z.infer<typeof NotificationList>;

export const UnreadCount = z.object({ unreadCount: z.number().int() });
