import { NOTIFICATIONS_PAGE_SIZE, type NotificationDTO, type NotificationList } from '@shared/schemas/notification';
import { AppError } from '../../lib/app-error';
import type { Mailer } from '../../lib/mailer';
import { User } from '../auth/user.model';
import { Notification } from './notification.model';

interface Notice {
  /** A short machine word for the kind of event, e.g. "submission-sent". */
  kind: string;
  title: string;
  body: string;
  /** In-app path the notice leads to, e.g. /pieces/12. */
  link?: string | null;
}

interface NotifyOptions {
  /** The app's origin, so that the e-mail carries a full link; without it the mail names the path only. */
  appUrl?: string;
  /** Set false for an in-app notice without e-mail. */
  email?: boolean;
}

/**
 * Tells one person about something: an in-app notice, and an e-mail when a mailer is given. Call it after the change
 * it describes has been committed. A mail that cannot be sent never undoes the notice: it is reported in `mailed`.
 */
export async function notify(userId: number, notice: Notice, mailer: Mailer | null, options: NotifyOptions = {}) {
  const user = await User.findByPk(userId, { attributes: ['id', 'email', 'name', 'active'] });
  if (!user) return { notificationId: null, mailed: false };
  const row = await Notification.create({
    userId,
    kind: notice.kind,
    title: notice.title,
    body: notice.body,
    link: notice.link ?? null,
  });
  let mailed = false;
  if (mailer && options.email !== false && user.active) {
    const url = notice.link ? `${options.appUrl ?? ''}${notice.link}` : null;
    const text = [
      `Hello ${user.name.split(' ')[0]},`,
      '',
      notice.body,
      ...(url ? ['', `Open it in Tickwright: ${url}`] : []),
      '',
      '— Tickwright',
    ].join('\n');
    try {
      await mailer.send({ to: user.email, subject: notice.title, text });
      mailed = true;
    } catch {
      mailed = false;
    }
  }
  return { notificationId: row.id, mailed };
}

const toDTO = (n: Notification): NotificationDTO => ({
  id: n.id,
  kind: n.kind,
  title: n.title,
  body: n.body,
  link: n.link,
  readAt: n.readAt ? n.readAt.toISOString() : null,
  createdAt: n.createdAt.toISOString(),
});

export const unreadCount = (userId: number) => Notification.count({ where: { userId, readAt: null } });

export async function listNotifications(userId: number, page: number): Promise<NotificationList> {
  const { rows, count } = await Notification.findAndCountAll({
    where: { userId },
    order: [
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit: NOTIFICATIONS_PAGE_SIZE,
    offset: (page - 1) * NOTIFICATIONS_PAGE_SIZE,
  });
  return {
    items: rows.map(toDTO),
    unreadCount: await unreadCount(userId),
    total: count,
    page,
    pageSize: NOTIFICATIONS_PAGE_SIZE,
  };
}

export async function markRead(userId: number, id: number): Promise<NotificationDTO> {
  const row = id > 0 ? await Notification.findOne({ where: { id, userId } }) : null;
  if (!row) throw AppError.notFound('That notice');
  if (!row.readAt) await row.update({ readAt: new Date() });
  return toDTO(row);
}

export async function markAllRead(userId: number): Promise<number> {
  const [count] = await Notification.update({ readAt: new Date() }, { where: { userId, readAt: null } });
  return count;
}
