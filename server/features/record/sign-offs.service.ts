import type { Sequelize } from 'sequelize';
import type { ReasonInput, SignOffInput } from '@shared/schemas/record';
import type { UserDTO } from '@shared/schemas/user';
import { AppError } from '../../lib/app-error';
import { recordAudit } from '../audit/audit.service';
import { User } from '../auth/user.model';
import { canSeeCourseWork } from '../classes/access';
import { Course } from '../courses/course.model';
import { notify } from '../notifications/notifications.service';
import { evidenceKey, gatherCourseEvidence, isPassedPiece } from './evidence';
import { SignOff } from './record.model';

interface Outbound {
  appUrl: string;
}

const evidenceRequired = (message: string) => new AppError('EVIDENCE_REQUIRED', message, 422, { evidence: [message] });
/** Notices go to the apprentice, whose own record page is at /record. */
const OWN_RECORD = '/record';

/**
 * A mentor of an active class of the course (or the guild office) signs a skill off against evidence from the
 * apprentice's own work on that skill, at least one item of which is a passed piece. The sign-off, its audit line and
 * the apprentice's notice are written together.
 */
export async function signOff(
  sequelize: Sequelize,
  viewer: UserDTO,
  apprenticeId: number,
  input: SignOffInput,
  out: Outbound,
): Promise<{ id: number }> {
  const apprentice = apprenticeId > 0 ? await User.findByPk(apprenticeId) : null;
  if (
    !apprentice ||
    apprentice.role !== 'apprentice' ||
    !(await canSeeCourseWork(viewer, apprenticeId, input.courseId))
  ) {
    throw AppError.notFound('That apprentice');
  }
  const course = await Course.findByPk(input.courseId);
  if (!course) throw AppError.notFound('That course');
  const skill = course.skills.find((s) => s.key === input.skillKey);
  if (!skill) {
    const message = `“${course.title}” has no skill called ${input.skillKey}.`;
    throw AppError.badRequest(message, { skillKey: [message] });
  }

  return sequelize.transaction(async (transaction) => {
    const standing = await SignOff.findOne({
      where: { apprenticeId, courseId: course.id, skillKey: skill.key, withdrawnAt: null },
      transaction,
    });
    if (standing) throw AppError.conflict(`“${skill.label}” is already signed off.`);

    const gathered = (await gatherCourseEvidence(sequelize, apprenticeId, course.id, transaction)).bySkill;
    const offered = new Map((gathered.get(skill.key) ?? []).map((e) => [evidenceKey(e), e]));
    if (input.evidence.length === 0)
      throw evidenceRequired('Choose the evidence you judged: at least one passed piece for this skill.');
    const stray = input.evidence.filter((e) => !offered.has(evidenceKey(e)));
    if (stray.length > 0)
      throw evidenceRequired(
        `${stray.map((e) => `${e.kind} ${e.id}`).join(', ')} is not this apprentice's evidence for “${skill.label}”.`,
      );
    if (!input.evidence.some((e) => isPassedPiece(offered.get(evidenceKey(e))!)))
      throw evidenceRequired('A sign-off rests on at least one passed piece for this skill; choose one.');

    if (!input.note) {
      const message = 'Say in a line what you saw.';
      throw AppError.badRequest(message, { note: [message] });
    }

    const unique = [...new Map(input.evidence.map((e) => [evidenceKey(e), { kind: e.kind, id: e.id }])).values()];
    const row = await SignOff.create(
      {
        apprenticeId,
        courseId: course.id,
        skillKey: skill.key,
        mentorId: viewer.id,
        note: input.note,
        evidence: unique,
      },
      { transaction },
    );
    await recordAudit(
      viewer.id,
      'sign-off.recorded',
      { type: 'sign-off', id: row.id, label: `${apprentice.name}: ${skill.label}` },
      { apprenticeId, courseId: course.id, skillKey: skill.key, evidence: unique },
      transaction,
    );
    await notify(
      apprenticeId,
      {
        kind: 'sign-off',
        title: `Signed off: ${skill.label}`,
        body: `${viewer.name} signed off “${skill.label}” in “${course.title}”: ${input.note}`,
        link: OWN_RECORD,
      },
      { appUrl: out.appUrl },
    );
    return { id: row.id };
  });
}

/**
 * The mentor who signed, or the guild office, withdraws a sign-off. The row stays with who withdrew it, when and why,
 * and the skill goes back to what its evidence shows. Others who may see the apprentice are refused (403); anyone
 * else is told the sign-off does not exist.
 */
export async function withdrawSignOff(
  sequelize: Sequelize,
  viewer: UserDTO,
  id: number,
  input: ReasonInput,
  out: Outbound,
): Promise<void> {
  const found = id > 0 ? await SignOff.findByPk(id) : null;
  if (!found || !(await canSeeCourseWork(viewer, found.apprenticeId, found.courseId)))
    throw AppError.notFound('That sign-off');
  if (viewer.role !== 'admin' && found.mentorId !== viewer.id)
    throw AppError.forbidden('Only the mentor who signed, or the guild office, can withdraw a sign-off.');
  const course = await Course.findByPk(found.courseId);
  const label = course?.skills.find((s) => s.key === found.skillKey)?.label ?? found.skillKey;
  const apprentice = await User.findByPk(found.apprenticeId, { attributes: ['name'] });

  await sequelize.transaction(async (transaction) => {
    const row = (await SignOff.findByPk(id, { transaction }))!;
    if (row.withdrawnAt) throw AppError.conflict('That sign-off was already withdrawn.');
    await row.update(
      { withdrawnAt: new Date(), withdrawnById: viewer.id, withdrawReason: input.reason },
      { transaction },
    );
    await recordAudit(
      viewer.id,
      'sign-off.withdrawn',
      { type: 'sign-off', id: row.id, label: `${apprentice?.name ?? 'Former member'}: ${label}` },
      { apprenticeId: row.apprenticeId, courseId: row.courseId, skillKey: row.skillKey, reason: input.reason },
      transaction,
    );
    await notify(
      row.apprenticeId,
      {
        kind: 'sign-off-withdrawn',
        title: `Sign-off withdrawn: ${label}`,
        body: `${viewer.name} withdrew the sign-off of “${label}”: ${input.reason}`,
        link: OWN_RECORD,
      },
      { appUrl: out.appUrl },
    );
  });
}
