import { Op, QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { UPLOAD_SIZES, type UploadDTO } from '@shared/schemas/upload';
import type { UserDTO } from '@shared/schemas/user';
import { AppError } from '../../lib/app-error';
import { canSeeUpload } from '../classes/access';
import { processImage } from './image-pipeline';
import { newFileKey, oldUploadFiles, removeUploadFiles, writeUploadFiles } from './upload-files';
import { rm } from 'node:fs/promises';
import { Upload } from './upload.model';
import { withImageSlot } from './image-slots';

export const uploadDTO = (u: Pick<Upload, 'id' | 'width' | 'height'>): UploadDTO => ({
  id: u.id,
  width: u.width,
  height: u.height,
  url: `/api/uploads/${u.id}`,
  viewUrl: `/api/uploads/${u.id}?size=view`,
  thumbUrl: `/api/uploads/${u.id}?size=thumb`,
});

/** Bytes on disk of a person's photos, all stored sizes counted. */
export async function storageUsed(ownerId: number, transaction?: Transaction): Promise<number> {
  return Number(await Upload.sum('bytes', { where: { ownerId }, transaction })) || 0;
}

const megabytes = (bytes: number) => `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
const quotaReached = (used: number, quota: number) =>
  new AppError(
    'QUOTA_REACHED',
    `Your photo storage is full: ${megabytes(used)} of ${megabytes(quota)} used, and this photo needs more room. ` +
      'Ask the guild office for more room.',
    413,
  );

/**
 * Re-encodes and stores a photo; if anything fails, no file and no row remain. A person over `quotaBytes` (null: no
 * quota, for the demo loader) is refused before the costly decode, and again at the write, under the write lock, so
 * two uploads at once cannot both squeeze past the last megabytes.
 */
export async function storeUpload(
  dataDir: string,
  ownerId: number,
  bytes: Buffer,
  quotaBytes: number | null,
): Promise<UploadDTO> {
  const quota = quotaBytes ?? Infinity;
  const usedBefore = await storageUsed(ownerId);
  if (usedBefore >= quota) throw quotaReached(usedBefore, quota);
  const image = await withImageSlot(() => processImage(bytes));
  const size = UPLOAD_SIZES.reduce((sum, s) => sum + image.files[s].length, 0);
  const fileKey = newFileKey();
  await writeUploadFiles(dataDir, fileKey, image.files);
  try {
    const upload = await Upload.sequelize!.transaction(async (transaction) => {
      const used = await storageUsed(ownerId, transaction);
      if (used + size > quota) throw quotaReached(used, quota);
      const fields = { ownerId, fileKey, width: image.width, height: image.height, bytes: size };
      return Upload.create({ ...fields, sourceType: image.sourceType }, { transaction });
    });
    return uploadDTO(upload);
  } catch (err) {
    await removeUploadFiles(dataDir, fileKey);
    throw err;
  }
}

/**
 * For any feature that attaches photos (submissions, the bench log): throws 400 naming `uploadIds` unless every id is
 * an upload of this user, and marks them as taken so the sweep of abandoned uploads keeps them. Inside a transaction,
 * pass it: SQLite gives a transaction its own connection, and a query outside it would wait on its lock.
 */
export async function assertOwnUploads(userId: number, ids: number[], options: { transaction?: Transaction } = {}) {
  const unique = [...new Set(ids)];
  if (unique.length === 0) return;
  const { transaction } = options;
  const mine = await Upload.findAll({
    where: { id: { [Op.in]: unique }, ownerId: userId },
    attributes: ['id'],
    transaction,
  });
  if (mine.length !== unique.length) {
    const found = new Set(mine.map((u) => u.id));
    const bad = unique.filter((id) => !found.has(id));
    throw AppError.badRequest('Some photos could not be found among your uploads.', {
      uploadIds: [`Not one of your uploads: ${bad.join(', ')}.`],
    });
  }
  await Upload.update({ claimedAt: new Date() }, { where: { id: { [Op.in]: unique }, claimedAt: null }, transaction });
}

/** Who may see a photo is decided in access.ts; anyone else is told it does not exist. */
export async function findViewableUpload(viewer: UserDTO, id: number): Promise<Upload> {
  const upload = id > 0 ? await Upload.findByPk(id) : null;
  if (!upload || !(await canSeeUpload(viewer, upload))) {
    throw AppError.notFound('That photo');
  }
  return upload;
}

const DAY_MS = 24 * 60 * 60 * 1000;

/**
 * Removes photos that were uploaded but never attached to anything within a day (a form closed before saving).
 * Besides the claim mark, any row in a table with a foreign key to uploads keeps a photo, as a second guard.
 */
export async function sweepAbandonedUploads(
  sequelize: Sequelize,
  dataDir: string,
  olderThanMs = DAY_MS,
): Promise<number> {
  const guards = await uploadReferences(sequelize);
  const notReferenced = guards
    .map((g) => `AND id NOT IN (SELECT "${g.column}" FROM "${g.table}" WHERE "${g.column}" IS NOT NULL)`)
    .join(' ');
  const cutoff = new Date(Date.now() - olderThanMs);
  const stale = await sequelize.query<{ id: number; fileKey: string }>(
    `SELECT id, fileKey FROM uploads WHERE claimedAt IS NULL AND createdAt < :cutoff ${notReferenced}`,
    { type: QueryTypes.SELECT, replacements: { cutoff } },
  );
  let removed = 0;
  for (const row of stale) {
    const count = await Upload.destroy({ where: { id: row.id, claimedAt: null } });
    if (count === 1) {
      await removeUploadFiles(dataDir, row.fileKey);
      removed += 1;
    }
  }
  return removed;
}

async function uploadReferences(sequelize: Sequelize): Promise<{ table: string; column: string }[]> {
  const tables = await sequelize.query<{ name: string }>(
    "SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%'",
    { type: QueryTypes.SELECT },
  );
  const refs: { table: string; column: string }[] = [];
  for (const { name } of tables) {
    if (!/^[A-Za-z0-9_]+$/.test(name)) continue;
    const keys = await sequelize.query<{ table: string; from: string }>(`PRAGMA foreign_key_list("${name}")`, {
      type: QueryTypes.SELECT,
    });
    for (const k of keys) if (k.table === 'uploads') refs.push({ table: name, column: k.from });
  }
  return refs;
}

let lastSweep = 0;
/** The sweep runs at most once an hour, started by an upload rather than by a timer, so tests and scripts stay quiet. */
export function sweepNowAndThen(sequelize: Sequelize, dataDir: string, onError: (err: unknown) => void) {
  if (Date.now() - lastSweep < 60 * 60 * 1000) return;
  lastSweep = Date.now();
  sweepAbandonedUploads(sequelize, dataDir).catch(onError);
}

const HOUR_MS = 3600 * 1000;

/**
 * Run at start-up: removes photo files that no row owns, left by a process killed between writing the files and
 * committing the row (or mid-write, as temporary files). Only files older than an hour, so that an upload being
 * stored by another process at this moment is never touched.
 */
export async function sweepOrphanFiles(dataDir: string, olderThanMs = HOUR_MS): Promise<number> {
  const old = await oldUploadFiles(dataDir, olderThanMs);
  if (old.length === 0) return 0;
  const keys = [...new Set(old.map((f) => f.fileKey))];
  const owned = new Set<string>();
  for (let i = 0; i < keys.length; i += 500) {
    const rows = await Upload.findAll({ where: { fileKey: keys.slice(i, i + 500) }, attributes: ['fileKey'] });
    for (const row of rows) owned.add(row.fileKey);
  }
  const orphans = old.filter((f) => f.temporary || !owned.has(f.fileKey));
  await Promise.all(orphans.map((f) => rm(f.file, { force: true })));
  return orphans.length;
}
