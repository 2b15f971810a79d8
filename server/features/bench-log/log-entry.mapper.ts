import { Op, type Transaction } from 'sequelize';
import type { LogEntryDTO, LogLessonRef } from '@shared/schemas/log-entry';
import type { UploadDTO } from '@shared/schemas/upload';
import type { CalculationDTO } from '@shared/schemas/calculation';
import { User } from '../auth/user.model';
import { toCalculationDTO } from '../calculations/calculation.mapper';
import { Calculation } from '../calculations/calculation.model';
import { Course, Lesson } from '../courses/course.model';
import { Upload } from '../uploads/upload.model';
import { uploadDTO } from '../uploads/uploads.service';
import {
  LogComment,
  LogEntryCalculation,
  LogEntryUpload,
  LogGrade,
  LogMeasurement,
  type LogEntry,
} from './log-entry.model';

const byEntry = <T extends { entryId: number }>(rows: T[]) => {
  const map = new Map<number, T[]>();
  for (const r of rows) map.set(r.entryId, [...(map.get(r.entryId) ?? []), r]);
  return (entryId: number) => map.get(entryId) ?? [];
};

async function names(ids: number[], transaction?: Transaction) {
  const users = await User.findAll({
    where: { id: { [Op.in]: [...new Set(ids)] } },
    attributes: ['id', 'name'],
    transaction,
  });
  const map = new Map(users.map((u) => [u.id, u.name]));
  return (id: number) => ({ id, name: map.get(id) ?? 'Former member' });
}

async function lessonRefs(ids: number[], transaction?: Transaction) {
  const lessons = await Lesson.findAll({
    where: { id: { [Op.in]: [...new Set(ids)] } },
    attributes: ['id', 'slug', 'title', 'courseId'],
    transaction,
  });
  const courses = await Course.findAll({
    where: { id: { [Op.in]: [...new Set(lessons.map((l) => l.courseId))] } },
    attributes: ['id', 'slug', 'title'],
    transaction,
  });
  const courseById = new Map(courses.map((c) => [c.id, { id: c.id, slug: c.slug, title: c.title }]));
  const map = new Map<number, LogLessonRef>();
  for (const l of lessons) {
    const course = courseById.get(l.courseId);
    if (course) map.set(l.id, { id: l.id, slug: l.slug, title: l.title, course });
  }
  return (id: number | null) => (id === null ? null : (map.get(id) ?? null));
}

/**
 * Turns entries into DTOs with their measurements, photos, results, comments and grades, one query per kind for the
 * whole batch rather than per entry. Order of the entries is kept.
 */
export async function toEntryDTOs(entries: LogEntry[], transaction?: Transaction): Promise<LogEntryDTO[]> {
  if (entries.length === 0) return [];
  const entryIds = entries.map((e) => e.id);
  const where = { entryId: { [Op.in]: entryIds } };
  const [measurements, photoLinks, calcLinks, comments, grades] = [
    await LogMeasurement.findAll({ where, order: [['position', 'ASC']], transaction }),
    await LogEntryUpload.findAll({ where, order: [['position', 'ASC']], transaction }),
    await LogEntryCalculation.findAll({ where, transaction }),
    await LogComment.findAll({
      where,
      order: [
        ['createdAt', 'ASC'],
        ['id', 'ASC'],
      ],
      transaction,
    }),
    await LogGrade.findAll({
      where,
      order: [
        ['createdAt', 'ASC'],
        ['id', 'ASC'],
      ],
      transaction,
    }),
  ];
  const uploads = await Upload.findAll({
    where: { id: { [Op.in]: photoLinks.map((p) => p.uploadId) } },
    attributes: ['id', 'width', 'height'],
    transaction,
  });
  const uploadById = new Map<number, UploadDTO>(uploads.map((u) => [u.id, uploadDTO(u)]));
  const calcs = await Calculation.findAll({
    where: { id: { [Op.in]: calcLinks.map((c) => c.calculationId) } },
    transaction,
  });
  const calcById = new Map<number, CalculationDTO>(calcs.map((c) => [c.id, toCalculationDTO(c)]));
  const person = await names(
    [...entries.map((e) => e.apprenticeId), ...comments.map((c) => c.authorId), ...grades.map((g) => g.mentorId)],
    transaction,
  );
  const lesson = await lessonRefs(
    entries.flatMap((e) => (e.lessonId ? [e.lessonId] : [])),
    transaction,
  );
  const [measurementsOf, photosOf, calcsOf, commentsOf, gradesOf] = [
    byEntry(measurements),
    byEntry(photoLinks),
    byEntry(calcLinks),
    byEntry(comments),
    byEntry(grades),
  ];

  return entries.map((e) => {
    const entryGrades = gradesOf(e.id);
    const latestGrade = entryGrades.at(-1);
    // Versions rather than clocks decide: an edit in the same millisecond as a grade still counts as after it.
    const changedAfterGrading = latestGrade && e.editedAt && e.version > latestGrade.entryVersion;
    return {
      id: e.id,
      apprentice: person(e.apprenticeId),
      date: e.date,
      minutes: e.minutes,
      title: e.title,
      notes: e.notes,
      lesson: lesson(e.lessonId),
      measurements: measurementsOf(e.id).map((m) => ({ name: m.name, value: m.value, unit: m.unit })),
      photos: photosOf(e.id).flatMap((p) => uploadById.get(p.uploadId) ?? []),
      calculations: calcsOf(e.id)
        .flatMap((c) => calcById.get(c.calculationId) ?? [])
        .sort((a, b) => a.id - b.id),
      comments: commentsOf(e.id).map((c) => ({
        id: c.id,
        author: person(c.authorId),
        body: c.body,
        createdAt: c.createdAt.toISOString(),
      })),
      grades: entryGrades.map((g) => ({
        id: g.id,
        mentor: person(g.mentorId),
        completeness: g.completeness,
        measurements: g.measurements,
        photos: g.photos,
        comment: g.comment,
        entryVersion: g.entryVersion,
        createdAt: g.createdAt.toISOString(),
      })),
      version: e.version,
      editedAt: e.editedAt ? e.editedAt.toISOString() : null,
      changedAfterGradingAt: changedAfterGrading ? e.editedAt!.toISOString() : null,
      createdAt: e.createdAt.toISOString(),
    };
  });
}
