import { Op } from 'sequelize';
import type { UserDTO } from '@shared/schemas/user';
import { AppError } from '../../lib/app-error';
import { ClassMentor, Enrolment } from './class.model';

/**
 * Who may see an apprentice's records: the apprentice, a mentor of a class the apprentice is (or was) enrolled in,
 * and the admin. Every feature asks here rather than writing its own join, so the rule lives in one place.
 */
export async function canSeeApprentice(viewer: UserDTO, apprenticeId: number): Promise<boolean> {
  if (viewer.role === 'admin') return true;
  if (viewer.role === 'apprentice') return viewer.id === apprenticeId;
  const classIds = await mentoredClassIds(viewer.id);
  if (classIds.length === 0) return false;
  const hit = await Enrolment.findOne({ where: { userId: apprenticeId, classId: { [Op.in]: classIds } } });
  return hit !== null;
}

/** Throws 404 (not 403) so that a stranger cannot learn whether a record exists. */
export async function assertCanSeeApprentice(viewer: UserDTO, apprenticeId: number, what = 'That record') {
  if (!(await canSeeApprentice(viewer, apprenticeId))) throw AppError.notFound(what);
}

export async function mentoredClassIds(mentorId: number): Promise<number[]> {
  const links = await ClassMentor.findAll({ where: { userId: mentorId }, attributes: ['classId'] });
  return links.map((l) => l.classId);
}

/** The apprentices a viewer may see, or 'all' for the admin. */
export async function visibleApprenticeIds(viewer: UserDTO): Promise<number[] | 'all'> {
  if (viewer.role === 'admin') return 'all';
  if (viewer.role === 'apprentice') return [viewer.id];
  const classIds = await mentoredClassIds(viewer.id);
  const rows = await Enrolment.findAll({ where: { classId: { [Op.in]: classIds } }, attributes: ['userId'] });
  return [...new Set(rows.map((r) => r.userId))];
}

/** Mentors of the classes an apprentice is actively enrolled in: who is told when a piece is sent. */
export async function mentorsOfApprentice(apprenticeId: number): Promise<number[]> {
  const enrolments = await Enrolment.findAll({
    where: { userId: apprenticeId, status: 'active' },
    attributes: ['classId'],
  });
  const links = await ClassMentor.findAll({ where: { classId: { [Op.in]: enrolments.map((e) => e.classId) } } });
  return [...new Set(links.map((l) => l.userId))];
}
