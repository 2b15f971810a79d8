import { QueryTypes, type Sequelize } from 'sequelize';
import { grade } from '@shared/grading/score';
import type { ReviewInput, RecentReview } from '@shared/schemas/review';
import type { SubmissionDTO } from '@shared/schemas/submission';
import type { UserDTO } from '@shared/schemas/user';
import { AppError } from '../../lib/app-error';
import { canSeeSubmission, reachSql } from '../classes/access';
import { Project } from '../courses/course.model';
import { loadSubmissionDTO } from '../submissions/submission.mapper';
import { Submission, SubmissionPhoto, SubmissionVersion } from '../submissions/submission.model';
import { Pin, Review } from './review.model';

const refuse = (field: string, message: string) => AppError.badRequest(message, { [field]: [message] });

/** Checks the scores against the project's criteria and the pins against the photos of the version under review. */
function checkReview(project: Project, input: ReviewInput, photoUploadIds: Set<number>) {
  const keys = new Set(project.criteria.map((c) => c.key));
  const missing = project.criteria.filter((c) => input.scores[c.key] === undefined).map((c) => c.label);
  if (missing.length) throw refuse('scores', `Score every criterion; missing: ${missing.join(', ')}.`);
  const unknown = Object.keys(input.scores).filter((k) => !keys.has(k));
  if (unknown.length) throw refuse('scores', `This project has no criterion called ${unknown.join(', ')}.`);
  const stray = input.pins.findIndex((p) => !photoUploadIds.has(p.uploadId));
  if (stray >= 0) throw refuse('pins', `Pin ${stray + 1} is not on one of the photos of this version.`);
  const result = grade(project.criteria, input.scores, project.passMark);
  if (input.outcome === 'passed' && !result.canPass) {
    const why = result.notShown.length
      ? 'a criterion scored 0 (not shown) cannot pass'
      : `the weighted score ${result.weighted!.toFixed(2)} is below the pass mark ${project.passMark.toFixed(2)}`;
    throw refuse('outcome', `This piece cannot pass: ${why}. Ask for rework instead.`);
  }
  return result.weighted!;
}

/**
 * Records a mentor's review of the version waiting. Who may review: a mentor who has the piece in reach (access.ts),
 * or the admin; anyone else is told the submission does not exist. Returns the updated submission.
 */
export async function createReview(sequelize: Sequelize, viewer: UserDTO, submissionId: number, input: ReviewInput) {
  const found = submissionId > 0 ? await Submission.findByPk(submissionId) : null;
  if (
    !found ||
    found.status === 'draft' ||
    !(await canSeeSubmission(viewer, found)) ||
    found.apprenticeId === viewer.id
  ) {
    throw AppError.notFound('That submission');
  }
  const project = (await Project.findByPk(found.projectId))!;
  const review = await sequelize.transaction(async (transaction) => {
    const submission = (await Submission.findByPk(submissionId, { transaction }))!;
    if (submission.status !== 'waiting')
      throw AppError.conflict('This piece is not waiting for review; it may have been reviewed already.');
    const version = (await SubmissionVersion.findOne({
      where: { submissionId, number: submission.currentVersion },
      transaction,
    }))!;
    const photos = await SubmissionPhoto.findAll({
      where: { versionId: version.id },
      attributes: ['uploadId'],
      transaction,
    });
    const weightedScore = checkReview(project, input, new Set(photos.map((p) => p.uploadId)));
    const created = await Review.create(
      {
        versionId: version.id,
        mentorId: viewer.id,
        scores: input.scores,
        comment: input.comment,
        weightedScore,
        outcome: input.outcome,
      },
      { transaction },
    );
    await Pin.bulkCreate(
      input.pins.map((p, i) => ({
        reviewId: created.id,
        uploadId: p.uploadId,
        number: i + 1,
        x: p.x,
        y: p.y,
        note: p.note,
      })),
      { transaction },
    );
    await submission.update({ status: input.outcome }, { transaction });
    return { version: version.number, weightedScore, passMark: project.passMark, pinCount: input.pins.length };
  });
  const submission = (await loadSubmissionDTO(sequelize, submissionId, false)) as SubmissionDTO;
  return { submission, ...review };
}

/** Recent reviews: of the apprentice's own pieces, written by the mentor of pieces still in reach, or all for the admin. */
export async function recentReviews(sequelize: Sequelize, viewer: UserDTO, limit: number): Promise<RecentReview[]> {
  const where =
    viewer.role === 'apprentice'
      ? 's.apprenticeId = :userId'
      : viewer.role === 'mentor'
        ? `r.mentorId = :userId AND ${reachSql(viewer, 's.apprenticeId', '(SELECT l.courseId FROM lessons l WHERE l.id = p.lessonId)')}`
        : '1 = 1';
  const rows = await sequelize.query<Record<string, string | number>>(
    `SELECT r.id, s.id AS submissionId, p.title AS projectTitle, v.number AS version, s.apprenticeId, a.name AS apprenticeName,
            r.mentorId, m.name AS mentorName, r.outcome, r.weightedScore, r.createdAt,
            (SELECT COUNT(*) FROM pins WHERE pins.reviewId = r.id) AS pinCount
     FROM reviews r
     JOIN submission_versions v ON v.id = r.versionId
     JOIN submissions s ON s.id = v.submissionId
     JOIN projects p ON p.id = s.projectId
     JOIN users a ON a.id = s.apprenticeId
     JOIN users m ON m.id = r.mentorId
     WHERE ${where}
     ORDER BY r.createdAt DESC, r.id DESC
     LIMIT :limit`,
    { replacements: { userId: viewer.id, limit }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({
    id: Number(r.id),
    submissionId: Number(r.submissionId),
    projectTitle: String(r.projectTitle),
    version: Number(r.version),
    apprentice: { id: Number(r.apprenticeId), name: String(r.apprenticeName) },
    mentor: { id: Number(r.mentorId), name: String(r.mentorName) },
    outcome: r.outcome === 'passed' ? 'passed' : 'rework',
    weightedScore: Number(r.weightedScore),
    pinCount: Number(r.pinCount),
    createdAt: new Date(String(r.createdAt)).toISOString(),
  }));
}
