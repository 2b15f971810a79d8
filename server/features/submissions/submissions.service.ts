import { Op, QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type {
  ProjectForPiece,
  SubmissionCreateInput,
  SubmissionDraftPatch,
  SubmissionDTO,
  SubmissionList,
  SubmissionListQuery,
} from '@shared/schemas/submission';
import type { UserDTO } from '@shared/schemas/user';
import { AppError } from '../../lib/app-error';
import { assertCanSeeApprentice, canSeeSubmission, reachableCourseIds } from '../classes/access';
import { Lesson, Project } from '../courses/course.model';
import { assertOwnUploads } from '../uploads/uploads.service';
import { assertOwnLinks } from './linked-records';
import { loadSubmissionDTO, projectSummary } from './submission.mapper';
import { Submission, SubmissionPhoto, SubmissionVersion } from './submission.model';
import { listItems } from './submission-list';

const notFound = () => AppError.notFound('That submission');

/** A project is open to an apprentice when it is live and belongs to the course of a class they are enrolled in. */
async function assertProjectOpen(
  sequelize: Sequelize,
  apprenticeId: number,
  projectId: number,
  transaction?: Transaction,
) {
  const rows = await sequelize.query(
    `SELECT p.id FROM projects p
     JOIN lessons l ON l.id = p.lessonId
     JOIN classes g ON g.courseId = l.courseId
     JOIN enrolments e ON e.classId = g.id
     WHERE p.id = :projectId AND p.retiredAt IS NULL AND l.retiredAt IS NULL
       AND e.userId = :apprenticeId AND e.status = 'active'
     LIMIT 1`,
    { replacements: { projectId, apprenticeId }, type: QueryTypes.SELECT, transaction },
  );
  if (rows.length === 0) throw AppError.notFound('That project');
}

export async function projectForPiece(
  sequelize: Sequelize,
  user: UserDTO,
  projectId: number,
): Promise<ProjectForPiece> {
  await assertProjectOpen(sequelize, user.id, projectId);
  const project = await projectSummary(projectId);
  if (!project) throw AppError.notFound('That project');
  const existing = await Submission.findOne({ where: { apprenticeId: user.id, projectId }, attributes: ['id'] });
  return { project, submissionId: existing?.id ?? null };
}

/** Writes the draft fields given; the ones left out keep the version's current values. */
async function applyDraft(
  sequelize: Sequelize,
  apprenticeId: number,
  version: SubmissionVersion,
  patch: SubmissionDraftPatch,
  transaction: Transaction,
) {
  const links = {
    logEntryIds: patch.logEntryIds ?? version.logEntryIds,
    calculationIds: patch.calculationIds ?? version.calculationIds,
  };
  await assertOwnLinks(sequelize, apprenticeId, links, transaction);
  await version.update({ notes: patch.notes ?? version.notes, ...links }, { transaction });
  if (patch.photos) {
    await assertOwnUploads(
      apprenticeId,
      patch.photos.map((p) => p.uploadId),
      { transaction },
    );
    await SubmissionPhoto.destroy({ where: { versionId: version.id }, transaction });
    await SubmissionPhoto.bulkCreate(
      patch.photos.map((p, i) => ({
        versionId: version.id,
        uploadId: p.uploadId,
        position: i + 1,
        caption: p.caption,
      })),
      { transaction },
    );
  }
}

export async function createSubmission(
  sequelize: Sequelize,
  user: UserDTO,
  input: SubmissionCreateInput,
): Promise<SubmissionDTO> {
  const { projectId, ...patch } = input;
  await assertProjectOpen(sequelize, user.id, projectId);
  const existing = await Submission.findOne({ where: { apprenticeId: user.id, projectId }, attributes: ['id'] });
  if (existing)
    throw new AppError('ALREADY_STARTED', 'You have already started a piece for this project; carry on with it.', 409);
  const id = await sequelize.transaction(async (transaction) => {
    const submission = await Submission.create(
      { apprenticeId: user.id, projectId, status: 'draft', currentVersion: 1 },
      { transaction },
    );
    const version = await SubmissionVersion.create(
      { submissionId: submission.id, number: 1, notes: '', logEntryIds: [], calculationIds: [] },
      { transaction },
    );
    await applyDraft(sequelize, user.id, version, patch, transaction);
    return submission.id;
  });
  return (await loadSubmissionDTO(sequelize, id, true))!;
}

async function ownSubmission(user: UserDTO, id: number, transaction?: Transaction) {
  const submission = id > 0 ? await Submission.findByPk(id, { transaction }) : null;
  if (!submission || submission.apprenticeId !== user.id) throw notFound();
  return submission;
}

const currentVersionOf = (s: Submission, transaction?: Transaction) =>
  SubmissionVersion.findOne({ where: { submissionId: s.id, number: s.currentVersion }, transaction });

/**
 * Edits the draft. After a review asking for rework, the first edit opens the next version, starting from the
 * reviewed one, so that the reviewed version stays exactly as the mentor saw it.
 */
export async function updateDraft(
  sequelize: Sequelize,
  user: UserDTO,
  id: number,
  patch: SubmissionDraftPatch,
): Promise<SubmissionDTO> {
  await sequelize.transaction(async (transaction) => {
    const submission = await ownSubmission(user, id, transaction);
    if (submission.status === 'waiting')
      throw AppError.conflict('This piece is waiting for review; it cannot be changed until it has been reviewed.');
    if (submission.status === 'passed') throw AppError.conflict('This piece has passed; it cannot be changed.');
    let version = (await currentVersionOf(submission, transaction))!;
    if (version.sentAt) {
      const previous = version;
      const photos = await SubmissionPhoto.findAll({
        where: { versionId: previous.id },
        order: [['position', 'ASC']],
        transaction,
      });
      version = await SubmissionVersion.create(
        {
          submissionId: submission.id,
          number: previous.number + 1,
          notes: previous.notes,
          logEntryIds: previous.logEntryIds,
          calculationIds: previous.calculationIds,
        },
        { transaction },
      );
      await SubmissionPhoto.bulkCreate(
        photos.map((p) => ({ versionId: version.id, uploadId: p.uploadId, position: p.position, caption: p.caption })),
        { transaction },
      );
      await submission.update({ currentVersion: version.number }, { transaction });
    }
    await applyDraft(sequelize, user.id, version, patch, transaction);
    submission.changed('updatedAt', true);
    await submission.save({ transaction });
  });
  return (await loadSubmissionDTO(sequelize, id, true))!;
}

/** Sends the current draft for review; returns the piece and who was told (the caller notifies after commit). */
export async function sendSubmission(sequelize: Sequelize, user: UserDTO, id: number) {
  const sent = await sequelize.transaction(async (transaction) => {
    const submission = await ownSubmission(user, id, transaction);
    if (submission.status === 'waiting') throw AppError.conflict('This piece is already waiting for review.');
    if (submission.status === 'passed') throw AppError.conflict('This piece has already passed.');
    const version = (await currentVersionOf(submission, transaction))!;
    if (version.sentAt) throw AppError.conflict('Make your changes for the new version before sending it again.');
    const photoCount = await SubmissionPhoto.count({ where: { versionId: version.id }, transaction });
    if (photoCount === 0)
      throw AppError.badRequest('Add at least one photo before sending.', { photos: ['Add at least one photo.'] });
    await assertProjectOpen(sequelize, user.id, submission.projectId, transaction);
    const now = new Date();
    await version.update({ sentAt: now }, { transaction });
    await submission.update({ status: 'waiting', sentAt: now }, { transaction });
    return { version: version.number, photoCount };
  });
  return { submission: (await loadSubmissionDTO(sequelize, id, true))!, ...sent };
}

export async function getSubmission(sequelize: Sequelize, viewer: UserDTO, id: number): Promise<SubmissionDTO> {
  const submission =
    id > 0 ? await Submission.findByPk(id, { attributes: ['id', 'apprenticeId', 'projectId', 'status'] }) : null;
  if (!submission) throw notFound();
  const own = submission.apprenticeId === viewer.id;
  if (!own && (submission.status === 'draft' || !(await canSeeSubmission(viewer, submission)))) throw notFound();
  return (await loadSubmissionDTO(sequelize, id, own))!;
}

async function projectIdsOfCourses(courseIds: number[]): Promise<number[]> {
  const lessons = await Lesson.findAll({ where: { courseId: { [Op.in]: courseIds } }, attributes: ['id'] });
  const projects = await Project.findAll({
    where: { lessonId: { [Op.in]: lessons.map((l) => l.id) } },
    attributes: ['id'],
  });
  return projects.map((p) => p.id);
}

/** An apprentice lists their own pieces; mentors and the admin name an apprentice, and see the pieces in reach. */
export async function listSubmissions(viewer: UserDTO, query: SubmissionListQuery): Promise<SubmissionList> {
  let apprenticeId = viewer.id;
  if (viewer.role !== 'apprentice') {
    if (!query.apprentice)
      throw AppError.badRequest('Name the apprentice.', { apprentice: ['Name the apprentice whose pieces to list.'] });
    await assertCanSeeApprentice(viewer, query.apprentice, 'That apprentice');
    apprenticeId = query.apprentice;
  }
  const own = apprenticeId === viewer.id;
  const courseIds = own ? 'all' : await reachableCourseIds(viewer, apprenticeId);
  const rows = await Submission.findAll({
    where: {
      apprenticeId,
      [Op.and]: [
        query.projectId ? { projectId: query.projectId } : {},
        courseIds === 'all' ? {} : { projectId: { [Op.in]: await projectIdsOfCourses(courseIds) } },
      ],
      ...(own ? {} : { status: { [Op.ne]: 'draft' } }),
    },
    order: [
      ['updatedAt', 'DESC'],
      ['id', 'DESC'],
    ],
  });
  return { items: await listItems(rows, own) };
}
