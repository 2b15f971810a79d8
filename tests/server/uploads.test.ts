import { readdirSync } from 'node:fs';
import path from 'node:path';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Upload } from '../../server/features/uploads/upload.model';
import { assertOwnUploads, sweepAbandonedUploads } from '../../server/features/uploads/uploads.service';
import { firstProject, makeClass, makeJpeg, sentPiece, uploadPhoto } from './support/pieces';
import { createTestApp, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const filesOnDisk = () => {
  try {
    return readdirSync(path.join(t.dataDir, 'uploads'));
  } catch {
    return [];
  }
};
const bytesOf = (res: { body: unknown }) => res.body as Buffer;

describe('uploads', () => {
  it('when a JPEG carries camera and GPS EXIF, then every size served back has no EXIF, ICC or XMP at all', async () => {
    const { agent, user } = await t.signIn('apprentice');
    const original = await makeJpeg({ exif: true });
    expect((await sharp(original).metadata()).exif).toBeDefined();
    const res = await uploadPhoto(agent, original);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      width: 640,
      height: 480,
      url: `/api/uploads/${res.body.id}`,
      thumbUrl: `/api/uploads/${res.body.id}?size=thumb`,
    });
    for (const url of [res.body.url, res.body.viewUrl, res.body.thumbUrl]) {
      const got = await agent.get(url).buffer(true);
      expect(got.status).toBe(200);
      expect(got.headers['content-type']).toBe('image/jpeg');
      const meta = await sharp(bytesOf(got)).metadata();
      expect(meta.exif).toBeUndefined();
      expect(meta.icc).toBeUndefined();
      expect(meta.xmp).toBeUndefined();
      expect(bytesOf(got).includes(Buffer.from('Saltmarsh Optics'))).toBe(false);
    }
    const row = await Upload.findByPk(res.body.id);
    expect(row).toMatchObject({ ownerId: user.id, width: 640, height: 480, sourceType: 'image/jpeg', claimedAt: null });
  });

  it('when a photo is large and turned by its EXIF orientation, then it is stored upright and capped at 3200, 1600 and 400 px', async () => {
    const { agent } = await t.signIn('apprentice');
    const res = await uploadPhoto(agent, await makeJpeg({ width: 4000, height: 3000, orientation: 6 }));
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ width: 2400, height: 3200 });
    const view = await sharp(bytesOf(await agent.get(res.body.viewUrl).buffer(true))).metadata();
    const thumb = await sharp(bytesOf(await agent.get(res.body.thumbUrl).buffer(true))).metadata();
    expect([view.width, view.height]).toEqual([1200, 1600]);
    expect([thumb.width, thumb.height]).toEqual([300, 400]);
    expect(view.orientation).toBeUndefined();
  });

  it('when PNG and WebP pictures are sent, then both are accepted and stored as JPEG', async () => {
    const { agent } = await t.signIn('apprentice');
    const base = sharp({
      create: { width: 50, height: 40, channels: 4, background: { r: 43, g: 76, b: 126, alpha: 0.5 } },
    });
    for (const [bytes, name] of [
      [await base.clone().png().toBuffer(), 'a.png'],
      [await base.clone().webp().toBuffer(), 'b.webp'],
    ] as const) {
      const res = await agent.post('/api/uploads').attach('file', bytes, name);
      expect(res.status).toBe(201);
      expect((await sharp(bytesOf(await agent.get(res.body.url).buffer(true))).metadata()).format).toBe('jpeg');
    }
  });

  it('when a text file is named .jpg, then it answers 415 and leaves no file and no row', async () => {
    const { agent, user } = await t.signIn('apprentice');
    const before = filesOnDisk().length;
    const res = await uploadPhoto(agent, Buffer.from('These are my broach measurements, not a photo.\n'), 'broach.jpg');
    expect(res.status).toBe(415);
    expect(res.body.error.code).toBe('UNSUPPORTED_TYPE');
    expect(res.body.error.message).toMatch(/JPEG, PNG or WebP/);
    expect(filesOnDisk()).toHaveLength(before);
    expect(filesOnDisk().some((f) => f.endsWith('.tmp'))).toBe(false);
    expect(await Upload.count({ where: { ownerId: user.id } })).toBe(0);
  });

  it('when a HEIC photo is sent, then it answers 415 asking for a JPEG export, as this build of sharp cannot decode HEVC', async () => {
    const { agent, user } = await t.signIn('apprentice');
    const heic = Buffer.concat([
      Buffer.from([0, 0, 0, 0x18]),
      Buffer.from('ftypheic'),
      Buffer.alloc(4),
      Buffer.from('mif1heic'),
      Buffer.alloc(256),
    ]);
    const res = await agent.post('/api/uploads').attach('file', heic, 'IMG_0001.HEIC');
    expect(res.status).toBe(415);
    expect(res.body.error.message).toMatch(/Export the photo as JPEG/);
    expect(await Upload.count({ where: { ownerId: user.id } })).toBe(0);
  });

  it('when a picture is cut short, then it answers 415 and stores nothing', async () => {
    const { agent, user } = await t.signIn('apprentice');
    const whole = await makeJpeg();
    const res = await uploadPhoto(agent, whole.subarray(0, 400));
    expect(res.status).toBe(415);
    expect(await Upload.count({ where: { ownerId: user.id } })).toBe(0);
  });

  it('when the file is over 20 MB, then it answers 413', async () => {
    const { agent } = await t.signIn('apprentice');
    const res = await uploadPhoto(agent, Buffer.alloc(20 * 1024 * 1024 + 1, 0xff));
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('FILE_TOO_LARGE');
  });

  it('when no file is attached, then it answers 400 naming the file field', async () => {
    const { agent } = await t.signIn('apprentice');
    const res = await agent.post('/api/uploads').field('note', 'nothing');
    expect(res.status).toBe(400);
    expect(res.body.error.fields.file).toBeDefined();
  });

  it('when someone other than the owner asks, then only the class mentor and the admin see it; others get 404', async () => {
    const { mentor, apprentices, course } = await makeClass(t);
    const owner = apprentices[0].agent;
    const loose = await uploadPhoto(owner, await makeJpeg());
    const piece = await sentPiece(owner, (await firstProject(course.slug)).id);
    const url = `/api/uploads/${piece.uploadIds[0]}`;
    const up = { url, thumbUrl: `${url}?size=thumb`, viewUrl: `${url}?size=view` };
    // A photo not yet sent in a piece (or kept in the bench log) is the apprentice's alone.
    expect((await mentor.agent.get(loose.body.url)).status).toBe(404);
    expect((await owner.get(loose.body.url)).status).toBe(200);
    const otherApprentice = (await t.signIn('apprentice')).agent;
    const otherMentor = (await t.signIn('mentor')).agent;
    const admin = (await t.signIn('admin')).agent;
    expect((await owner.get(up.url)).status).toBe(200);
    expect((await mentor.agent.get(up.thumbUrl)).status).toBe(200);
    expect((await admin.get(up.viewUrl)).status).toBe(200);
    const refused = await otherApprentice.get(up.url);
    expect(refused.status).toBe(404);
    expect(refused.body.error.code).toBe('NOT_FOUND');
    expect((await otherMentor.get(up.url)).status).toBe(404);
    expect((await t.anon().get(up.url)).status).toBe(401);
    expect((await owner.get('/api/uploads/999999')).status).toBe(404);
    expect((await owner.get('/api/uploads/abc')).status).toBe(404);
    expect((await owner.get(`${up.url}?size=huge`)).status).toBe(400);
  });

  it('when a mentor or the admin tries to upload, or nobody is signed in, then it is refused', async () => {
    const jpeg = await makeJpeg();
    expect((await uploadPhoto((await t.signIn('mentor')).agent, jpeg)).status).toBe(403);
    expect((await uploadPhoto((await t.signIn('admin')).agent, jpeg)).status).toBe(403);
    expect((await uploadPhoto(t.anon(), jpeg)).status).toBe(401);
  });

  it('when a feature attaches uploads, then assertOwnUploads refuses others’ ids with field uploadIds and claims its own', async () => {
    const a = await t.signIn('apprentice');
    const b = await t.signIn('apprentice');
    const mine = (await uploadPhoto(a.agent, await makeJpeg())).body.id;
    const theirs = (await uploadPhoto(b.agent, await makeJpeg())).body.id;
    await expect(assertOwnUploads(a.user.id, [mine, theirs])).rejects.toMatchObject({
      status: 400,
      fields: { uploadIds: expect.any(Array) },
    });
    expect((await Upload.findByPk(mine))!.claimedAt).toBeNull();
    await assertOwnUploads(a.user.id, [mine]);
    expect((await Upload.findByPk(mine))!.claimedAt).toBeInstanceOf(Date);
  });

  it('when an upload is never attached for a day, then the sweep removes its row and files; claimed ones stay', async () => {
    const a = await t.signIn('apprentice');
    const abandoned = (await uploadPhoto(a.agent, await makeJpeg())).body.id;
    const kept = (await uploadPhoto(a.agent, await makeJpeg())).body.id;
    await assertOwnUploads(a.user.id, [kept]);
    const old = new Date(Date.now() - 25 * 60 * 60 * 1000);
    await t.sequelize.query('UPDATE uploads SET createdAt = :old WHERE id IN (:ids)', {
      replacements: { old, ids: [abandoned, kept] },
    });
    const key = (await Upload.findByPk(abandoned))!.fileKey;
    expect(filesOnDisk().filter((f) => f.startsWith(key))).toHaveLength(3);
    await sweepAbandonedUploads(t.sequelize, t.dataDir);
    expect(await Upload.findByPk(abandoned)).toBeNull();
    expect(filesOnDisk().filter((f) => f.startsWith(key))).toHaveLength(0);
    expect(await Upload.findByPk(kept)).not.toBeNull();
  });
});
