import path from 'node:path';
import type { Sequelize } from 'sequelize';
import { weightedScore } from '@shared/grading/score';
import type { UploadDTO } from '@shared/schemas/upload';
import { User } from '../features/auth/user.model';
import { Course, Lesson, Project } from '../features/courses/course.model';
import { notify } from '../features/notifications/notifications.service';
import { Pin, Review } from '../features/reviews/review.model';
import { Submission, SubmissionPhoto, SubmissionVersion } from '../features/submissions/submission.model';
import { assertOwnUploads, storeUpload } from '../features/uploads/uploads.service';
import { demoPhoto, type DemoPhotoKind } from './demo-photos';
import { DEMO_CLASSES, demoEmail } from './people';

interface DemoVersion {
  daysAgo: number;
  notes: string;
  photos: [DemoPhotoKind, number, string][];
  /** Invented scores for the demo, in the order of the project's criteria, with pins [photo index, x, y, note]. */
  review?: {
    mentor: string;
    daysAgo: number;
    outcome: 'passed' | 'rework';
    scores: number[];
    comment: string;
    pins: [number, number, number, string][];
  };
}
export interface DemoPiece {
  who: string;
  course: keyof typeof DEMO_CLASSES;
  lesson: string;
  versions: DemoVersion[];
}

const PIECES: DemoPiece[] = [
  {
    who: 'ned',
    course: 'autumn',
    lesson: 'turning-and-burnishing-pivots',
    versions: [
      {
        daysAgo: 20,
        notes: 'Both pivots turned with the graver and burnished. Measured **1.02 mm** and **1.01 mm**.',
        photos: [['pivots', 0, 'Both pivots, rule for scale']],
        review: {
          mentor: 'odile',
          daysAgo: 18,
          outcome: 'rework',
          scores: [3, 1, 2, 3],
          comment: 'Sizes are good. The shoulder on the back pivot is rounded over: it must be square.',
          pins: [[0, 0.84, 0.46, 'Rounded shoulder here']],
        },
      },
      {
        daysAgo: 15,
        notes: 'Re-cut the back shoulder square with a sharp graver, then burnished again.',
        photos: [['pivots', 3, 'Both pivots after recutting the shoulder']],
        review: {
          mentor: 'odile',
          daysAgo: 14,
          outcome: 'passed',
          scores: [3, 3, 3, 3],
          comment: 'Square and bright. Passed.',
          pins: [],
        },
      },
    ],
  },
  {
    who: 'ned',
    course: 'autumn',
    lesson: 'broaching-pivot-holes',
    versions: [
      {
        daysAgo: 6,
        notes:
          'Broached from both faces. The right hole went a little large, so I stopped early on it.\n\n- pilot 0.8 mm\n- finished with the smoothing broach',
        photos: [
          ['holes', 0, 'Both holes, front face'],
          ['arbor', 3, 'Arbor standing in the left hole against the square'],
        ],
        review: {
          mentor: 'odile',
          daysAgo: 4,
          outcome: 'rework',
          scores: [2, 3, 3, 1],
          comment:
            'Good fit. Two things to rework:\n\n1. the arbor leans in the left hole, so the hole was cut to one side;\n2. a burr is left in the oil sink of the right hole.',
          pins: [
            [1, 0.52, 0.3, 'The arbor leans away from the square: broach more from the other face'],
            [0, 0.64, 0.44, 'Burr left at the edge of the oil sink'],
          ],
        },
      },
    ],
  },
  {
    who: 'ruth',
    course: 'autumn',
    lesson: 'broaching-pivot-holes',
    versions: [
      {
        daysAgo: 2,
        notes: 'Both holes opened from both faces; tilt checked four ways.',
        photos: [
          ['holes', 1, 'Front face'],
          ['arbor', 0, 'Upright against the square'],
        ],
      },
    ],
  },
  {
    who: 'tamsin',
    course: 'autumn',
    lesson: 'plates-and-datum-lines',
    versions: [
      {
        daysAgo: 3,
        notes: 'Plates pinned together, datum lines scribed from the reference edges.',
        photos: [['plates', 0, 'Both plates, inside faces']],
      },
    ],
  },
  {
    who: 'jago',
    course: 'autumn',
    lesson: 'turning-and-burnishing-pivots',
    versions: [
      {
        daysAgo: 9,
        notes: 'First try at burnishing.',
        photos: [['pivots', 5, 'Pivots']],
        review: {
          mentor: 'odile',
          daysAgo: 7,
          outcome: 'rework',
          scores: [2, 2, 1, 2],
          comment: 'The burnish is patchy; work it until the turning marks are gone.',
          pins: [[0, 0.15, 0.46, 'Turning marks still visible']],
        },
      },
      {
        daysAgo: 1,
        notes: 'Burnished again until the marks were gone.',
        photos: [['pivots', 1, 'Pivots after burnishing again']],
      },
    ],
  },
  {
    who: 'mabli',
    course: 'spring',
    lesson: 'the-click',
    versions: [
      {
        daysAgo: 2,
        notes: 'Click filed from gauge plate, hardened and tempered to blue.',
        photos: [['click', 0, 'The click, top face']],
      },
    ],
  },
];

export const daysAgo = (n: number) => new Date(Date.now() - n * 24 * 60 * 60 * 1000);

async function stamp(sequelize: Sequelize, table: string, id: number, fields: Record<string, Date>) {
  const sets = Object.keys(fields)
    .map((k) => `"${k}" = :${k}`)
    .join(', ');
  await sequelize.query(`UPDATE "${table}" SET ${sets} WHERE id = :id`, { replacements: { ...fields, id } });
}

/**
 * Pieces for the demo: a few waiting in each mentor's queue, Ned's pivots passed on the second version, and Ned's
 * pivot holes sent back for rework with two pins. Idempotent: a piece that exists is left alone.
 */
export async function seedSubmissions(sequelize: Sequelize): Promise<void> {
  await seedPieces(sequelize, PIECES);
}

/** Creates each piece with its versions, photos, reviews and pins, unless the apprentice already has one for it. */
export async function seedPieces(sequelize: Sequelize, pieces: DemoPiece[]): Promise<void> {
  // The photos go beside the database, in the same data folder the running app serves them from.
  const dataDir = path.dirname(String((sequelize as unknown as { options: { storage: string } }).options.storage));
  for (const piece of pieces) {
    const apprentice = await User.findOne({ where: { email: demoEmail(piece.who) } });
    const course = await Course.findOne({ where: { slug: DEMO_CLASSES[piece.course].course } });
    const lesson = course && (await Lesson.findOne({ where: { courseId: course.id, slug: piece.lesson } }));
    const project = lesson && (await Project.findOne({ where: { lessonId: lesson.id, retiredAt: null } }));
    if (!apprentice || !project) continue;
    if (await Submission.findOne({ where: { apprenticeId: apprentice.id, projectId: project.id } })) continue;

    const last = piece.versions[piece.versions.length - 1];
    const status = last.review?.outcome ?? 'waiting';
    const submission = await Submission.create({
      apprenticeId: apprentice.id,
      projectId: project.id,
      status,
      currentVersion: piece.versions.length,
      sentAt: daysAgo(last.daysAgo),
    });
    await stamp(sequelize, 'submissions', submission.id, {
      createdAt: daysAgo(piece.versions[0].daysAgo),
      updatedAt: daysAgo(last.review?.daysAgo ?? last.daysAgo),
    });

    for (const [i, v] of piece.versions.entries()) {
      const uploads: UploadDTO[] = [];
      for (const [kind, variant] of v.photos)
        uploads.push(await storeUpload(dataDir, apprentice.id, await demoPhoto(kind, variant), null));
      await assertOwnUploads(
        apprentice.id,
        uploads.map((u) => u.id),
      );
      const version = await SubmissionVersion.create({
        submissionId: submission.id,
        number: i + 1,
        notes: v.notes,
        sentAt: daysAgo(v.daysAgo),
        logEntryIds: [],
        calculationIds: [],
      });
      await stamp(sequelize, 'submission_versions', version.id, {
        createdAt: daysAgo(v.daysAgo),
        updatedAt: daysAgo(v.daysAgo),
      });
      await SubmissionPhoto.bulkCreate(
        v.photos.map(([, , caption], n) => ({
          versionId: version.id,
          uploadId: uploads[n].id,
          position: n + 1,
          caption,
        })),
      );
      if (!v.review) continue;
      const mentor = await User.findOne({ where: { email: demoEmail(v.review.mentor) } });
      if (!mentor) continue;
      const scores = scoresOf(project, v.review.scores);
      const review = await Review.create({
        versionId: version.id,
        mentorId: mentor.id,
        scores,
        comment: v.review.comment,
        weightedScore: weightedScore(project.criteria, scores)!,
        outcome: v.review.outcome,
      });
      await stamp(sequelize, 'reviews', review.id, {
        createdAt: daysAgo(v.review.daysAgo),
        updatedAt: daysAgo(v.review.daysAgo),
      });
      await Pin.bulkCreate(
        v.review.pins.map(([photo, x, y, note], n) => ({
          reviewId: review.id,
          uploadId: uploads[photo].id,
          number: n + 1,
          x,
          y,
          note,
        })),
      );
    }
    await tellPeople(piece, apprentice, project, submission.id, status);
  }
}

const scoresOf = (project: Project, values: number[]) =>
  Object.fromEntries(project.criteria.map((c, i) => [c.key, values[i] ?? 0]));

async function tellPeople(
  piece: DemoPiece,
  apprentice: User,
  project: Project,
  submissionId: number,
  status: 'waiting' | 'passed' | 'rework',
) {
  if (status === 'waiting') {
    const mentorKey = piece.course === 'autumn' ? 'odile' : 'bram';
    const mentor = await User.findOne({ where: { email: demoEmail(mentorKey) } });
    if (mentor) {
      await notify(
        mentor.id,
        {
          kind: 'submission-sent',
          title: `${apprentice.name} sent “${project.title}”`,
          body: `Version ${piece.versions.length} is waiting in your review queue.`,
          link: `/review/${submissionId}`,
        },
        { email: false },
      );
    }
  } else {
    const word = status === 'passed' ? 'passed' : 'needs rework';
    await notify(
      apprentice.id,
      {
        kind: `submission-${status}`,
        title: `“${project.title}” ${word}`,
        body: 'Your mentor has reviewed your piece. Read the scores and the notes on your photos.',
        link: `/pieces/${submissionId}`,
      },
      { email: false },
    );
  }
}
