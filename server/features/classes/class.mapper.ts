import { Op, type Transaction } from 'sequelize';
import type { ClassDTO } from '@shared/schemas/class';
import { User } from '../auth/user.model';
import { Course } from '../courses/course.model';
import { tallyClasses, seatsLeft } from './class-counts';
import { ClassMentor, type GuildClass } from './class.model';

/** Classes with their course, mentors and counts, loaded in a fixed number of queries whatever the list length. */
export async function toClassDTOs(classes: GuildClass[], transaction?: Transaction): Promise<ClassDTO[]> {
  const ids = classes.map((c) => c.id);
  const [courses, links, tallies] = await Promise.all([
    Course.findAll({ where: { id: { [Op.in]: [...new Set(classes.map((c) => c.courseId))] } }, transaction }),
    ClassMentor.findAll({ where: { classId: { [Op.in]: ids } }, transaction }),
    tallyClasses(ids, transaction),
  ]);
  const mentors = await User.findAll({
    where: { id: { [Op.in]: [...new Set(links.map((l) => l.userId))] } },
    attributes: ['id', 'name'],
    transaction,
  });
  const courseById = new Map(courses.map((c) => [c.id, c]));
  const mentorById = new Map(mentors.map((m) => [m.id, m]));

  return classes.map((cls) => {
    const course = courseById.get(cls.courseId);
    const tally = tallies.get(cls.id)!;
    return {
      id: cls.id,
      name: cls.name,
      course: { id: cls.courseId, title: course?.title ?? 'Unknown course', slug: course?.slug ?? '' },
      startsOn: cls.startsOn,
      endsOn: cls.endsOn,
      capacity: cls.capacity,
      requiredMinutesPerWeek: cls.requiredMinutesPerWeek ?? null,
      archived: cls.archivedAt != null,
      archivedAt: cls.archivedAt ? cls.archivedAt.toISOString() : null,
      mentors: links
        .filter((l) => l.classId === cls.id)
        .map((l) => mentorById.get(l.userId))
        .filter((m): m is User => m !== undefined)
        .map((m) => ({ id: m.id, name: m.name }))
        .sort((a, b) => a.name.localeCompare(b.name)),
      counts: { ...tally, seatsLeft: seatsLeft(cls, tally) },
    };
  });
}

export async function toClassDTO(cls: GuildClass, transaction?: Transaction): Promise<ClassDTO> {
  return (await toClassDTOs([cls], transaction))[0];
}
