import { Op, type Sequelize } from 'sequelize';
import type { ProjectSummary, ReviewDTO, SubmissionDTO, SubmissionPhotoDTO } from '@shared/schemas/submission';
import { User } from '../auth/user.model';
import { Course, Lesson, Project } from '../courses/course.model';
import { Pin, Review } from '../reviews/review.model';
import { uploadDTO } from '../uploads/uploads.service';
import { Upload } from '../uploads/upload.model';
import { resolveLinks } from './linked-records';
import { Submission, SubmissionPhoto, SubmissionVersion } from './submission.model';

const iso = (d: Date | null | undefined) => (d ? new Date(d).toISOString() : null);

export async function projectSummary(projectId: number): Promise<ProjectSummary | null> {
  const project = await Project.findByPk(projectId);
  const lesson = project && (await Lesson.findByPk(project.lessonId));
  const course = lesson && (await Course.findByPk(lesson.courseId));
  if (!project || !lesson || !course) return null;
  return {
    id: project.id,
    title: project.title,
    brief: project.brief,
    passMark: project.passMark,
    criteria: project.criteria,
    lesson: { id: lesson.id, slug: lesson.slug, title: lesson.title },
    course: { id: course.id, slug: course.slug, title: course.title },
  };
}

const photoDTO = (p: SubmissionPhoto & { upload?: Upload }): SubmissionPhotoDTO => {
  const { id: _id, ...urls } = uploadDTO(p.upload!);
  return { ...urls, uploadId: p.uploadId, position: p.position, caption: p.caption };
};

const reviewDTO = (r: Review, mentor: Pick<User, 'id' | 'name'> | null | undefined): ReviewDTO => ({
  id: r.id,
  versionId: r.versionId,
  mentor: { id: r.mentorId, name: mentor?.name ?? 'A former mentor' },
  scores: r.scores,
  comment: r.comment,
  weightedScore: r.weightedScore,
  outcome: r.outcome,
  createdAt: iso(r.createdAt)!,
  pins: [...(r.pins ?? [])]
    .sort((a, b) => a.number - b.number)
    .map((p: Pin) => ({ id: p.id, number: p.number, uploadId: p.uploadId, x: p.x, y: p.y, note: p.note })),
});

/**
 * The whole submission as its readers see it. Someone other than the apprentice sees only versions that were sent:
 * a draft is the apprentice's own until it goes out.
 */
export async function loadSubmissionDTO(
  sequelize: Sequelize,
  id: number,
  ownerView: boolean,
): Promise<SubmissionDTO | null> {
  const submission = await Submission.findByPk(id, {
    include: [
      { model: User, as: 'apprentice', attributes: ['id', 'name'] },
      {
        model: SubmissionVersion,
        as: 'versions',
        include: [{ model: SubmissionPhoto, as: 'photos', include: [{ model: Upload, as: 'upload' }] }],
      },
    ],
  });
  const project = submission && (await projectSummary(submission.projectId));
  if (!submission || !project) return null;
  const versions = [...(submission.versions ?? [])]
    .filter((v) => ownerView || v.sentAt)
    .sort((a, b) => a.number - b.number);
  const reviews = await Review.findAll({
    where: { versionId: { [Op.in]: versions.map((v) => v.id) } },
    include: [
      { model: Pin, as: 'pins' },
      { model: User, as: 'mentor', attributes: ['id', 'name'] },
    ],
  });
  const reviewOf = new Map(reviews.map((r) => [r.versionId, r]));
  return {
    id: submission.id,
    status: submission.status,
    apprentice: { id: submission.apprenticeId, name: submission.apprentice?.name ?? '' },
    project,
    currentVersion: submission.currentVersion,
    sentAt: iso(submission.sentAt),
    createdAt: iso(submission.createdAt)!,
    updatedAt: iso(submission.updatedAt)!,
    versions: await Promise.all(
      versions.map(async (v) => {
        const review = reviewOf.get(v.id);
        return {
          id: v.id,
          number: v.number,
          notes: v.notes,
          sentAt: iso(v.sentAt),
          photos: [...(v.photos ?? [])].sort((a, b) => a.position - b.position).map(photoDTO),
          logEntries: await resolveLinks(sequelize, 'logEntries', v.logEntryIds),
          calculations: await resolveLinks(sequelize, 'calculations', v.calculationIds),
          review: review ? reviewDTO(review, review.mentor) : null,
        };
      }),
    ),
  };
}
