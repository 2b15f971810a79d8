import { readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { decodeFailure } from '../../server/features/uploads/image-pipeline';
import { Upload } from '../../server/features/uploads/upload.model';
import { makeJpeg, uploadPhoto } from './support/pieces';
import { createTestApp, type TestApp } from './support/test-app';

const MB = 1024 * 1024;
let t: TestApp;
beforeAll(async () => {
  t = await createTestApp({ UPLOAD_QUOTA_MB: '1' });
});
afterAll(() => t.close());

const filesOnDisk = () => {
  try {
    return readdirSync(path.join(t.dataDir, 'uploads')).length;
  } catch {
    return 0;
  }
};
/** A row standing for photos already stored, so that a test reaches the quota without making a megabyte of JPEG. */
const alreadyStored = (ownerId: number, bytes: number) =>
  Upload.create({
    ownerId,
    fileKey: `filler-${ownerId}-${bytes}`,
    width: 1,
    height: 1,
    bytes,
    sourceType: 'image/jpeg',
  });

describe('per-person photo storage quota', () => {
  it('when photos are stored, then the usage counts every stored size and is shown against the configured quota', async () => {
    const { agent, user } = await t.signIn('apprentice');
    expect((await agent.get('/api/uploads/usage')).body).toEqual({ usedBytes: 0, quotaBytes: 1 * MB });
    const res = await uploadPhoto(agent, await makeJpeg());
    expect(res.status).toBe(201);
    const row = (await Upload.findByPk(res.body.id))!;
    const onDisk = ['full', 'view', 'thumb']
      .map((size) => statSync(path.join(t.dataDir, 'uploads', `${row.fileKey}-${size}.jpg`)).size)
      .reduce((sum, n) => sum + n, 0);
    expect(row.bytes).toBe(onDisk);
    expect((await agent.get('/api/uploads/usage')).body).toEqual({ usedBytes: row.bytes, quotaBytes: MB });
    expect((await t.anon().get('/api/uploads/usage')).status).toBe(401);
    expect(row.ownerId).toBe(user.id);
  });

  it('when a photo would pass the quota, then it answers 413 QUOTA_REACHED with the amounts, and nothing is kept', async () => {
    const { agent, user } = await t.signIn('apprentice');
    await alreadyStored(user.id, MB - 100);
    const files = filesOnDisk();
    const rows = await Upload.count();
    const res = await uploadPhoto(agent, await makeJpeg());
    expect(res.status).toBe(413);
    expect(res.body).toEqual({
      error: { code: 'QUOTA_REACHED', message: expect.stringContaining('1.0 MB of 1.0 MB used') },
    });
    expect(filesOnDisk()).toBe(files);
    expect(await Upload.count()).toBe(rows);
  });

  it('when the quota is already full, then the upload is refused before the picture is read', async () => {
    const { agent, user } = await t.signIn('apprentice');
    await alreadyStored(user.id, MB);
    // Not a picture at all: a full quota answers first, so nothing is decoded.
    const res = await uploadPhoto(agent, Buffer.from('not a picture'));
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('QUOTA_REACHED');
  });
});

describe('what decoding may cost', () => {
  it('when sharp stops at the pixel limit or the time limit, then the person is told 413 in words', () => {
    const pixels = decodeFailure(new Error('Input image exceeds pixel limit'));
    expect([pixels.status, pixels.code, pixels.message]).toEqual([
      413,
      'IMAGE_TOO_LARGE',
      expect.stringContaining('50 megapixels'),
    ]);
    const slow = decodeFailure(new Error('timeout: 35% complete'));
    expect([slow.status, slow.code, slow.message]).toEqual([
      413,
      'IMAGE_TOO_LARGE',
      expect.stringContaining('too long'),
    ]);
    expect(decodeFailure(new Error('VipsJpeg: premature end')).status).toBe(415);
  });
});
