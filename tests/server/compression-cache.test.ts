import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { brotliCompressSync, gzipSync } from 'node:zlib';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { createLogger } from '../../server/lib/logger';
import { createTestApp, ORIGIN, TEST_PASSWORD, type TestApp } from './support/test-app';

// A client folder laid out as `vite build` leaves it: hashed files under assets/, each with its .br and .gz beside it.
const script = `export const lines = [${Array.from({ length: 200 }, (_, i) => `"line ${i}"`).join(',')}];\n`;
const SCRIPT = '/assets/entry-Ab12Cd34.js';

let t: TestApp;
let clientDir: string;
let app: ReturnType<typeof createApp>;
beforeAll(async () => {
  t = await createTestApp();
  clientDir = mkdtempSync(path.join(tmpdir(), 'tickwright-client-'));
  mkdirSync(path.join(clientDir, 'assets'));
  writeFileSync(path.join(clientDir, 'index.html'), `<!doctype html><script type="module" src="${SCRIPT}"></script>`);
  writeFileSync(path.join(clientDir, SCRIPT), script);
  writeFileSync(path.join(clientDir, `${SCRIPT}.br`), brotliCompressSync(script));
  writeFileSync(path.join(clientDir, `${SCRIPT}.gz`), gzipSync(script));
  app = createApp({ sequelize: t.sequelize, config: t.config, logger: createLogger(t.config), clientDir });
});
afterAll(async () => {
  await t.close();
  rmSync(clientDir, { recursive: true, force: true });
});

describe('compressed and cached replies', () => {
  it('when a browser accepts brotli, then a hashed script comes as the .br file, cached for a year', async () => {
    const res = await request(app).get(SCRIPT).set('Accept-Encoding', 'gzip, deflate, br').buffer(true);
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers['content-type']).toMatch(/javascript/);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(res.headers['vary']).toMatch(/Accept-Encoding/i);
    expect(res.text).toBe(script);
  });

  it('when a browser accepts only gzip, then the script comes gzipped with the same cache header', async () => {
    const res = await request(app).get(SCRIPT).set('Accept-Encoding', 'gzip');
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('gzip');
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(res.text).toBe(script);
  });

  it('when a browser accepts no encoding, then the script comes plain', async () => {
    const res = await request(app).get(SCRIPT).set('Accept-Encoding', 'identity');
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBeUndefined();
    expect(res.text).toBe(script);
  });

  it('when a page is opened, then index.html is revalidated, never cached as immutable', async () => {
    for (const page of ['/', '/courses/going-train-wall-regulator', '/index.html']) {
      const res = await request(app).get(page).set('Accept-Encoding', 'gzip, br');
      expect(res.status).toBe(200);
      expect(res.headers['content-type']).toMatch(/text\/html/);
      expect(res.headers['cache-control']).toBe('no-cache');
    }
  });

  it('when a hashed file is missing, then the answer is 404 rather than the page', async () => {
    const res = await request(app).get('/assets/entry-gone0000.js');
    expect(res.status).toBe(404);
    expect(res.headers['content-type'] ?? '').not.toMatch(/text\/html/);
  });

  it('when an API reply is over 1 KB, then it is compressed on the fly', async () => {
    const user = await t.createUser('apprentice');
    const agent = request.agent(app);
    await agent.post('/api/auth/login').set('Origin', ORIGIN).send({ email: user.email, password: TEST_PASSWORD });
    const res = await agent
      .get('/api/courses/going-train-wall-regulator/lessons/broaching-pivot-holes')
      .set('Accept-Encoding', 'br');
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.body.lesson.slug).toBe('broaching-pivot-holes');
  });
});
