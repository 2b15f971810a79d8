import { NOTIFICATIONS_PAGE_SIZE, type NotificationDTO, type NotificationList } from '@shared/schemas/notification';
import { AppError } from '../../lib/app-error';
import { User } from '../auth/user.model';
import { queueMail } from '../outbox/outbox.service';
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
  /** Set false for an in-app notice without e-mail (demo data, for one). */
  email?: boolean;
}

/**
 * Tells one person about something: an in-app notice and, for an active account, an e-mail in the outbox. Call it
 * inside the transaction of the change it reports, so that the notice and its mail exist exactly when the change
 * does; the outbox delivers the mail afterwards, whatever the mail server does.
 */
export async function notify(userId: number, notice: Notice, options: NotifyOptions = {}) {
  return Notification.sequelize!.transaction(async (transaction) => {
    const user = await User.findByPk(userId, { attributes: ['id', 'email', 'name', 'active'], transaction });
    if (!user) return { notificationId: null, mailId: null };
    const row = await Notification.create(
      { userId, kind: notice.kind, title: notice.title, body: notice.body, link: notice.link ?? null },
      { transaction },
    );
    if (options.email === false || !user.active) return { notificationId: row.id, mailId: null };
    const url = notice.link ? `${options.appUrl ?? ''}${notice.link}` : null;
    const text = [
      `Hello ${user.name.split(' ')[0]},`,
      '',
      notice.body,
      ...(url ? ['', `Open it in Tickwright: ${url}`] : []),
      '',
      '— Tickwright',
    ].join('\n');
    const mail = await queueMail(
      { to: user.email, subject: notice.title, text },
      { kind: 'notification', transaction },
    );
    return { notificationId: row.id, mailId: mail.id };
  });
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
