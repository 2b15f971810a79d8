import { randomBytes } from 'node:crypto';
import { mkdir, readdir, rename, rm, stat, writeFile } from 'node:fs/promises';
import path from 'node:path';
import { UPLOAD_SIZES, type UploadSize } from '@shared/schemas/upload';

const uploadsDir = (dataDir: string) => path.join(dataDir, 'uploads');
export const newFileKey = () => randomBytes(16).toString('hex');
export const uploadFile = (dataDir: string, fileKey: string, size: UploadSize) =>
  path.join(uploadsDir(dataDir), `${fileKey}-${size}.jpg`);

/**
 * Writes every copy under a temporary name first and renames it into place, so a reader never sees half a file; on any
 * failure everything written so far is removed before the error goes on.
 */
export async function writeUploadFiles(dataDir: string, fileKey: string, files: Record<UploadSize, Buffer>) {
  await mkdir(uploadsDir(dataDir), { recursive: true });
  const tmp = (size: UploadSize) => `${uploadFile(dataDir, fileKey, size)}.${process.pid}.tmp`;
  try {
    await Promise.all(UPLOAD_SIZES.map((size) => writeFile(tmp(size), files[size], { flag: 'wx' })));
    for (const size of UPLOAD_SIZES) await rename(tmp(size), uploadFile(dataDir, fileKey, size));
  } catch (err) {
    await Promise.all(UPLOAD_SIZES.map((size) => rm(tmp(size), { force: true })));
    await removeUploadFiles(dataDir, fileKey);
    throw err;
  }
}

export async function removeUploadFiles(dataDir: string, fileKey: string) {
  await Promise.all(UPLOAD_SIZES.map((size) => rm(uploadFile(dataDir, fileKey, size), { force: true })));
}

/** Every file in the uploads folder older than `olderThanMs`, with the upload key its name starts with. */
export async function oldUploadFiles(dataDir: string, olderThanMs: number) {
  const dir = uploadsDir(dataDir);
  const names = await readdir(dir).catch(() => [] as string[]);
  const cutoff = Date.now() - olderThanMs;
  const old: { file: string; fileKey: string; temporary: boolean }[] = [];
  for (const name of names) {
    const file = path.join(dir, name);
    const info = await stat(file).catch(() => null);
    if (!info?.isFile() || info.mtimeMs >= cutoff) continue;
    old.push({ file, fileKey: name.split('-')[0], temporary: name.endsWith('.tmp') });
  }
  return old;
}
