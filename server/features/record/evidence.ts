import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import type { EvidenceItem, EvidenceRef } from '@shared/schemas/record';

/**
 * Evidence for a skill is gathered from the apprentice's own work on the lessons that teach it, never typed in:
 * - every sent submission of such a lesson's project, with the outcome and weighted score of its latest review;
 * - every bench-log entry on such a lesson that a mentor has graded (the mean of its latest grade as the score);
 * - every saved result attached to a log entry on such a lesson or to a sent version of such a submission.
 * Minutes are all bench-log time on those lessons, graded or not.
 */
export interface CourseEvidence {
  /** Skill key -> evidence, newest first. */
  bySkill: Map<string, EvidenceItem[]>;
  /** Skill key -> bench-log minutes on the lessons that teach it. */
  minutesBySkill: Map<string, number>;
  /** Bench-log minutes on any lesson of the course. */
  minutes: number;
}

type Row = Record<string, unknown>;
const day = (value: unknown) => new Date(String(value)).toISOString().slice(0, 10);
export const evidenceKey = (e: EvidenceRef) => `${e.kind}:${e.id}`;

interface Found {
  item: EvidenceItem;
  lessonIds: Set<number>;
}

export async function gatherCourseEvidence(
  sequelize: Sequelize,
  apprenticeId: number,
  courseId: number,
  transaction?: Transaction,
): Promise<CourseEvidence> {
  const select = <T extends Row>(sql: string) =>
    sequelize.query<T>(sql, { replacements: { apprenticeId, courseId }, type: QueryTypes.SELECT, transaction });

  const lessons = await select<{ id: number; skills: string }>(
    'SELECT id, skills FROM lessons WHERE courseId = :courseId',
  );
  const pieces = await select<{
    id: number;
    lessonId: number;
    title: string;
    sentAt: string;
    outcome: string | null;
    score: number | null;
  }>(
    `SELECT s.id, p.lessonId, p.title, s.sentAt,
       (SELECT r.outcome FROM reviews r JOIN submission_versions v ON v.id = r.versionId
        WHERE v.submissionId = s.id ORDER BY v.number DESC LIMIT 1) AS outcome,
       (SELECT r.weightedScore FROM reviews r JOIN submission_versions v ON v.id = r.versionId
        WHERE v.submissionId = s.id ORDER BY v.number DESC LIMIT 1) AS score
     FROM submissions s JOIN projects p ON p.id = s.projectId JOIN lessons l ON l.id = p.lessonId
     WHERE s.apprenticeId = :apprenticeId AND l.courseId = :courseId AND s.status <> 'draft'`,
  );
  // Photos of each submission's latest sent version; calculations of all its sent versions.
  const versions = await select<{ submissionId: number; number: number; calculationIds: string; photos: string }>(
    `SELECT v.submissionId, v.number, v.calculationIds,
       (SELECT json_group_array(uploadId) FROM
         (SELECT sp.uploadId FROM submission_photos sp WHERE sp.versionId = v.id ORDER BY sp.position)) AS photos
     FROM submission_versions v JOIN submissions s ON s.id = v.submissionId
     JOIN projects p ON p.id = s.projectId JOIN lessons l ON l.id = p.lessonId
     WHERE s.apprenticeId = :apprenticeId AND l.courseId = :courseId AND v.sentAt IS NOT NULL
     ORDER BY v.number DESC`,
  );
  const entries = await select<{
    id: number;
    lessonId: number;
    title: string;
    date: string;
    minutes: number;
    grade: number | null;
    photos: string;
  }>(
    `SELECT e.id, e.lessonId, e.title, e.date, e.minutes,
       (SELECT (g.completeness + g.measurements + g.photos) / 3.0 FROM log_grades g
        WHERE g.entryId = e.id ORDER BY g.createdAt DESC, g.id DESC LIMIT 1) AS grade,
       (SELECT json_group_array(uploadId) FROM
         (SELECT lu.uploadId FROM log_entry_uploads lu WHERE lu.entryId = e.id ORDER BY lu.position)) AS photos
     FROM log_entries e JOIN lessons l ON l.id = e.lessonId
     WHERE e.apprenticeId = :apprenticeId AND l.courseId = :courseId`,
  );
  const logCalcs = await select<{ id: number; title: string; createdAt: string; lessonId: number }>(
    `SELECT c.id, c.title, c.createdAt, e.lessonId FROM log_entry_calculations lc
     JOIN calculations c ON c.id = lc.calculationId JOIN log_entries e ON e.id = lc.entryId
     JOIN lessons l ON l.id = e.lessonId
     WHERE e.apprenticeId = :apprenticeId AND c.userId = :apprenticeId AND l.courseId = :courseId`,
  );

  const found = new Map<string, Found>();
  const add = (item: EvidenceItem, lessonId: number) => {
    const key = evidenceKey(item);
    const known = found.get(key);
    if (known) known.lessonIds.add(lessonId);
    else found.set(key, { item, lessonIds: new Set([lessonId]) });
  };

  const lessonOfPiece = new Map(pieces.map((p) => [Number(p.id), Number(p.lessonId)]));
  const photosOfPiece = new Map<number, number[]>();
  const pieceCalcIds = new Map<number, number>();
  for (const v of versions) {
    const submissionId = Number(v.submissionId);
    if (!photosOfPiece.has(submissionId)) photosOfPiece.set(submissionId, JSON.parse(v.photos) as number[]);
    for (const calcId of JSON.parse(v.calculationIds) as number[]) pieceCalcIds.set(calcId, submissionId);
  }
  for (const p of pieces) {
    add(
      {
        kind: 'submission',
        id: Number(p.id),
        title: String(p.title),
        date: day(p.sentAt),
        ...(p.outcome === 'passed' || p.outcome === 'rework' ? { outcome: p.outcome } : {}),
        ...(p.score != null ? { score: Number(p.score) } : {}),
        photoIds: photosOfPiece.get(Number(p.id)) ?? [],
      },
      Number(p.lessonId),
    );
  }
  for (const e of entries) {
    if (e.grade == null) continue;
    add(
      {
        kind: 'log-entry',
        id: Number(e.id),
        title: String(e.title),
        date: String(e.date),
        score: Number(e.grade),
        photoIds: JSON.parse(e.photos) as number[],
      },
      Number(e.lessonId),
    );
  }
  const calcItem = (c: { id: number; title: string; createdAt: string }): EvidenceItem => ({
    kind: 'calculation',
    id: Number(c.id),
    title: String(c.title),
    date: day(c.createdAt),
    photoIds: [],
  });
  for (const c of logCalcs) add(calcItem(c), Number(c.lessonId));
  if (pieceCalcIds.size > 0) {
    const calcs = await sequelize.query<{ id: number; title: string; createdAt: string }>(
      `SELECT id, title, createdAt FROM calculations WHERE userId = :apprenticeId AND id IN (:ids)`,
      { replacements: { apprenticeId, ids: [...pieceCalcIds.keys()] }, type: QueryTypes.SELECT, transaction },
    );
    for (const c of calcs) add(calcItem(c), lessonOfPiece.get(pieceCalcIds.get(Number(c.id))!)!);
  }

  const lessonsOfSkill = new Map<string, Set<number>>();
  for (const l of lessons) {
    for (const key of JSON.parse(l.skills) as string[]) {
      if (!lessonsOfSkill.has(key)) lessonsOfSkill.set(key, new Set());
      lessonsOfSkill.get(key)!.add(Number(l.id));
    }
  }
  const bySkill = new Map<string, EvidenceItem[]>();
  const minutesBySkill = new Map<string, number>();
  const newestFirst = (a: EvidenceItem, b: EvidenceItem) => b.date.localeCompare(a.date) || b.id - a.id;
  for (const [key, lessonIds] of lessonsOfSkill) {
    const items = [...found.values()].filter((f) => [...f.lessonIds].some((id) => lessonIds.has(id)));
    bySkill.set(key, items.map((f) => f.item).sort(newestFirst));
    minutesBySkill.set(
      key,
      entries.filter((e) => lessonIds.has(Number(e.lessonId))).reduce((sum, e) => sum + Number(e.minutes), 0),
    );
  }
  return { bySkill, minutesBySkill, minutes: entries.reduce((sum, e) => sum + Number(e.minutes), 0) };
}

/** A piece is passed when its latest review passed it: what a sign-off must rest on. */
export const isPassedPiece = (e: EvidenceItem) => e.kind === 'submission' && e.outcome === 'passed';
