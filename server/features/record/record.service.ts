import { Op, type Sequelize } from 'sequelize';
import { addDays, localToday, mondayOf } from '@shared/schemas/log-entry';
import type {
  ApprenticeRecord,
  HoursAgainstClass,
  RecordCourse,
  RecordSkill,
  SignOffDTO,
  WithdrawnSignOff,
} from '@shared/schemas/record';
import type { UserDTO } from '@shared/schemas/user';
import { AppError } from '../../lib/app-error';
import { User } from '../auth/user.model';
import { reachableCourseIds } from '../classes/access';
import { Enrolment, GuildClass } from '../classes/class.model';
import { Course } from '../courses/course.model';
import { LogEntry } from '../bench-log/log-entry.model';
import { gatherCourseEvidence, isPassedPiece } from './evidence';
import { SignOff } from './record.model';

/** At most two years of weeks in the hours chart: a class that ran longer is summed, not drawn, beyond that. */
const MAX_WEEKS = 104;

/**
 * The apprentice an id names, when the viewer may read their record: the apprentice, the guild office, or a mentor of
 * a class the apprentice is actively enrolled in (and then only that class's course). Anyone else is told 404.
 */
async function readableRecord(viewer: UserDTO, apprenticeId: number) {
  const apprentice =
    apprenticeId > 0 ? await User.findByPk(apprenticeId, { attributes: ['id', 'name', 'role'] }) : null;
  if (!apprentice || apprentice.role !== 'apprentice') throw AppError.notFound('That record');
  const reach = await reachableCourseIds(viewer, apprenticeId);
  if (reach !== 'all' && reach.length === 0) throw AppError.notFound('That record');
  return { apprentice: { id: apprentice.id, name: apprentice.name }, reach };
}

/** The courses of the record: every course the apprentice was ever enrolled in, within the viewer's reach. */
async function recordCourses(apprenticeId: number, reach: number[] | 'all') {
  const enrolments = await Enrolment.findAll({ where: { userId: apprenticeId }, attributes: ['classId'] });
  const classes = await GuildClass.findAll({ where: { id: { [Op.in]: enrolments.map((e) => e.classId) } } });
  const ids = [...new Set(classes.map((c) => c.courseId))].filter((id) => reach === 'all' || reach.includes(id));
  return Course.findAll({ where: { id: { [Op.in]: ids } }, order: [['position', 'ASC']] });
}

export async function apprenticeRecord(
  sequelize: Sequelize,
  viewer: UserDTO,
  apprenticeId: number,
): Promise<ApprenticeRecord> {
  const { apprentice, reach } = await readableRecord(viewer, apprenticeId);
  const courses = await recordCourses(apprenticeId, reach);
  return {
    apprentice,
    courses: await Promise.all(courses.map((course) => courseRecord(sequelize, apprenticeId, course))),
  };
}

export async function courseRecord(sequelize: Sequelize, apprenticeId: number, course: Course): Promise<RecordCourse> {
  const evidence = await gatherCourseEvidence(sequelize, apprenticeId, course.id);
  const signOffs = await SignOff.findAll({
    where: { apprenticeId, courseId: course.id },
    order: [['createdAt', 'ASC']],
  });
  const people = await User.findAll({
    where: { id: { [Op.in]: signOffs.flatMap((s) => [s.mentorId, s.withdrawnById ?? s.mentorId]) } },
    attributes: ['id', 'name'],
  });
  const person = (id: number) => ({ id, name: people.find((p) => p.id === id)?.name ?? 'Former member' });
  const signOffDTO = (s: SignOff): SignOffDTO => ({
    id: s.id,
    by: person(s.mentorId),
    at: s.createdAt.toISOString(),
    note: s.note,
  });

  const skills: RecordSkill[] = course.skills.map((skill) => {
    const items = evidence.bySkill.get(skill.key) ?? [];
    const standing = signOffs.find((s) => s.skillKey === skill.key && !s.withdrawnAt);
    const withdrawn: WithdrawnSignOff[] = signOffs
      .filter((s) => s.skillKey === skill.key && s.withdrawnAt)
      .map((s) => ({
        ...signOffDTO(s),
        withdrawnAt: s.withdrawnAt!.toISOString(),
        withdrawnBy: s.withdrawnById ? person(s.withdrawnById) : null,
        reason: s.withdrawReason ?? '',
      }));
    return {
      key: skill.key,
      label: skill.label,
      standard: skill.standard ?? '',
      status: standing
        ? 'signed-off'
        : items.some(isPassedPiece)
          ? 'ready'
          : items.length > 0
            ? 'gathering'
            : 'not-started',
      evidence: items,
      signOff: standing ? signOffDTO(standing) : null,
      withdrawn,
      minutes: evidence.minutesBySkill.get(skill.key) ?? 0,
    };
  });
  return {
    course: { id: course.id, slug: course.slug, title: course.title },
    skills,
    minutes: evidence.minutes,
    hours: await hoursAgainstClass(apprenticeId, course.id),
  };
}

/**
 * Bench time per week from the start of the apprentice's class on this course (an active enrolment first, else the
 * latest) to today or the class's end. Time counts when it is logged on the course's lessons or on no lesson at all
 * (sharpening gravers is bench time too); time on another course's lessons belongs to that course's class.
 */
async function hoursAgainstClass(apprenticeId: number, courseId: number): Promise<HoursAgainstClass | null> {
  const enrolments = await Enrolment.findAll({ where: { userId: apprenticeId } });
  const classes = await GuildClass.findAll({
    where: { id: { [Op.in]: enrolments.map((e) => e.classId) }, courseId },
  });
  const active = new Set(enrolments.filter((e) => e.status === 'active').map((e) => e.classId));
  const cls = classes.sort(
    (a, b) => Number(active.has(b.id)) - Number(active.has(a.id)) || b.startsOn.localeCompare(a.startsOn),
  )[0];
  if (!cls) return null;

  const today = localToday();
  const last = cls.endsOn < today ? cls.endsOn : today;
  const weekStarts: string[] = [];
  for (let w = mondayOf(cls.startsOn); w <= last && weekStarts.length < MAX_WEEKS; w = addDays(w, 7))
    weekStarts.push(w);
  const logged = await LogEntry.findAll({
    where: {
      apprenticeId,
      date: { [Op.between]: [cls.startsOn, last] },
      [Op.or]: [
        { lessonId: null },
        { lessonId: { [Op.in]: LogEntry.sequelize!.literal(`(SELECT id FROM lessons WHERE courseId = ${courseId})`) } },
      ],
    },
    attributes: ['date', 'minutes'],
  });
  const byWeek = new Map(weekStarts.map((w) => [w, 0]));
  for (const e of logged) {
    const week = mondayOf(e.date);
    if (byWeek.has(week)) byWeek.set(week, byWeek.get(week)! + e.minutes);
  }
  const perWeek = cls.requiredMinutesPerWeek ?? null;
  const loggedMinutes = logged.reduce((sum, e) => sum + e.minutes, 0);
  const requiredMinutes = perWeek === null ? 0 : perWeek * weekStarts.length;
  return {
    class: { id: cls.id, name: cls.name, startsOn: cls.startsOn, endsOn: cls.endsOn },
    requiredMinutesPerWeek: perWeek,
    weeks: weekStarts.map((weekStart) => ({ weekStart, minutes: byWeek.get(weekStart)! })),
    loggedMinutes,
    requiredMinutes,
    behind: perWeek !== null && requiredMinutes - loggedMinutes > perWeek,
  };
}
