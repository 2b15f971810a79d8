import type { Sequelize } from 'sequelize';
import { User } from '../features/auth/user.model';
import { Course, Lesson } from '../features/courses/course.model';
import { LessonProgress } from '../features/courses/lesson-progress.model';
import { DEMO_CLASSES, demoEmail } from './people';

/** How far into their class's course each demo apprentice has read (invented, like the rest of the scenario). */
const LESSONS_DONE: Record<string, number> = {
  ned: 3,
  ruth: 4,
  tamsin: 2,
  jago: 1,
  wren: 0,
  elias: 2,
  mabli: 2,
  osric: 1,
  perpetua: 3,
};

const CLASS_OF: Record<string, keyof typeof DEMO_CLASSES> = {
  ned: 'autumn',
  ruth: 'autumn',
  tamsin: 'autumn',
  jago: 'autumn',
  wren: 'autumn',
  elias: 'autumn',
  mabli: 'spring',
  osric: 'spring',
  perpetua: 'spring',
};

/** Done marks on the first lessons of each apprentice's course, dated a few days apart; idempotent. */
export async function seedLessonProgress(_sequelize: Sequelize): Promise<void> {
  for (const [key, count] of Object.entries(LESSONS_DONE)) {
    const user = await User.findOne({ where: { email: demoEmail(key) } });
    const course = await Course.findOne({ where: { slug: DEMO_CLASSES[CLASS_OF[key]].course } });
    if (!user || !course || count === 0) continue;
    const lessons = await Lesson.findAll({
      where: { courseId: course.id, retiredAt: null },
      order: [['position', 'ASC']],
      limit: count,
    });
    for (const [i, lesson] of lessons.entries()) {
      const exists = await LessonProgress.findOne({ where: { userId: user.id, lessonId: lesson.id } });
      if (exists) continue;
      const daysAgo = (count - i) * 6;
      await LessonProgress.create({
        userId: user.id,
        lessonId: lesson.id,
        completedAt: new Date(Date.now() - daysAgo * 86_400_000),
      });
    }
  }
}
