import { Op } from 'sequelize';
import type { Response } from 'superagent';
import { Course, Lesson, Project } from '../../../server/features/courses/course.model';
import { SignOff } from '../../../server/features/record/record.model';
import { Review } from '../../../server/features/reviews/review.model';
import { Submission, SubmissionVersion } from '../../../server/features/submissions/submission.model';
import { makeClass, sentPiece } from './pieces';
import type { TestApp } from './test-app';

/** Supertest parser that collects a binary reply (a PDF, a ZIP) into a Buffer. */
export const binary = (res: Response, done: (err: Error | null, body: Buffer) => void) => {
  const stream = res as unknown as NodeJS.ReadableStream;
  const chunks: Buffer[] = [];
  stream.on('data', (c: Buffer) => chunks.push(c));
  stream.on('end', () => done(null, Buffer.concat(chunks)));
};

type Signed = Awaited<ReturnType<TestApp['signIn']>>;

/** The live projects of a course in lesson order, with the skills their lessons teach. */
export async function courseProjects(slug: string) {
  const course = (await Course.findOne({ where: { slug } }))!;
  const lessons = await Lesson.findAll({
    where: { courseId: course.id, retiredAt: null },
    order: [['position', 'ASC']],
  });
  const projects = await Project.findAll({
    where: { lessonId: { [Op.in]: lessons.map((l) => l.id) }, retiredAt: null },
  });
  return {
    course,
    projects: lessons.flatMap((l) => {
      const p = projects.find((x) => x.lessonId === l.id);
      return p ? [{ project: p, skills: l.skills, lesson: l }] : [];
    }),
  };
}

/** Sends a piece as the apprentice and has the mentor review it through the API. */
export async function reviewedPiece(
  apprentice: Signed,
  mentor: Signed,
  project: Project,
  outcome: 'passed' | 'rework' = 'passed',
) {
  const piece = await sentPiece(apprentice.agent, project.id);
  const res = await mentor.agent.post(`/api/submissions/${piece.id}/reviews`).send({
    scores: Object.fromEntries(project.criteria.map((c) => [c.key, outcome === 'passed' ? 4 : 1])),
    comment: outcome === 'passed' ? 'Clean and square.' : 'Burr left at the edge.',
    pins: [{ uploadId: piece.uploadIds[0], x: 0.4, y: 0.6, note: 'Look here' }],
    outcome,
  });
  if (res.status !== 201) throw new Error(`review failed: ${res.status} ${JSON.stringify(res.body)}`);
  return piece;
}

/** A class on the course with its mentor and one apprentice, as record tests need them. */
export async function recordClass(t: TestApp, slug = 'going-train-wall-regulator') {
  const cls = await makeClass(t, slug);
  return { ...cls, apprentice: cls.apprentices[0] };
}

/**
 * Every project passed and every skill signed off, written straight into the tables: for tests of what comes after
 * (certificates), not of how it got there.
 */
export async function finishCourse(apprenticeId: number, mentorId: number, slug: string) {
  const { course, projects } = await courseProjects(slug);
  for (const { project } of projects) {
    const submission = await Submission.create({
      apprenticeId,
      projectId: project.id,
      status: 'passed',
      currentVersion: 1,
      sentAt: new Date(),
    });
    const version = await SubmissionVersion.create({
      submissionId: submission.id,
      number: 1,
      notes: 'Finished.',
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
  }
  for (const skill of course.skills) {
    await SignOff.create({
      apprenticeId,
      courseId: course.id,
      skillKey: skill.key,
      mentorId,
      note: 'Seen at the bench.',
      evidence: [],
    });
  }
  return course;
}
