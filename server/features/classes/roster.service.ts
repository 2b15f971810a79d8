import { Op } from 'sequelize';
import type { RosterEntry, RosterReply } from '@shared/schemas/class';
import type { UserDTO } from '@shared/schemas/user';
import { AppError } from '../../lib/app-error';
import { recordAudit } from '../audit/audit.service';
import { User } from '../auth/user.model';
import { pendingInvitation, seatsLeft, tallyClasses } from './class-counts';
import { Enrolment, GuildClass } from './class.model';
import { findVisibleClass } from './classes.service';
import { Invitation } from './invitation.model';
import { courseProgress } from './progress-counts';

/** The roster for the admin and the class's mentors: enrolled apprentices with their progress, then open invitations. */
export async function getRoster(viewer: UserDTO, classId: number): Promise<RosterReply> {
  const cls = await findVisibleClass(viewer, classId);
  const enrolments = await Enrolment.findAll({ where: { classId }, order: [['createdAt', 'ASC']] });
  const users = await User.findAll({ where: { id: { [Op.in]: enrolments.map((e) => e.userId) } } });
  const userById = new Map(users.map((u) => [u.id, u]));
  const progress = await courseProgress(
    GuildClass.sequelize!,
    cls.courseId,
    users.map((u) => u.id),
  );
  const invitations = await Invitation.findAll({
    where: { classId, ...pendingInvitation() },
    order: [['createdAt', 'ASC']],
  });

  const enrolled: RosterEntry[] = enrolments.map((e) => {
    const user = userById.get(e.userId);
    return {
      userId: e.userId,
      invitationId: null,
      name: user?.name ?? 'Removed account',
      email: user?.email ?? '',
      status: e.status,
      lessonsDone: progress.lessonsDone.get(e.userId) ?? 0,
      projectsPassed: progress.projectsPassed.get(e.userId) ?? 0,
      since: e.createdAt.toISOString(),
    };
  });
  const invited: RosterEntry[] = invitations.map((i) => ({
    userId: null,
    invitationId: i.id,
    name: i.name ?? '',
    email: i.email,
    status: 'invited',
    lessonsDone: 0,
    projectsPassed: 0,
    since: i.createdAt.toISOString(),
  }));
  const order = { active: 0, invited: 1, withdrawn: 2 } as const;
  const entries = [...enrolled, ...invited].sort(
    (a, b) => order[a.status] - order[b.status] || a.name.localeCompare(b.name),
  );
  return { classId, lessonsTotal: progress.lessonsTotal, projectsTotal: progress.projectsTotal, entries };
}

/**
 * Withdrawing only marks the enrolment: the apprentice's lessons, log entries and submissions stay, and
 * re-enrolling brings them back into view. Doing either twice changes nothing and records nothing.
 */
export async function setEnrolmentStatus(
  classId: number,
  userId: number,
  status: 'active' | 'withdrawn',
  actor: UserDTO,
) {
  await GuildClass.sequelize!.transaction(async (transaction) => {
    const cls = await GuildClass.findByPk(classId, { transaction });
    const enrolment = cls && (await Enrolment.findOne({ where: { classId, userId }, transaction }));
    if (!cls || !enrolment) throw AppError.notFound('That enrolment');
    if (enrolment.status === status) return;
    if (status === 'active') {
      if (cls.archivedAt) throw AppError.conflict('This class is archived; bring it back before re-enrolling anyone.');
      const tally = (await tallyClasses([classId], transaction)).get(classId)!;
      if (seatsLeft(cls, tally) === 0)
        throw AppError.conflict('The class is full: raise its capacity or withdraw someone first.');
    }
    await enrolment.update({ status }, { transaction });
    const user = await User.findByPk(userId, { transaction });
    await recordAudit(
      actor.id,
      status === 'active' ? 'enrolment.reenrolled' : 'enrolment.withdrawn',
      { type: 'user', id: userId, label: user?.email ?? `user ${userId}` },
      { classId, className: cls.name },
      transaction,
    );
  });
}
