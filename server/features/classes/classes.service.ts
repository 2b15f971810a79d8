import { Op, type Transaction, type WhereOptions } from 'sequelize';
import type {
  ClassCreateInput,
  ClassDTO,
  ClassFormOptions,
  ClassListQuery,
  ClassUpdateInput,
} from '@shared/schemas/class';
import type { UserDTO } from '@shared/schemas/user';
import { AppError } from '../../lib/app-error';
import { recordAudit } from '../audit/audit.service';
import { User } from '../auth/user.model';
import { Course } from '../courses/course.model';
import { mentoredClassIds } from './access';
import { toClassDTO, toClassDTOs } from './class.mapper';
import { ClassMentor, Enrolment, GuildClass } from './class.model';
import { Invitation } from './invitation.model';

const sequelize = () => GuildClass.sequelize!;

export async function classFormOptions(): Promise<ClassFormOptions> {
  const [courses, mentors] = await Promise.all([
    Course.findAll({ where: { retiredAt: null }, order: [['position', 'ASC']] }),
    User.findAll({ where: { role: 'mentor', active: true }, order: [['name', 'ASC']] }),
  ]);
  return {
    courses: courses.map((c) => ({ id: c.id, title: c.title, slug: c.slug })),
    mentors: mentors.map((m) => ({ id: m.id, name: m.name, email: m.email })),
  };
}

/** The ids of the classes a viewer may open: all for the admin, mentored ones, or those actively enrolled in. */
async function visibleClassIds(viewer: UserDTO): Promise<number[] | 'all'> {
  if (viewer.role === 'admin') return 'all';
  if (viewer.role === 'mentor') return mentoredClassIds(viewer.id);
  const rows = await Enrolment.findAll({ where: { userId: viewer.id, status: 'active' }, attributes: ['classId'] });
  return rows.map((r) => r.classId);
}

/** A class the viewer may see, or 404 for everyone else, so a stranger cannot learn that it exists. */
export async function findVisibleClass(viewer: UserDTO, id: number): Promise<GuildClass> {
  const visible = await visibleClassIds(viewer);
  const cls = visible === 'all' || visible.includes(id) ? await GuildClass.findByPk(id) : null;
  if (!cls) throw AppError.notFound('That class');
  return cls;
}

export async function listClasses(viewer: UserDTO, query: ClassListQuery): Promise<ClassDTO[]> {
  const visible = await visibleClassIds(viewer);
  const where: WhereOptions<GuildClass> = {};
  if (visible !== 'all') Object.assign(where, { id: { [Op.in]: visible } });
  if (query.archived === 'true') Object.assign(where, { archivedAt: { [Op.ne]: null } });
  if (query.archived === 'false') Object.assign(where, { archivedAt: null });
  const classes = await GuildClass.findAll({
    where,
    order: [
      ['startsOn', 'DESC'],
      ['name', 'ASC'],
    ],
  });
  return toClassDTOs(classes);
}

export async function getClass(viewer: UserDTO, id: number): Promise<ClassDTO> {
  return toClassDTO(await findVisibleClass(viewer, id));
}

async function checkCourse(courseId: number, transaction: Transaction) {
  const course = await Course.findOne({ where: { id: courseId, retiredAt: null }, transaction });
  if (!course)
    throw AppError.badRequest('Some fields need attention.', { courseId: ['Choose one of the courses on offer.'] });
}

async function checkMentors(ids: number[], transaction: Transaction): Promise<User[]> {
  const unique = [...new Set(ids)];
  const mentors = await User.findAll({ where: { id: { [Op.in]: unique }, role: 'mentor', active: true }, transaction });
  if (mentors.length !== unique.length) {
    throw AppError.badRequest('Some fields need attention.', {
      mentorIds: ['Only active mentors can be assigned to a class.'],
    });
  }
  return mentors;
}

export async function createClass(input: ClassCreateInput, actor: UserDTO): Promise<ClassDTO> {
  return sequelize().transaction(async (transaction) => {
    await checkCourse(input.courseId, transaction);
    const mentors = await checkMentors(input.mentorIds, transaction);
    const cls = await GuildClass.create(
      {
        name: input.name,
        courseId: input.courseId,
        startsOn: input.startsOn,
        endsOn: input.endsOn,
        capacity: input.capacity,
        requiredMinutesPerWeek: input.requiredMinutesPerWeek,
      },
      { transaction },
    );
    for (const m of mentors) await ClassMentor.create({ classId: cls.id, userId: m.id }, { transaction });
    const target = { type: 'class', id: cls.id, label: cls.name } as const;
    const { name, courseId, startsOn, endsOn, capacity, requiredMinutesPerWeek } = input;
    await recordAudit(
      actor.id,
      'class.created',
      target,
      { name, courseId, startsOn, endsOn, capacity, requiredMinutesPerWeek },
      transaction,
    );
    if (mentors.length) {
      await recordAudit(
        actor.id,
        'class.mentors-changed',
        target,
        { added: mentors.map((m) => m.name), removed: [] },
        transaction,
      );
    }
    return toClassDTO(cls, transaction);
  });
}

const EDITABLE = ['name', 'courseId', 'startsOn', 'endsOn', 'capacity', 'requiredMinutesPerWeek'] as const;

export async function updateClass(id: number, input: ClassUpdateInput, actor: UserDTO): Promise<ClassDTO> {
  return sequelize().transaction(async (transaction) => {
    const cls = await GuildClass.findByPk(id, { transaction });
    if (!cls) throw AppError.notFound('That class');
    const target = { type: 'class', id: cls.id, label: input.name ?? cls.name } as const;

    const changes: Record<string, [unknown, unknown]> = {};
    for (const key of EDITABLE) {
      if (input[key] !== undefined && input[key] !== cls[key]) changes[key] = [cls[key], input[key]];
    }
    if ((input.endsOn ?? cls.endsOn) < (input.startsOn ?? cls.startsOn)) {
      throw AppError.badRequest('Some fields need attention.', { endsOn: ['The class cannot end before it starts.'] });
    }
    if (changes.courseId) {
      await checkCourse(input.courseId!, transaction);
      const people =
        (await Enrolment.count({ where: { classId: id }, transaction })) +
        (await Invitation.count({ where: { classId: id }, transaction }));
      if (people > 0)
        throw AppError.conflict('The course of a class cannot change once apprentices are enrolled or invited.');
    }
    if (changes.capacity) {
      const active = await Enrolment.count({ where: { classId: id, status: 'active' }, transaction });
      if (input.capacity! < active) {
        throw AppError.badRequest('Some fields need attention.', {
          capacity: [`${active} apprentices are enrolled; the capacity cannot be less than that.`],
        });
      }
    }
    if (Object.keys(changes).length) {
      await cls.update(Object.fromEntries(Object.entries(changes).map(([k, [, to]]) => [k, to])), { transaction });
      await recordAudit(actor.id, 'class.updated', target, { changes }, transaction);
    }
    if (input.mentorIds) await replaceMentors(cls, input.mentorIds, actor, transaction);
    if (input.archived !== undefined && input.archived !== (cls.archivedAt != null)) {
      await cls.update({ archivedAt: input.archived ? new Date() : null }, { transaction });
      await recordAudit(actor.id, input.archived ? 'class.archived' : 'class.unarchived', target, {}, transaction);
    }
    return toClassDTO(cls, transaction);
  });
}

async function replaceMentors(cls: GuildClass, mentorIds: number[], actor: UserDTO, transaction: Transaction) {
  const wanted = await checkMentors(mentorIds, transaction);
  const current = await ClassMentor.findAll({ where: { classId: cls.id }, transaction });
  const currentIds = new Set(current.map((l) => l.userId));
  const wantedIds = new Set(wanted.map((m) => m.id));
  const added = wanted.filter((m) => !currentIds.has(m.id));
  const removedIds = [...currentIds].filter((uid) => !wantedIds.has(uid));
  if (added.length === 0 && removedIds.length === 0) return;
  for (const m of added) await ClassMentor.create({ classId: cls.id, userId: m.id }, { transaction });
  if (removedIds.length)
    await ClassMentor.destroy({ where: { classId: cls.id, userId: { [Op.in]: removedIds } }, transaction });
  const removed = await User.findAll({ where: { id: { [Op.in]: removedIds } }, attributes: ['name'], transaction });
  await recordAudit(
    actor.id,
    'class.mentors-changed',
    { type: 'class', id: cls.id, label: cls.name },
    { added: added.map((m) => m.name), removed: removed.map((m) => m.name) },
    transaction,
  );
}
