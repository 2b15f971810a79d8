import type { Sequelize, Transaction } from 'sequelize';
import { localToday } from '@shared/schemas/log-entry';
import { User } from '../features/auth/user.model';
import { LogComment, LogEntry, LogGrade, LogMeasurement } from '../features/bench-log/log-entry.model';
import { Course, Lesson } from '../features/courses/course.model';
import { DEMO_CLASSES, demoEmail } from './people';

interface DemoEntry {
  who: 'ned' | 'ruth';
  daysAgo: number;
  minutes: number;
  title: string;
  lesson: string | null;
  notes: string;
  /** Invented readings for the demo only: [what, value, unit]. */
  measurements: [string, number, string][];
  feedback?: { comment: string; grade: [number, number, number]; gradeComment: string };
}

const ENTRIES: DemoEntry[] = [
  {
    who: 'ned',
    daysAgo: 18,
    minutes: 150,
    title: 'Turned the centre-wheel pivots',
    lesson: 'turning-and-burnishing-pivots',
    notes:
      'Roughed both pivots with the graver, then **burnished** until the marks were gone.\n\n- front pivot first\n- back pivot after lunch',
    measurements: [
      ['front pivot diameter', 1.02, 'mm'],
      ['back pivot diameter', 1.01, 'mm'],
    ],
  },
  {
    who: 'ned',
    daysAgo: 12,
    minutes: 135,
    title: 'Opened the third-wheel holes with the broach',
    lesson: 'broaching-pivot-holes',
    notes: 'Broached from the inside face, checking the arbor for upright after every few turns.',
    measurements: [
      ['end shake', 0.15, 'mm'],
      ['side shake', 0.03, 'mm'],
    ],
    feedback: {
      comment: 'Good that you checked for upright as you went. Next time photograph the holes against the light.',
      grade: [3, 4, 1],
      gradeComment: 'Readings are clear; one photo of the finished holes would complete the record.',
    },
  },
  {
    who: 'ned',
    daysAgo: 9,
    minutes: 210,
    title: 'Filed and stoned the front plate',
    lesson: 'plates-and-datum-lines',
    notes: 'Draw-filed the edges, then stoned the face flat on the surface plate.',
    measurements: [['plate thickness', 2.05, 'mm']],
  },
  {
    who: 'ned',
    daysAgo: 4,
    minutes: 180,
    title: 'Trial planting of the going train',
    lesson: 'depthing-and-planting',
    notes: 'Set the depthing tool on the centre and third wheels and transferred the centres to the plate.',
    measurements: [['centre distance, centre to third', 24.6, 'mm']],
  },
  {
    who: 'ned',
    daysAgo: 1,
    minutes: 95,
    title: 'Tidied the bench and sharpened gravers',
    lesson: null,
    notes: 'No piece work today.',
    measurements: [],
  },
  {
    who: 'ruth',
    daysAgo: 15,
    minutes: 120,
    title: 'Marked out the plates',
    lesson: 'plates-and-datum-lines',
    notes: 'Scribed the datum lines from the pillar holes.',
    measurements: [],
  },
  {
    who: 'ruth',
    daysAgo: 8,
    minutes: 160,
    title: 'Turned arbors for the third and fourth wheels',
    lesson: 'turning-and-burnishing-pivots',
    notes: 'Both arbors turned between centres.',
    measurements: [['arbor diameter', 2.5, 'mm']],
  },
  {
    who: 'ruth',
    daysAgo: 2,
    minutes: 140,
    title: 'Broached the fourth-wheel pivot holes',
    lesson: 'broaching-pivot-holes',
    notes: 'Smoothed with the smoothing broach after opening.',
    measurements: [
      ['end shake', 0.12, 'mm'],
      ['side shake', 0.02, 'mm'],
    ],
  },
];

function daysBeforeToday(n: number): string {
  const [y, m, d] = localToday().split('-').map(Number);
  return new Date(Date.UTC(y, m - 1, d - n)).toISOString().slice(0, 10);
}

async function seedOne(spec: DemoEntry, lessons: Map<string, number>, transaction: Transaction) {
  const apprentice = await User.findOne({ where: { email: demoEmail(spec.who) }, transaction });
  if (!apprentice) return;
  // Dates follow the day the demo is loaded, so the weekly chart always has something to show; an entry is found
  // again by apprentice and title alone, so loading on a later day adds nothing.
  const existing = await LogEntry.findOne({ where: { apprenticeId: apprentice.id, title: spec.title }, transaction });
  if (existing) return;
  const entry = await LogEntry.create(
    {
      apprenticeId: apprentice.id,
      date: daysBeforeToday(spec.daysAgo),
      minutes: spec.minutes,
      title: spec.title,
      notes: spec.notes,
      lessonId: (spec.lesson && lessons.get(spec.lesson)) || null,
    },
    { transaction },
  );
  await LogMeasurement.bulkCreate(
    spec.measurements.map(([name, value, unit], i) => ({ entryId: entry.id, position: i + 1, name, value, unit })),
    { transaction },
  );
  if (!spec.feedback) return;
  const mentor = await User.findOne({ where: { email: demoEmail('odile') }, transaction });
  if (!mentor) return;
  const [completeness, measurements, photos] = spec.feedback.grade;
  await LogComment.create({ entryId: entry.id, authorId: mentor.id, body: spec.feedback.comment }, { transaction });
  await LogGrade.create(
    {
      entryId: entry.id,
      mentorId: mentor.id,
      completeness,
      measurements,
      photos,
      comment: spec.feedback.gradeComment,
      entryVersion: entry.version,
    },
    { transaction },
  );
}

/** A few weeks of Ned's and Ruth's bench log in the Autumn Bench class, one entry graded by Odile. */
export async function seedBenchLog(sequelize: Sequelize): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    const course = await Course.findOne({ where: { slug: DEMO_CLASSES.autumn.course }, transaction });
    const rows = course ? await Lesson.findAll({ where: { courseId: course.id }, transaction }) : [];
    const lessons = new Map(rows.map((l) => [l.slug, l.id]));
    for (const spec of ENTRIES) await seedOne(spec, lessons, transaction);
  });
}
