import * as z from 'zod/mini';
import { QueryPage } from './query';

export const NotificationDTO = z.object({
  id: z.int(),
  kind: z.string(),
  title: z.string(),
  body: z.string(),
  /** An in-app path such as /pieces/12, or null. */
  link: z.nullable(z.string()),
  readAt: z.nullable(z.string()),
  createdAt: z.string(),
});
export type NotificationDTO = z.infer<typeof NotificationDTO>;

export const NOTIFICATIONS_PAGE_SIZE = 30;
export const NotificationListQuery = z.object({ page: QueryPage(10_000) });

export const NotificationList = z.object({
  items: z.array(NotificationDTO),
  unreadCount: z.int(),
  total: z.int(),
  page: z.int(),
  pageSize: z.int(),
});
export type NotificationList = z.infer<typeof NotificationList>;

export const UnreadCount = z.object({ unreadCount: z.int() });
