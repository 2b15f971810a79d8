import { Op, type Sequelize } from 'sequelize';
import { addDays } from '@shared/schemas/log-entry';
import { User } from '../features/auth/user.model';
import { LogEntry } from '../features/bench-log/log-entry.model';
import { ClassMentor, Enrolment, GuildClass } from '../features/classes/class.model';
import { Course, Lesson, Project } from '../features/courses/course.model';
import { newCertificateCode } from '../features/record/certificates.service';
import { Certificate, SignOff } from '../features/record/record.model';
import { Submission } from '../features/submissions/submission.model';
import { DEMO_CLASSES, EARLIER_CLASS, REQUIRED_MINUTES_PER_WEEK, demoEmail } from './people';
import { seedPieces, type DemoPiece } from './seed-submissions';

const DAY_MS = 24 * 3600 * 1000;
const daysSince = (date: string) => Math.round((Date.now() - Date.parse(`${date}T10:00:00Z`)) / DAY_MS);

/** One passed version with invented scores (all 3 or 4) and a short comment, sent and reviewed on the given days. */
function passedPiece(
  who: string,
  course: keyof typeof DEMO_CLASSES,
  lesson: string,
  photo: DemoPiece['versions'][number]['photos'][number],
  sent: string,
  mentor: string,
  comment: string,
): DemoPiece {
  return {
    who,
    course,
    lesson,
    versions: [
      {
        daysAgo: daysSince(sent),
        notes: 'Finished and photographed as the brief asks.',
        photos: [photo],
        review: {
          mentor,
          daysAgo: daysSince(addDays(sent, 2)),
          outcome: 'passed',
          scores: [4, 3, 3, 3, 4],
          comment,
          pins: [[0, 0.5, 0.45, 'This is the part that earns the pass: even and clean.']],
        },
      },
    ],
  };
}

/** Morwenna's pieces for the earlier class, every project of "Springs and Heat Treatment" passed. */
const MORWENNA: DemoPiece[] = [
  ['hardening-and-tempering-steel', ['strip', 0, 'Temper ladder, straw to blue'], '2026-03-20'],
  ['work-hardening-brass', ['strip', 3, 'Hammered strip beside the unhammered end'], '2026-04-10'],
  ['the-click', ['click', 2, 'The click, top face'], '2026-05-01'],
  ['the-click-spring', ['click', 5, 'Click spring fitted against the click'], '2026-05-22'],
  ['adjusting-rod-and-evening-the-torque', ['strip', 6, 'Torque readings beside the fusee'], '2026-06-12'],
].map(([lesson, photo, sent]) =>
  passedPiece(
    'morwenna',
    'spring',
    lesson as string,
    photo as DemoPiece['versions'][number]['photos'][number],
    sent as string,
    'bram',
    'Sound work, and the log shows how you got there. Passed.',
  ),
);

/** Ned and Ruth each pass the plates (Ned's pivots pass in seed-submissions); Ruth passes her pivots too. */
const AUTUMN: DemoPiece[] = [
  passedPiece(
    'ned',
    'autumn',
    'plates-and-datum-lines',
    ['plates', 2, 'Both plates pinned'],
    addDays(DEMO_CLASSES.autumn.startsOn, 10),
    'odile',
    'Datum lines true and the pins hold. Passed.',
  ),
  passedPiece(
    'ruth',
    'autumn',
    'plates-and-datum-lines',
    ['plates', 4, 'Plates with datum lines scribed'],
    addDays(DEMO_CLASSES.autumn.startsOn, 12),
    'odile',
    'Clean layout, holes square to the face. Passed.',
  ),
  passedPiece(
    'ruth',
    'autumn',
    'turning-and-burnishing-pivots',
    ['pivots', 2, 'Both pivots, rule for scale'],
    addDays(DEMO_CLASSES.autumn.startsOn, 40),
    'odile',
    'Bright, square shoulders, sizes as drawn. Passed.',
  ),
];

/** Sign-offs: [apprentice, course slug, skill, mentor, lesson whose passed piece is the evidence, day]. */
const SIGN_OFFS: [string, string, string, string, string, string][] = [
  ...(
    [
      ['heat-treat-steel', 'hardening-and-tempering-steel', '2026-06-15'],
      ['work-harden-brass', 'work-hardening-brass', '2026-06-15'],
      ['click-making', 'the-click', '2026-06-16'],
      ['click-spring', 'the-click-spring', '2026-06-16'],
      ['mainspring-handling', 'adjusting-rod-and-evening-the-torque', '2026-06-22'],
      ['fusee-layout', 'adjusting-rod-and-evening-the-torque', '2026-06-22'],
      ['torque-evening', 'adjusting-rod-and-evening-the-torque', '2026-06-22'],
    ] as const
  ).map(
    ([skill, lesson, day]) =>
      ['morwenna', EARLIER_CLASS.course, skill, 'bram', lesson, day] as (typeof SIGN_OFFS)[number],
  ),
  ...['ned', 'ruth'].flatMap((who) =>
    ['plate-layout', 'bench-practice'].map(
      (skill) =>
        [
          who,
          DEMO_CLASSES.autumn.course,
          skill,
          'odile',
          'plates-and-datum-lines',
          addDays(DEMO_CLASSES.autumn.startsOn, 20),
        ] as (typeof SIGN_OFFS)[number],
    ),
  ),
];

const NOTES: Record<string, string> = {
  'plate-layout': 'Datum lines from one edge, both plates drilled and pinned together, every hole square.',
  'bench-practice': 'Bench kept in order through the plates; guards on, work held properly at the lathe.',
};

/**
 * The apprentice's record in the demo: an earlier, archived springs class whose apprentice finished the course
 * (every project passed, every skill signed off, a certificate issued), and Ned and Ruth with some skills signed off
 * and some ready. Every class asks for bench time each week. Idempotent: rows are found by natural keys first.
 */
export async function seedRecord(sequelize: Sequelize): Promise<void> {
  const person = (key: string) => User.findOne({ where: { email: demoEmail(key) } });
  const [office, morwenna, bram] = await Promise.all([person('office'), person('morwenna'), person('bram')]);
  const springs = await Course.findOne({ where: { slug: EARLIER_CLASS.course } });
  if (!office || !morwenna || !bram || !springs) return;

  await sequelize.transaction(async (transaction) => {
    const { name, startsOn, endsOn, capacity } = EARLIER_CLASS;
    const [earlier] = await GuildClass.findOrCreate({
      where: { name },
      defaults: {
        name,
        courseId: springs.id,
        startsOn,
        endsOn,
        capacity,
        requiredMinutesPerWeek: REQUIRED_MINUTES_PER_WEEK,
        archivedAt: new Date(`${addDays(endsOn, 7)}T09:00:00Z`),
      },
      transaction,
    });
    await ClassMentor.findOrCreate({ where: { classId: earlier.id, userId: bram.id }, transaction });
    await Enrolment.findOrCreate({ where: { classId: earlier.id, userId: morwenna.id }, transaction });
    await GuildClass.update(
      { requiredMinutesPerWeek: REQUIRED_MINUTES_PER_WEEK },
      {
        where: { requiredMinutesPerWeek: null, name: { [Op.in]: Object.values(DEMO_CLASSES).map((c) => c.name) } },
        transaction,
      },
    );
  });

  await seedPieces(sequelize, [...MORWENNA, ...AUTUMN]);
  await seedMorwennaHours(morwenna.id, springs.id);

  for (const [who, slug, skill, mentorKey, lesson, day] of SIGN_OFFS) {
    const [apprentice, mentor] = await Promise.all([person(who), person(mentorKey)]);
    const course = await Course.findOne({ where: { slug } });
    const lessonRow = course && (await Lesson.findOne({ where: { courseId: course.id, slug: lesson } }));
    const project = lessonRow && (await Project.findOne({ where: { lessonId: lessonRow.id } }));
    const piece =
      apprentice &&
      project &&
      (await Submission.findOne({ where: { apprenticeId: apprentice.id, projectId: project.id, status: 'passed' } }));
    if (!apprentice || !mentor || !course || !piece) continue;
    const at = new Date(`${day}T15:00:00Z`);
    await SignOff.findOrCreate({
      where: { apprenticeId: apprentice.id, courseId: course.id, skillKey: skill, withdrawnAt: null },
      defaults: {
        apprenticeId: apprentice.id,
        courseId: course.id,
        skillKey: skill,
        mentorId: mentor.id,
        note: NOTES[skill] ?? 'Seen at the bench and in the pieces: meets the standard.',
        evidence: [{ kind: 'submission', id: piece.id }],
        createdAt: at,
        updatedAt: at,
      },
    });
  }

  const issuedAt = new Date(`${addDays(EARLIER_CLASS.endsOn, 5)}T10:00:00Z`);
  await Certificate.findOrCreate({
    where: { apprenticeId: morwenna.id, courseId: springs.id },
    defaults: {
      code: newCertificateCode(),
      apprenticeId: morwenna.id,
      courseId: springs.id,
      issuedById: office.id,
      issuedAt,
    },
  });
}

/** Morwenna's bench log: a long session most weeks of her class, on the lesson she was working through. */
async function seedMorwennaHours(apprenticeId: number, courseId: number) {
  if (await LogEntry.findOne({ where: { apprenticeId } })) return;
  const lessons = await Lesson.findAll({ where: { courseId }, order: [['position', 'ASC']] });
  const weeks = 17;
  for (let w = 0; w < weeks; w++) {
    const lesson = lessons[Math.min(lessons.length - 1, Math.floor((w * lessons.length) / weeks))];
    await LogEntry.create({
      apprenticeId,
      date: addDays(EARLIER_CLASS.startsOn, w * 7 + 2),
      // Invented demo figures: eight to nine hours a week.
      minutes: 480 + (w % 3) * 30,
      title: `Bench day: ${lesson.title.toLowerCase()}`,
      notes: 'Worked through the lesson and the project at the bench.',
      lessonId: lesson.id,
    });
  }
}
