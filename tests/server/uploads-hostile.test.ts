import { readdirSync } from 'node:fs';
import path from 'node:path';
import { crc32, deflateSync } from 'node:zlib';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { UPLOAD_MAX_BYTES } from '@shared/schemas/upload';
import { Upload } from '../../server/features/uploads/upload.model';
import { makeJpeg } from './support/pieces';
import { createTestApp, type TestApp } from './support/test-app';

/**
 * A corpus of hostile uploads, made here rather than kept as files: each is refused with nothing left on disk, or
 * accepted as a clean re-encoded photo with no metadata in any size served back.
 */
let t: TestApp;
let apprentice: Awaited<ReturnType<TestApp['signIn']>>;
beforeAll(async () => {
  t = await createTestApp();
  apprentice = await t.signIn('apprentice');
});
afterAll(() => t.close());

/** A PNG chunk: length, type, data and the CRC over type and data. */
function chunk(type: string, data: Buffer) {
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([length, body, crc]);
}

/** A grey PNG of width x height whose rows are all zero: a few hundred kilobytes that unpack to width x height bytes. */
function pixelFlood(width: number, height: number) {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(width, 0);
  header.writeUInt32BE(height, 4);
  header.set([8, 0, 0, 0, 0], 8); // 8-bit greyscale, no interlace
  const rows = deflateSync(Buffer.alloc((width + 1) * height), { level: 9 });
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', header),
    chunk('IDAT', rows),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

const plate = (format: 'png' | 'webp' | 'jpeg') =>
  sharp({ create: { width: 320, height: 240, channels: 3, background: { r: 168, g: 128, b: 47 } } })[format]();

async function corpus() {
  const jpeg = await makeJpeg();
  const frame = (r: number) =>
    sharp({ create: { width: 160, height: 120, channels: 3, background: { r, g: 80, b: 40 } } })
      .png()
      .toBuffer();
  return {
    refused: {
      'SVG with a script': [
        Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"><script>alert(1)</script></svg>'),
        'plate.svg',
      ],
      'HTML named .jpg': [
        Buffer.from('<!doctype html><html><body><script>alert(document.cookie)</script></body></html>'),
        'plate.jpg',
      ],
      'pixel flood (10,000 x 10,000)': [pixelFlood(10_000, 10_000), 'plate.png'],
      'just over 50 megapixels': [pixelFlood(7_072, 7_072), 'plate.png'],
      'zero bytes': [Buffer.alloc(0), 'plate.jpg'],
      'over 20 MB': [Buffer.concat([jpeg, Buffer.alloc(UPLOAD_MAX_BYTES)]), 'plate.jpg'],
      'truncated JPEG': [jpeg.subarray(0, Math.floor(jpeg.length / 2)), 'plate.jpg'],
      'animated GIF': [
        await sharp([await frame(40), await frame(200)], { join: { animated: true } })
          .gif()
          .toBuffer(),
        'plate.gif',
      ],
    } as Record<string, [Buffer, string]>,
    accepted: {
      'JPEG with HTML and script after its end': [
        Buffer.concat([jpeg, Buffer.from('<html><script>alert(1)</script></html>')]),
        'plate.jpg',
      ],
      'traversal in the name': [jpeg, '../../../../tmp/evil.jpg'],
      'GPS EXIF': [await makeJpeg({ exif: true }), 'plate.jpg'],
      'CMYK JPEG': [await plate('jpeg').toColourspace('cmyk').jpeg().toBuffer(), 'plate.jpg'],
      '16-bit PNG': [await plate('png').toColourspace('rgb16').png().toBuffer(), 'plate.png'],
      'animated WebP': [
        await sharp([await frame(40), await frame(200)], { join: { animated: true } })
          .webp({ loop: 0 })
          .toBuffer(),
        'plate.webp',
      ],
    } as Record<string, [Buffer, string]>,
  };
}

/** Every file under the data folder except the database, so that a stray temporary or traversed file shows. */
const filesUnder = (dir: string): string[] =>
  readdirSync(dir, { recursive: true, withFileTypes: true })
    .filter((e) => e.isFile() && !e.name.startsWith('tickwright.sqlite') && e.name !== 'session-secret')
    .map((e) => path.relative(dir, path.join(e.parentPath, e.name)));

const send = (bytes: Buffer, filename: string) =>
  apprentice.agent.post('/api/uploads').attach('file', bytes, { filename, contentType: 'image/jpeg' });

describe('hostile uploads', { timeout: 60_000 }, () => {
  let files: Awaited<ReturnType<typeof corpus>>;
  beforeAll(async () => {
    files = await corpus();
  }, 60_000);

  it('when each hostile file is sent, then it is refused with a 4xx in the error shape and nothing is left behind', async () => {
    const outcomes: Record<string, number> = {};
    for (const [name, [bytes, filename]] of Object.entries(files.refused)) {
      const before = filesUnder(t.dataDir);
      const rows = await Upload.count();
      const res = await send(bytes, filename);
      outcomes[name] = res.status;
      expect(res.body, name).toMatchObject({ error: { code: expect.any(String), message: expect.any(String) } });
      expect(filesUnder(t.dataDir), name).toEqual(before);
      expect(await Upload.count(), name).toBe(rows);
    }
    expect(outcomes).toEqual({
      'SVG with a script': 415,
      'HTML named .jpg': 415,
      'pixel flood (10,000 x 10,000)': 413,
      'just over 50 megapixels': 413,
      'zero bytes': 415,
      'over 20 MB': 413,
      'truncated JPEG': 415,
      'animated GIF': 415,
    });
  });

  it('when each file that is a picture underneath is sent, then a clean JPEG is served in every size, with no metadata', async () => {
    for (const [name, [bytes, filename]] of Object.entries(files.accepted)) {
      const res = await send(bytes, filename);
      expect([name, res.status]).toEqual([name, 201]);
      const row = (await Upload.findByPk(res.body.id))!;
      expect(row.fileKey, name).toMatch(/^[0-9a-f]{32}$/);
      for (const url of [res.body.url, res.body.viewUrl, res.body.thumbUrl]) {
        const served = await apprentice.agent.get(url).buffer(true);
        expect(served.headers['content-type'], name).toBe('image/jpeg');
        const body = served.body as Buffer;
        const meta = await sharp(body).metadata();
        expect(
          { format: meta.format, space: meta.space, depth: meta.depth, pages: meta.pages ?? 1 },
          `${name} ${url}`,
        ).toEqual({ format: 'jpeg', space: 'srgb', depth: 'uchar', pages: 1 });
        expect({ exif: meta.exif, icc: meta.icc, xmp: meta.xmp, iptc: meta.iptc, comments: meta.comments }).toEqual({
          exif: undefined,
          icc: undefined,
          xmp: undefined,
          iptc: undefined,
          comments: undefined,
        });
        expect(body.includes('<script'), name).toBe(false);
        expect(body.includes('Saltmarsh Optics'), name).toBe(false);
      }
    }
    // Only the app's own names under uploads/, and nothing outside it.
    const stored = filesUnder(t.dataDir);
    expect(stored.every((f) => /^uploads\/[0-9a-f]{32}-(full|view|thumb)\.jpg$/.test(f))).toBe(true);
    expect(stored).toHaveLength(3 * Object.keys(files.accepted).length);
  });
});
