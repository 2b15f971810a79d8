import type { Transaction } from 'sequelize';
import type { InvitationDTO, InviteResult, RosterPreviewRow } from '@shared/schemas/invitation';
import type { UserDTO } from '@shared/schemas/user';
import { AppError } from '../../lib/app-error';
import type { MailStatus } from '@shared/schemas/outbox';
import { recordAudit } from '../audit/audit.service';
import { User } from '../auth/user.model';
import { Course } from '../courses/course.model';
import { mailStatuses, queueMail } from '../outbox/outbox.service';
import { Enrolment, GuildClass } from './class.model';
import { enrolledMail, invitationMail } from './invitation-mail';
import { Invitation } from './invitation.model';
import { newInvitationToken } from './invitation-token';
import { isSuccess, outcomeMessage, planInvites, type Invitee } from './invite-planner';

export interface MailDeps {
  appUrl: string;
}

async function openClass(classId: number, transaction?: Transaction) {
  const cls = await GuildClass.findByPk(classId, { transaction });
  if (!cls) throw AppError.notFound('That class');
  if (cls.archivedAt) throw AppError.conflict('This class is archived; bring it back before inviting anyone.');
  const course = await Course.findByPk(cls.courseId, { transaction });
  return { cls, info: { className: cls.name, courseTitle: course?.title ?? '', courseSlug: course?.slug ?? '' } };
}

export async function previewInvites(
  classId: number,
  invitees: (Invitee & { line: number })[],
): Promise<RosterPreviewRow[]> {
  const { cls } = await openClass(classId);
  const plans = await planInvites(cls, invitees);
  return plans.map((p, i) => ({
    line: invitees[i].line,
    name: invitees[i].name ?? '',
    email: invitees[i].email,
    outcome: p.outcome,
    ok: isSuccess(p.outcome),
    message: outcomeMessage(p.outcome, true),
  }));
}

/** Enrols existing apprentices and invites new addresses; each one's e-mail is queued in the same transaction. */
export async function inviteToClass(
  classId: number,
  invitees: Invitee[],
  actor: UserDTO,
  deps: MailDeps,
  source: 'e-mail' | 'roster file',
): Promise<InviteResult[]> {
  const plans = await GuildClass.sequelize!.transaction(async (transaction) => {
    const { cls, info } = await openClass(classId, transaction);
    const plans = await planInvites(cls, invitees, transaction);
    for (const plan of plans) {
      if (plan.outcome === 'enrolled' && plan.user) {
        const user = plan.user;
        if (plan.enrolment) await plan.enrolment.update({ status: 'active' }, { transaction });
        else await Enrolment.create({ classId, userId: user.id }, { transaction });
        await recordAudit(
          actor.id,
          'enrolment.added',
          { type: 'user', id: user.id, label: user.email },
          { classId, className: cls.name, source },
          transaction,
        );
        await queueMail(enrolledMail(deps.appUrl, user.email, user.name, info), { kind: 'enrolment', transaction });
      } else if (plan.outcome === 'invited') {
        const { token, tokenHash, expiresAt } = newInvitationToken();
        const fields = { tokenHash, expiresAt, name: plan.name ?? plan.expired?.name ?? null, invitedById: actor.id };
        const invitation = plan.expired
          ? await plan.expired.update(fields, { transaction })
          : await Invitation.create({ classId, email: plan.email, ...fields }, { transaction });
        const mail = invitationMail(deps.appUrl, plan.email, invitation.name, token, expiresAt, info);
        const queued = await queueMail(mail, { kind: 'invitation', secret: true, expiresAt, transaction });
        await invitation.update({ mailId: queued.id }, { transaction });
        await recordAudit(
          actor.id,
          'invitation.sent',
          { type: 'invitation', id: invitation.id, label: plan.email },
          { classId, className: cls.name, source },
          transaction,
        );
      }
    }
    if (source === 'roster file') {
      const count = (o: string) => plans.filter((p) => p.outcome === o).length;
      await recordAudit(
        actor.id,
        'roster.imported',
        { type: 'class', id: cls.id, label: cls.name },
        {
          rows: plans.length,
          invited: count('invited'),
          enrolled: count('enrolled'),
          skipped: plans.filter((p) => !isSuccess(p.outcome)).length,
        },
        transaction,
      );
    }
    return plans;
  });

  return plans.map((plan) => ({
    email: plan.email,
    outcome: plan.outcome,
    message: outcomeMessage(plan.outcome),
    mail: isSuccess(plan.outcome) ? 'queued' : null,
  }));
}

/** Invitations neither accepted nor revoked, expired ones included (flagged), so that they can be resent. */
export async function listPendingInvitations(classId?: number): Promise<InvitationDTO[]> {
  const rows = await Invitation.findAll({
    where: { acceptedAt: null, revokedAt: null, ...(classId ? { classId } : {}) },
    order: [['createdAt', 'DESC']],
  });
  const classes = await GuildClass.findAll({
    where: { id: [...new Set(rows.map((r) => r.classId))] },
    attributes: ['id', 'name'],
  });
  const inviterIds = [...new Set(rows.flatMap((r) => (r.invitedById ? [r.invitedById] : [])))];
  const inviters = await User.findAll({ where: { id: inviterIds }, attributes: ['id', 'name'] });
  const mails = await mailStatuses(rows.map((r) => r.mailId));
  const className = new Map(classes.map((c) => [c.id, c.name]));
  const inviter = new Map(inviters.map((u) => [u.id, { id: u.id, name: u.name }]));
  const now = new Date();
  return rows.map((r) => ({
    id: r.id,
    classId: r.classId,
    className: className.get(r.classId) ?? '',
    email: r.email,
    name: r.name,
    expiresAt: r.expiresAt.toISOString(),
    expired: r.expiresAt <= now,
    sentAt: r.updatedAt.toISOString(),
    invitedBy: (r.invitedById && inviter.get(r.invitedById)) || null,
    mail: (r.mailId && mails.get(r.mailId)) || null,
  }));
}

async function findPending(id: number, transaction: Transaction) {
  const invitation = await Invitation.findByPk(id, { transaction });
  if (!invitation || invitation.acceptedAt || invitation.revokedAt) throw AppError.notFound('That pending invitation');
  return invitation;
}

/** A new token and a new 14 days; the old link stops working at once and the new one is queued. */
export async function resendInvitation(id: number, actor: UserDTO, deps: MailDeps): Promise<{ mail: MailStatus }> {
  await GuildClass.sequelize!.transaction(async (transaction) => {
    const invitation = await findPending(id, transaction);
    const { info } = await openClass(invitation.classId, transaction);
    const { token, tokenHash, expiresAt } = newInvitationToken();
    const mail = invitationMail(deps.appUrl, invitation.email, invitation.name, token, expiresAt, info);
    const queued = await queueMail(mail, { kind: 'invitation', secret: true, expiresAt, transaction });
    await invitation.update({ tokenHash, expiresAt, invitedById: actor.id, mailId: queued.id }, { transaction });
    await recordAudit(
      actor.id,
      'invitation.resent',
      { type: 'invitation', id, label: invitation.email },
      { classId: invitation.classId, className: info.className },
      transaction,
    );
  });
  return { mail: { state: 'queued', lastError: null } };
}

export async function revokeInvitation(id: number, actor: UserDTO): Promise<void> {
  await GuildClass.sequelize!.transaction(async (transaction) => {
    const invitation = await findPending(id, transaction);
    await invitation.update({ revokedAt: new Date() }, { transaction });
    const cls = await GuildClass.findByPk(invitation.classId, { attributes: ['name'], transaction });
    await recordAudit(
      actor.id,
      'invitation.revoked',
      { type: 'invitation', id, label: invitation.email },
      { classId: invitation.classId, className: cls?.name },
      transaction,
    );
  });
}
