import { Op } from 'sequelize';
import { localToday } from '@shared/schemas/log-entry';
import { PasswordReset } from '../../../server/features/auth/password-reset.model';
import { LogEntry } from '../../../server/features/bench-log/log-entry.model';
import { Calculation } from '../../../server/features/calculations/calculation.model';
import { ClassMentor, Enrolment, GuildClass } from '../../../server/features/classes/class.model';
import { Invitation } from '../../../server/features/classes/invitation.model';
import { Course, Lesson, Project } from '../../../server/features/courses/course.model';
import { Notification } from '../../../server/features/notifications/notification.model';
import { Certificate, SignOff } from '../../../server/features/record/record.model';
import { newCertificateCode } from '../../../server/features/record/certificates.service';
import { Pin, Review } from '../../../server/features/reviews/review.model';
import { Submission, SubmissionVersion } from '../../../server/features/submissions/submission.model';
import { newLinkToken } from '../../../server/lib/link-token';
import { sentPiece, makeJpeg, uploadPhoto } from './pieces';
import type { TestApp } from './test-app';

/** The eight people every route is tried as, in the order the matrix lists their expected statuses. */
export const ACTORS = [
  'anon',
  'owner',
  'classmate',
  'outsider',
  'mentor',
  'otherMentor',
  'formerMentor',
  'admin',
] as const;
export type Actor = (typeof ACTORS)[number];

export type Agent = ReturnType<TestApp['anon']>;

const TRAIN = 'going-train-wall-regulator';
const SPRINGS = 'springs-heat-treatment';

async function liveProjects(slug: string) {
  const course = (await Course.findOne({ where: { slug } }))!;
  const lessons = await Lesson.findAll({
    where: { courseId: course.id, retiredAt: null },
    order: [['position', 'ASC']],
  });
  const projects = await Project.findAll({
    where: { lessonId: { [Op.in]: lessons.map((l) => l.id) }, retiredAt: null },
  });
  const byLesson = new Map(projects.map((p) => [p.lessonId, p]));
  return { course, lessons, projects: lessons.flatMap((l) => byLesson.get(l.id) ?? []) };
}

async function classOn(courseId: number, name: string, capacity = 12) {
  return GuildClass.create({ name, courseId, startsOn: '2026-09-07', endsOn: '2026-12-18', capacity });
}

let serial = 0;
const fresh = (what: string) => `${what}-${Date.now().toString(36)}-${(serial += 1)}@example.test`;

/**
 * Everyone and everything a route needs to be tried as each actor. The owner is an apprentice actively enrolled in
 * the mentor's class (going-train course) with the classmate; the outsider is in the other mentor's class (springs);
 * the former mentor taught the owner in a class the owner was withdrawn from, on the same course.
 */
export async function makeSecurityCast(t: TestApp) {
  const train = await liveProjects(TRAIN);
  const springs = await liveProjects(SPRINGS);
  const agents = {} as Record<Actor, Agent>;
  const users = {} as Record<Exclude<Actor, 'anon'>, Awaited<ReturnType<TestApp['createUser']>>>;
  agents.anon = t.anon();
  for (const [actor, role] of [
    ['owner', 'apprentice'],
    ['classmate', 'apprentice'],
    ['outsider', 'apprentice'],
    ['mentor', 'mentor'],
    ['otherMentor', 'mentor'],
    ['formerMentor', 'mentor'],
    ['admin', 'admin'],
  ] as const) {
    const signed = await t.signIn(role);
    agents[actor] = signed.agent;
    users[actor] = signed.user;
  }
  const spare = await t.createUser('apprentice');

  const classA = await classOn(train.course.id, 'Autumn Bench (matrix)');
  const classB = await classOn(springs.course.id, 'Spring Bench (matrix)');
  const classW = await classOn(train.course.id, 'Former Bench (matrix)');
  const office = await classOn(train.course.id, 'Invitations (matrix)', 500);
  await ClassMentor.bulkCreate([
    { classId: classA.id, userId: users.mentor.id },
    { classId: classB.id, userId: users.otherMentor.id },
    { classId: classW.id, userId: users.formerMentor.id },
  ]);
  await Enrolment.bulkCreate([
    { classId: classA.id, userId: users.owner.id },
    { classId: classA.id, userId: users.classmate.id },
    { classId: classA.id, userId: spare.id },
    { classId: classB.id, userId: users.outsider.id },
    { classId: classW.id, userId: users.owner.id, status: 'withdrawn' },
  ]);

  const [waitingProject, draftProject] = train.projects;
  const lesson = (await Lesson.findByPk(waitingProject.lessonId))!;
  const waiting = await sentPiece(agents.owner, waitingProject.id);
  const draftPhoto = (await uploadPhoto(agents.owner, await makeJpeg())).body.id as number;
  const draft = await agents.owner.post('/api/submissions').send({
    projectId: draftProject.id,
    notes: 'Plates drilled.',
    photos: [{ uploadId: draftPhoto, caption: 'Front' }],
  });
  const entry = await agents.owner.post('/api/log-entries').send({
    date: localToday(),
    minutes: 45,
    title: 'Turned the third-wheel pivots',
    lessonId: lesson.id,
  });
  const calculation = await agents.owner.post('/api/calculations').send({
    calculator: 'broach-taper',
    inputs: { taperPerMm: 0.02, refDiameterMm: 0.5, targetDiameterMm: 1.05, plateThicknessMm: 2, pivotDiameterMm: 1 },
  });
  const notice = await Notification.create({
    userId: users.owner.id,
    kind: 'submission-passed',
    title: 'A notice for the matrix',
    body: 'Only its owner may read it.',
    link: null,
  });
  const openInvitation = await invitation(office.id);
  const passedId = await passedPiece(users.owner.id, users.mentor.id, train.projects[2]);
  const certificate = await Certificate.create({
    code: newCertificateCode(),
    apprenticeId: users.owner.id,
    courseId: train.course.id,
    issuedById: users.admin.id,
    issuedAt: new Date(),
  });
  for (const res of [draft, entry, calculation]) {
    if (res.status !== 201) throw new Error(`cast: ${res.status} ${JSON.stringify(res.body)}`);
  }

  return {
    t,
    jpeg: await makeJpeg(),
    agents,
    users,
    spare,
    classA,
    office,
    train,
    springs,
    lesson,
    waitingProject,
    waiting,
    draftId: draft.body.id as number,
    entryId: entry.body.id as number,
    calculationId: calculation.body.id as number,
    noticeId: notice.id,
    openInvitation,
    certificate,
    /** A sign-off of the owner's pivot-holes skill needs this passed piece as evidence. */
    signOffBody: () => ({
      courseId: train.course.id,
      skillKey: 'pivot-holes',
      note: 'Upright holes, even tilt.',
      evidence: [{ kind: 'submission', id: passedId }],
    }),
    /** No standing sign-off of that skill, so that each signer meets the same state. */
    async noStandingSignOff() {
      await SignOff.update(
        { withdrawnAt: new Date(), withdrawReason: 'matrix' },
        { where: { apprenticeId: users.owner.id, skillKey: 'pivot-holes', withdrawnAt: null } },
      );
    },
    /** A standing sign-off by the class's mentor, to be withdrawn. */
    async freshSignOff() {
      await this.noStandingSignOff();
      const row = await SignOff.create({
        apprenticeId: users.owner.id,
        courseId: train.course.id,
        skillKey: 'pivot-holes',
        mentorId: users.mentor.id,
        note: 'Seen.',
        evidence: [{ kind: 'submission', id: passedId }],
      });
      return row.id;
    },
    async freshCertificate() {
      const row = await Certificate.create({
        code: newCertificateCode(),
        apprenticeId: users.owner.id,
        courseId: train.course.id,
        issuedById: users.admin.id,
        issuedAt: new Date(),
      });
      return row.id;
    },
    fresh,

    /** The waiting piece, put back to waiting with no review, so that every reviewer meets the same state. */
    async waitingAgain() {
      const versions = await SubmissionVersion.findAll({ where: { submissionId: waiting.id } });
      const reviews = await Review.findAll({ where: { versionId: { [Op.in]: versions.map((v) => v.id) } } });
      await Pin.destroy({ where: { reviewId: { [Op.in]: reviews.map((r) => r.id) } } });
      await Review.destroy({ where: { id: { [Op.in]: reviews.map((r) => r.id) } } });
      await Submission.update({ status: 'waiting' }, { where: { id: waiting.id } });
      return waiting.id;
    },
    /** The draft piece, made a draft again after a successful send. */
    async draftAgain() {
      const id = draft.body.id as number;
      await SubmissionVersion.update({ sentAt: null }, { where: { submissionId: id } });
      await Submission.update({ status: 'draft', sentAt: null }, { where: { id } });
      return id;
    },
    async spareEntry() {
      const row = await LogEntry.create({
        apprenticeId: users.owner.id,
        date: localToday(),
        minutes: 1,
        title: 'Swept the bench',
        notes: '',
        lessonId: null,
      });
      return row.id;
    },
    async spareCalculation() {
      const row = await Calculation.create({
        userId: users.owner.id,
        calculator: 'broach-taper',
        title: 'Spare result',
        inputs: {},
        results: {},
        warnings: [],
      });
      return row.id;
    },
    invitation: () => invitation(office.id),
    /** A working reset link of a fresh account that belongs to none of the actors. */
    async resetToken() {
      const user = await t.createUser('apprentice', { email: fresh('reset') });
      const link = newLinkToken(3600_000);
      await PasswordReset.create({
        userId: user.id,
        tokenHash: link.tokenHash,
        expiresAt: link.expiresAt,
        usedAt: null,
      });
      return link.token;
    },
  };

  /** A piece of the owner's, passed by the mentor, written straight into the tables. */
  async function passedPiece(apprenticeId: number, mentorId: number, project: Project) {
    const piece = await Submission.create({
      apprenticeId,
      projectId: project.id,
      status: 'passed',
      sentAt: new Date(),
    });
    const version = await SubmissionVersion.create({
      submissionId: piece.id,
      number: 1,
      notes: 'Both holes upright.',
      sentAt: new Date(),
      logEntryIds: [],
      calculationIds: [],
    });
    await Review.create({
      versionId: version.id,
      mentorId,
      scores: Object.fromEntries(project.criteria.map((c) => [c.key, 3])),
      comment: 'Sound.',
      weightedScore: 3,
      outcome: 'passed',
    });
    return piece.id;
  }

  async function invitation(classId: number) {
    const link = newLinkToken(7 * 24 * 3600_000);
    const row = await Invitation.create({
      classId,
      email: fresh('invitee'),
      name: null,
      tokenHash: link.tokenHash,
      expiresAt: link.expiresAt,
      invitedById: null,
    });
    return { id: row.id, token: link.token };
  }
}

export type SecurityCast = Awaited<ReturnType<typeof makeSecurityCast>>;

/** "METHOD /api/path" for every route the app answers, read from Express's own router stack. */
export function appRoutes(app: TestApp['app']): string[] {
  const found: string[] = [];
  type Layer = {
    route?: { path: string; methods: Record<string, boolean> };
    rawPath?: string;
    handle?: { stack?: Layer[] };
  };
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        const path = `${prefix}${layer.route.path}`.replace(/(.)\/$/, '$1');
        for (const method of Object.keys(layer.route.methods)) found.push(`${method.toUpperCase()} ${path}`);
      } else if (layer.handle?.stack) {
        if (typeof layer.rawPath !== 'string') throw new Error('a router is mounted on a path that is not a string');
        walk(layer.handle.stack, prefix + (layer.rawPath === '/' ? '' : layer.rawPath));
      }
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '');
  return found.filter((r) => r.includes(' /api'));
}
