import { Op } from 'sequelize';
import type { ApprenticeRecord } from '@shared/schemas/record';
import { User } from '../auth/user.model';
import { LogEntryUpload, LogGrade } from '../bench-log/log-entry.model';
import { Project } from '../courses/course.model';
import { Pin, Review } from '../reviews/review.model';
import { Submission, SubmissionPhoto, SubmissionVersion } from '../submissions/submission.model';
import { Upload } from '../uploads/upload.model';

export interface PortfolioPhoto {
  uploadId: number;
  fileKey: string;
  width: number;
  height: number;
  caption: string;
  /** Its name inside the ZIP's photos/ folder. */
  name: string;
}

interface PieceDetail {
  review: {
    mentor: string;
    comment: string;
    scores: { label: string; score: number }[];
    pins: { number: number; note: string; uploadId: number; x: number; y: number }[];
  } | null;
  photos: PortfolioPhoto[];
}

export interface PortfolioDetails {
  pieces: Map<number, PieceDetail>;
  entries: Map<number, { comment: string; photos: PortfolioPhoto[] }>;
  /** Every photo once, for the ZIP. */
  photos: PortfolioPhoto[];
}

const photoOf = (u: Upload, name: string, caption = ''): PortfolioPhoto => ({
  uploadId: u.id,
  fileKey: u.fileKey,
  width: u.width,
  height: u.height,
  caption,
  name,
});

/**
 * What the portfolio shows beyond the record itself: for each piece, the photos of the version last reviewed (or last
 * sent) with that review's scores, comment and pins; for each log entry, its photos and the latest grade's comment.
 */
export async function portfolioDetails(record: ApprenticeRecord): Promise<PortfolioDetails> {
  const items = record.courses.flatMap((c) => c.skills.flatMap((s) => s.evidence));
  const pieceIds = [...new Set(items.filter((e) => e.kind === 'submission').map((e) => e.id))];
  const entryIds = [...new Set(items.filter((e) => e.kind === 'log-entry').map((e) => e.id))];
  const pieces = new Map<number, PieceDetail>();
  const entries = new Map<number, { comment: string; photos: PortfolioPhoto[] }>();

  const submissions = await Submission.findAll({ where: { id: { [Op.in]: pieceIds } } });
  for (const submission of submissions) {
    const project = await Project.findByPk(submission.projectId);
    const versions = await SubmissionVersion.findAll({
      where: { submissionId: submission.id, sentAt: { [Op.ne]: null } },
      include: [
        { model: Review, as: 'review', include: [{ model: Pin, as: 'pins' }] },
        { model: SubmissionPhoto, as: 'photos', include: [{ model: Upload, as: 'upload' }] },
      ],
      order: [['number', 'DESC']],
    });
    const version = versions.find((v) => (v as SubmissionVersion & { review?: Review }).review) ?? versions[0];
    if (!version) continue;
    const review = (version as SubmissionVersion & { review?: Review | null }).review ?? null;
    const mentor = review ? await User.findByPk(review.mentorId, { attributes: ['name'] }) : null;
    pieces.set(submission.id, {
      review: review && {
        mentor: mentor?.name ?? 'Former mentor',
        comment: review.comment,
        scores: (project?.criteria ?? []).map((c) => ({ label: c.label, score: review.scores[c.key] ?? 0 })),
        pins: (review.pins ?? [])
          .sort((a, b) => a.number - b.number)
          .map((p) => ({ number: p.number, note: p.note, uploadId: p.uploadId, x: p.x, y: p.y })),
      },
      photos: (version.photos ?? [])
        .sort((a, b) => a.position - b.position)
        .map((p) => photoOf(p.upload!, `piece-${submission.id}-v${version.number}-${p.position}.jpg`, p.caption)),
    });
  }

  const links = await LogEntryUpload.findAll({
    where: { entryId: { [Op.in]: entryIds } },
    order: [['position', 'ASC']],
  });
  const uploads = await Upload.findAll({ where: { id: { [Op.in]: links.map((l) => l.uploadId) } } });
  for (const entryId of entryIds) {
    const grade = await LogGrade.findOne({
      where: { entryId },
      order: [
        ['createdAt', 'DESC'],
        ['id', 'DESC'],
      ],
    });
    entries.set(entryId, {
      comment: grade?.comment ?? '',
      photos: links
        .filter((l) => l.entryId === entryId)
        .flatMap((l) => {
          const u = uploads.find((x) => x.id === l.uploadId);
          return u ? [photoOf(u, `log-entry-${entryId}-${l.position}.jpg`)] : [];
        }),
    });
  }

  const photos = [...pieces.values(), ...entries.values()].flatMap((d) => d.photos);
  return { pieces, entries, photos };
}
