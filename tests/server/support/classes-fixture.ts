import { Course } from '../../../server/features/courses/course.model';
import { ClassMentor, Enrolment, GuildClass } from '../../../server/features/classes/class.model';
import type { TestApp } from './test-app';

export const COURSE_SLUG = 'going-train-wall-regulator';

export async function courseId(slug = COURSE_SLUG): Promise<number> {
  const course = await Course.findOne({ where: { slug } });
  if (!course) throw new Error(`course ${slug} missing from content/`);
  return course.id;
}

/** A class made straight in the database, with an optional mentor and apprentices. */
export async function makeClass(
  fields: Partial<{
    name: string;
    capacity: number;
    mentorIds: number[];
    apprenticeIds: number[];
    archived: boolean;
  }> = {},
) {
  const cls = await GuildClass.create({
    name: fields.name ?? `Test Bench ${Math.random().toString(36).slice(2, 7)}`,
    courseId: await courseId(),
    startsOn: '2026-09-07',
    endsOn: '2026-12-18',
    capacity: fields.capacity ?? 12,
    archivedAt: fields.archived ? new Date() : null,
  });
  for (const userId of fields.mentorIds ?? []) await ClassMentor.create({ classId: cls.id, userId });
  for (const userId of fields.apprenticeIds ?? []) await Enrolment.create({ classId: cls.id, userId });
  return cls;
}

/** Everyone a class route must answer differently: the admin, mentors in and out of the class, apprentices likewise. */
export async function castOfClass(t: TestApp) {
  const admin = await t.signIn('admin');
  const mentorThis = await t.signIn('mentor');
  const mentorOther = await t.signIn('mentor');
  const apprenticeIn = await t.signIn('apprentice');
  const apprenticeOut = await t.signIn('apprentice');
  const cls = await makeClass({ mentorIds: [mentorThis.user.id], apprenticeIds: [apprenticeIn.user.id] });
  await makeClass({ mentorIds: [mentorOther.user.id], apprenticeIds: [apprenticeOut.user.id] });
  return { cls, admin, mentorThis, mentorOther, apprenticeIn, apprenticeOut, anon: { agent: t.anon() } };
}

/** The link's token from an invitation e-mail. */
export function tokenFromMail(text: string): string {
  const match = text.match(/\/invitation\/([A-Za-z0-9_-]+)/);
  if (!match) throw new Error(`no invitation link in: ${text}`);
  return match[1];
}
