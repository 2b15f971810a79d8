import { randomInt } from 'node:crypto';
import { Op, type Sequelize, type WhereOptions } from 'sequelize';
import type {
  CertificateCheck,
  CertificateCreateInput,
  CertificateDTO,
  CertificateListQuery,
  ReasonInput,
} from '@shared/schemas/record';
import type { UserDTO } from '@shared/schemas/user';
import { AppError } from '../../lib/app-error';
import { recordAudit } from '../audit/audit.service';
import { User } from '../auth/user.model';
import { canSeeApprentice, visibleApprenticeIds } from '../classes/access';
import { Course, Lesson, Project } from '../courses/course.model';
import { Submission } from '../submissions/submission.model';
import { Certificate, SignOff } from './record.model';

/** Crockford's base-32 letters: no I, L, O or U, so a code read aloud or copied by hand is not misread. */
const ALPHABET = '0123456789ABCDEFGHJKMNPQRSTVWXYZ';

/** 20 random letters of 32 (100 bits) in groups of five: guessing one is pointless, reading one is easy. */
export function newCertificateCode(): string {
  const groups = Array.from({ length: 4 }, () =>
    Array.from({ length: 5 }, () => ALPHABET[randomInt(ALPHABET.length)]).join(''),
  );
  return `TW-${groups.join('-')}`;
}

/** What stands between the apprentice and a certificate: skills not signed off, projects not passed. */
async function missingForCertificate(apprenticeId: number, course: Course) {
  const signed = await SignOff.findAll({
    where: { apprenticeId, courseId: course.id, withdrawnAt: null },
    attributes: ['skillKey'],
  });
  const signedKeys = new Set(signed.map((s) => s.skillKey));
  const lessons = await Lesson.findAll({ where: { courseId: course.id, retiredAt: null }, attributes: ['id'] });
  const projects = await Project.findAll({
    where: { lessonId: { [Op.in]: lessons.map((l) => l.id) }, retiredAt: null },
    attributes: ['id', 'title'],
  });
  const passed = await Submission.findAll({
    where: { apprenticeId, status: 'passed', projectId: { [Op.in]: projects.map((p) => p.id) } },
    attributes: ['projectId'],
  });
  const passedIds = new Set(passed.map((s) => s.projectId));
  return {
    skills: course.skills.filter((s) => !signedKeys.has(s.key)).map((s) => `${s.label}: not signed off`),
    projects: projects.filter((p) => !passedIds.has(p.id)).map((p) => `${p.title}: not passed`),
  };
}

/** The guild office issues a certificate once every skill is signed off and every project passed. */
export async function issueCertificate(sequelize: Sequelize, viewer: UserDTO, input: CertificateCreateInput) {
  const apprentice = await User.findByPk(input.apprenticeId, { attributes: ['id', 'name', 'role'] });
  if (!apprentice || apprentice.role !== 'apprentice') throw AppError.notFound('That apprentice');
  const course = await Course.findByPk(input.courseId);
  if (!course) throw AppError.notFound('That course');

  return sequelize.transaction(async (transaction) => {
    const standing = await Certificate.findOne({
      where: { apprenticeId: apprentice.id, courseId: course.id, revokedAt: null },
      transaction,
    });
    if (standing) throw AppError.conflict(`${apprentice.name} already holds a certificate for “${course.title}”.`);
    const missing = await missingForCertificate(apprentice.id, course);
    if (missing.skills.length + missing.projects.length > 0) {
      const fields = Object.fromEntries(Object.entries(missing).filter(([, list]) => list.length > 0));
      throw new AppError('NOT_COMPLETE', `${apprentice.name} has not finished “${course.title}” yet.`, 422, fields);
    }
    const row = await Certificate.create(
      {
        code: newCertificateCode(),
        apprenticeId: apprentice.id,
        courseId: course.id,
        issuedById: viewer.id,
        issuedAt: new Date(),
      },
      { transaction },
    );
    await recordAudit(
      viewer.id,
      'certificate.issued',
      { type: 'certificate', id: row.id, label: `${apprentice.name}: ${course.title}` },
      { apprenticeId: apprentice.id, courseId: course.id },
      transaction,
    );
    return { id: row.id, code: row.code };
  });
}

export async function revokeCertificate(sequelize: Sequelize, viewer: UserDTO, id: number, input: ReasonInput) {
  await sequelize.transaction(async (transaction) => {
    const row = id > 0 ? await Certificate.findByPk(id, { transaction }) : null;
    if (!row) throw AppError.notFound('That certificate');
    if (row.revokedAt) throw AppError.conflict('That certificate was already revoked.');
    await row.update({ revokedAt: new Date(), revokedById: viewer.id, revokeReason: input.reason }, { transaction });
    await recordAudit(
      viewer.id,
      'certificate.revoked',
      { type: 'certificate', id: row.id, label: row.code },
      { apprenticeId: row.apprenticeId, courseId: row.courseId, reason: input.reason },
      transaction,
    );
  });
}

async function toDTOs(rows: Certificate[]): Promise<CertificateDTO[]> {
  const people = await User.findAll({
    where: { id: { [Op.in]: rows.map((r) => r.apprenticeId) } },
    attributes: ['id', 'name'],
  });
  const courses = await Course.findAll({
    where: { id: { [Op.in]: rows.map((r) => r.courseId) } },
    attributes: ['id', 'title'],
  });
  return rows.map((r) => ({
    id: r.id,
    code: r.code,
    apprentice: { id: r.apprenticeId, name: people.find((p) => p.id === r.apprenticeId)?.name ?? 'Former member' },
    course: { id: r.courseId, title: courses.find((c) => c.id === r.courseId)?.title ?? 'Unknown course' },
    issuedAt: r.issuedAt.toISOString(),
    revokedAt: r.revokedAt ? r.revokedAt.toISOString() : null,
  }));
}

/** The apprentice sees their own; a mentor those of the apprentices in reach; the guild office all. */
export async function listCertificates(viewer: UserDTO, query: CertificateListQuery): Promise<CertificateDTO[]> {
  const where: WhereOptions<Certificate> = {};
  if (query.apprenticeId !== undefined) {
    if (!(await canSeeApprentice(viewer, query.apprenticeId))) throw AppError.notFound('That apprentice');
    Object.assign(where, { apprenticeId: query.apprenticeId });
  } else {
    const visible = await visibleApprenticeIds(viewer);
    if (visible !== 'all') Object.assign(where, { apprenticeId: { [Op.in]: visible } });
  }
  if (query.courseId !== undefined) Object.assign(where, { courseId: query.courseId });
  const rows = await Certificate.findAll({
    where,
    order: [
      ['issuedAt', 'DESC'],
      ['id', 'DESC'],
    ],
  });
  return toDTOs(rows);
}

/** A certificate the viewer may download: their own, an apprentice's in reach, or any for the guild office. */
export async function readableCertificate(viewer: UserDTO, id: number): Promise<Certificate> {
  const row = id > 0 ? await Certificate.findByPk(id) : null;
  if (!row || !(await canSeeApprentice(viewer, row.apprenticeId))) throw AppError.notFound('That certificate');
  return row;
}

/** The public check: only what the certificate itself says, to anyone who holds its code. */
export async function checkCertificate(code: string, guild: string): Promise<CertificateCheck> {
  const row = code.length <= 40 ? await Certificate.findOne({ where: { code: code.toUpperCase() } }) : null;
  if (!row) throw AppError.notFound('That certificate');
  const [dto] = await toDTOs([row]);
  return {
    valid: row.revokedAt === null,
    apprentice: { name: dto.apprentice.name },
    course: { title: dto.course.title },
    issuedAt: dto.issuedAt,
    guild,
    revokedAt: dto.revokedAt,
  };
}
