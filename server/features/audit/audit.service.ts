import { Op, type Transaction, type WhereOptions } from 'sequelize';
import {
  AUDIT_PAGE_SIZE,
  type AuditAction,
  type AuditPage,
  type AuditQuery,
  type AuditTargetType,
} from '@shared/schemas/audit';
import { User } from '../auth/user.model';
import { AuditEvent } from './audit-event.model';

export interface AuditTarget {
  type: AuditTargetType;
  id: number;
  /** How the target reads in the log (a class name, an e-mail), kept as it was at the time. */
  label: string;
}

/**
 * The one way every feature writes to the audit log. Pass the transaction of the change being recorded, so that the
 * record and the change are stored together or not at all.
 */
export async function recordAudit(
  actorId: number | null,
  action: AuditAction,
  target: AuditTarget,
  details: Record<string, unknown> = {},
  transaction?: Transaction,
): Promise<void> {
  await AuditEvent.create(
    { actorId, action, targetType: target.type, targetId: target.id, details: { ...details, label: target.label } },
    { transaction },
  );
}

export async function listAudit(query: AuditQuery): Promise<AuditPage> {
  const where: WhereOptions<AuditEvent> = {};
  if (query.actor) Object.assign(where, { actorId: query.actor });
  if (query.action) Object.assign(where, { action: query.action });
  const createdAt: Record<symbol, Date> = {};
  if (query.from) createdAt[Op.gte] = new Date(`${query.from}T00:00:00.000Z`);
  // "to" is a whole day: everything before the start of the next one.
  if (query.to) createdAt[Op.lt] = new Date(new Date(`${query.to}T00:00:00.000Z`).getTime() + 24 * 3600 * 1000);
  if (query.from || query.to) Object.assign(where, { createdAt });

  const { rows, count } = await AuditEvent.findAndCountAll({
    where,
    order: [
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit: AUDIT_PAGE_SIZE,
    offset: (query.page - 1) * AUDIT_PAGE_SIZE,
  });
  const actorIds = await AuditEvent.findAll({
    attributes: ['actorId'],
    group: ['actorId'],
    where: { actorId: { [Op.ne]: null } },
  });
  const people = await User.findAll({
    where: { id: actorIds.map((a) => a.actorId!) },
    attributes: ['id', 'name'],
    order: [['name', 'ASC']],
  });
  const names = new Map(people.map((p) => [p.id, p.name]));

  return {
    events: rows.map((e) => {
      const { label, ...details } = e.details as { label?: unknown } & Record<string, unknown>;
      return {
        id: e.id,
        actor: e.actorId ? { id: e.actorId, name: names.get(e.actorId) ?? 'Removed account' } : null,
        action: e.action,
        targetType: e.targetType,
        targetId: e.targetId,
        targetLabel: typeof label === 'string' ? label : `${e.targetType} ${e.targetId}`,
        details,
        createdAt: e.createdAt.toISOString(),
      };
    }),
    page: query.page,
    pageSize: AUDIT_PAGE_SIZE,
    total: count,
    actors: people.map((p) => ({ id: p.id, name: p.name })),
  };
}
