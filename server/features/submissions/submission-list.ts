import { Op } from 'sequelize';
import type { SubmissionListItem } from '@shared/schemas/submission';
import { Course, Lesson, Project } from '../courses/course.model';
import { Review } from '../reviews/review.model';
import { uploadDTO } from '../uploads/uploads.service';
import { Upload } from '../uploads/upload.model';
import { type Submission, SubmissionPhoto, SubmissionVersion } from './submission.model';

const byId = <T extends { id: number }>(rows: T[]) => new Map(rows.map((r) => [r.id, r]));

/** List rows with the project's names, the first photo and the latest review, in a fixed number of queries. */
export async function listItems(rows: Submission[], ownerView: boolean): Promise<SubmissionListItem[]> {
  if (rows.length === 0) return [];
  const projects = byId(await Project.findAll({ where: { id: { [Op.in]: rows.map((r) => r.projectId) } } }));
  const lessons = byId(
    await Lesson.findAll({ where: { id: { [Op.in]: [...projects.values()].map((p) => p.lessonId) } } }),
  );
  const courses = byId(
    await Course.findAll({ where: { id: { [Op.in]: [...lessons.values()].map((l) => l.courseId) } } }),
  );
  const versions = await SubmissionVersion.findAll({
    where: { submissionId: { [Op.in]: rows.map((r) => r.id) }, ...(ownerView ? {} : { sentAt: { [Op.ne]: null } }) },
    include: [
      {
        model: SubmissionPhoto,
        as: 'photos',
        where: { position: 1 },
        required: false,
        include: [{ model: Upload, as: 'upload' }],
      },
    ],
  });
  const reviews = await Review.findAll({ where: { versionId: { [Op.in]: versions.map((v) => v.id) } } });
  const reviewOf = new Map(reviews.map((r) => [r.versionId, r]));

  return rows.map((s) => {
    const project = projects.get(s.projectId)!;
    const lesson = lessons.get(project.lessonId)!;
    const course = courses.get(lesson.courseId)!;
    const mine = versions.filter((v) => v.submissionId === s.id).sort((a, b) => b.number - a.number);
    const shown = mine[0];
    const firstPhoto = shown?.photos?.[0]?.upload;
    const lastReview = mine.map((v) => reviewOf.get(v.id)).find(Boolean);
    return {
      id: s.id,
      status: s.status,
      project: { id: project.id, title: project.title },
      lesson: { slug: lesson.slug, title: lesson.title },
      course: { slug: course.slug, title: course.title },
      currentVersion: shown?.number ?? s.currentVersion,
      sentAt: s.sentAt ? s.sentAt.toISOString() : null,
      updatedAt: s.updatedAt.toISOString(),
      thumbUrl: firstPhoto ? uploadDTO(firstPhoto).thumbUrl : null,
      lastReview: lastReview
        ? {
            outcome: lastReview.outcome,
            weightedScore: lastReview.weightedScore,
            createdAt: lastReview.createdAt.toISOString(),
          }
        : null,
    };
  });
}
