import type { Sequelize } from 'sequelize';
import { hashPassword } from '../features/auth/passwords';
import { User } from '../features/auth/user.model';
import { ClassMentor, Enrolment, GuildClass } from '../features/classes/class.model';
import { Course } from '../features/courses/course.model';
import { seedSubmissions } from './seed-submissions';
import { DEMO_CLASSES, DEMO_PASSWORD, DEMO_PEOPLE, demoEmail } from './people';
import { seedBenchLog } from './seed-bench-log';
import { seedClasses } from './seed-classes';
import { seedLessonProgress } from './seed-lesson-progress';
import { seedRecord } from './seed-record';

/**
 * Loads the demo scenario. Idempotent: every row is found by a natural key before it is created, so a second run
 * changes nothing. Feature seeds run after people and classes, in the order listed at the end.
 */
export async function seedDemo(sequelize: Sequelize): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    const passwordHash = await hashPassword(DEMO_PASSWORD);
    const users = new Map<string, User>();
    for (const p of DEMO_PEOPLE) {
      const [user] = await User.findOrCreate({
        where: { email: demoEmail(p.key) },
        defaults: { email: demoEmail(p.key), name: p.name, role: p.role, passwordHash },
        transaction,
      });
      users.set(p.key, user);
    }
    for (const [key, spec] of Object.entries(DEMO_CLASSES)) {
      const course = await Course.findOne({ where: { slug: spec.course }, transaction });
      if (!course) continue;
      const [cls] = await GuildClass.findOrCreate({
        where: { name: spec.name },
        defaults: {
          name: spec.name,
          courseId: course.id,
          startsOn: spec.startsOn,
          endsOn: spec.endsOn,
          capacity: spec.capacity,
        },
        transaction,
      });
      for (const p of DEMO_PEOPLE.filter((x) => x.cls === key)) {
        const userId = users.get(p.key)!.id;
        if (p.role === 'mentor') await ClassMentor.findOrCreate({ where: { classId: cls.id, userId }, transaction });
        else await Enrolment.findOrCreate({ where: { classId: cls.id, userId }, transaction });
      }
    }
  });
  for (const seed of FEATURE_SEEDS) await seed(sequelize);
}

/** Feature demo data (bench log, submissions, …), each idempotent; one line per feature. */
const FEATURE_SEEDS: ((sequelize: Sequelize) => Promise<void>)[] = [
  seedClasses,
  seedBenchLog,
  seedSubmissions,
  seedLessonProgress,
  seedRecord,
];
