import { readdirSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { LogEntry } from '../../server/features/bench-log/log-entry.model';
import { IdempotencyKey } from '../../server/features/idempotency/idempotency-key.model';
import { Upload } from '../../server/features/uploads/upload.model';
import { entryBody } from './support/bench-log';
import { makeJpeg } from './support/pieces';
import { createTestApp, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const entriesOf = (userId: number) => LogEntry.count({ where: { apprenticeId: userId } });

describe('Idempotency-Key on the creating POSTs', () => {
  it('when a log entry is sent twice with the same key, then the second gets the first answer and nothing new is written', async () => {
    const { agent, user } = await t.signIn('apprentice');
    const body = entryBody({ title: 'Pivot holes broached', minutes: 40 });
    const first = await agent.post('/api/log-entries').set('Idempotency-Key', 'entry-1').send(body);
    expect(first.status).toBe(201);
    const again = await agent.post('/api/log-entries').set('Idempotency-Key', 'entry-1').send(body);
    expect(again.status).toBe(201);
    expect(again.body).toEqual(first.body);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(await entriesOf(user.id)).toBe(1);

    // Without a key, or with another one, it is a new entry as usual.
    expect((await agent.post('/api/log-entries').send(body)).status).toBe(201);
    expect((await agent.post('/api/log-entries').set('Idempotency-Key', 'entry-2').send(body)).status).toBe(201);
    expect(await entriesOf(user.id)).toBe(3);
  });

  it('when the same key is sent many times at once, then exactly one entry is written and the rest replay it or are told to wait', async () => {
    const { agent, user } = await t.signIn('apprentice');
    const body = entryBody({ title: 'Clicked send ten times', minutes: 5 });
    const replies = await Promise.all(
      Array.from({ length: 10 }, () => agent.post('/api/log-entries').set('Idempotency-Key', 'burst').send(body)),
    );
    expect(await entriesOf(user.id)).toBe(1);
    const created = replies.filter((r) => r.status === 201);
    expect(created.length).toBeGreaterThanOrEqual(1);
    expect(new Set(created.map((r) => r.body.id)).size).toBe(1);
    for (const r of replies.filter((r) => r.status !== 201)) {
      expect(r.status).toBe(409);
      expect(r.body.error.code).toBe('REQUEST_IN_PROGRESS');
    }
  });

  it('when two people happen to use the same key, then each gets their own entry', async () => {
    const a = await t.signIn('apprentice');
    const b = await t.signIn('apprentice');
    const body = entryBody({ title: 'Same key, other bench', minutes: 5 });
    const ra = await a.agent.post('/api/log-entries').set('Idempotency-Key', 'shared').send(body);
    const rb = await b.agent.post('/api/log-entries').set('Idempotency-Key', 'shared').send(body);
    expect([ra.status, rb.status]).toEqual([201, 201]);
    expect(ra.body.id).not.toBe(rb.body.id);
  });

  it('when a first attempt is refused, then a corrected retry with the same key is carried out', async () => {
    const { agent, user } = await t.signIn('apprentice');
    const bad = await agent.post('/api/log-entries').set('Idempotency-Key', 'fix-me').send({ title: '' });
    expect(bad.status).toBe(400);
    const good = await agent
      .post('/api/log-entries')
      .set('Idempotency-Key', 'fix-me')
      .send(entryBody({ title: 'Now complete', minutes: 5 }));
    expect(good.status).toBe(201);
    expect(await entriesOf(user.id)).toBe(1);
  });

  it('when a key is reused for another kind of request or is malformed, then it is refused', async () => {
    const { agent, user } = await t.signIn('apprentice');
    await agent
      .post('/api/log-entries')
      .set('Idempotency-Key', 'one-use')
      .send(entryBody({ minutes: 5 }));
    const other = await agent.post('/api/submissions').set('Idempotency-Key', 'one-use').send({ projectId: 1 });
    expect(other.status).toBe(422);
    expect(other.body.error.code).toBe('KEY_REUSED');
    const long = await agent.post('/api/log-entries').set('Idempotency-Key', 'x'.repeat(201)).send(entryBody());
    expect(long.status).toBe(400);
    expect(await entriesOf(user.id)).toBe(1);
  });

  it('when a key is more than a day old, then it no longer replays', async () => {
    const { agent, user } = await t.signIn('apprentice');
    const body = entryBody({ title: 'Yesterday', minutes: 5 });
    await agent.post('/api/log-entries').set('Idempotency-Key', 'old').send(body);
    // createdAt is managed by Sequelize, so it is set back by hand.
    await t.sequelize.query(`UPDATE idempotency_keys SET createdAt = :old WHERE userId = :id AND key = 'old'`, {
      replacements: { old: new Date(Date.now() - 25 * 3600 * 1000), id: user.id },
    });
    expect((await agent.post('/api/log-entries').set('Idempotency-Key', 'old').send(body)).status).toBe(201);
    expect(await entriesOf(user.id)).toBe(2);
    expect(await IdempotencyKey.count({ where: { userId: user.id, key: 'old' } })).toBe(1);
  });

  it('when a photo upload is retried with the same key, then one row and one set of files exist', async () => {
    const { agent, user } = await t.signIn('apprentice');
    const jpeg = await makeJpeg();
    const send = () =>
      agent
        .post('/api/uploads')
        .set('Idempotency-Key', 'photo-1')
        .attach('file', jpeg, { filename: 'plate.jpg', contentType: 'image/jpeg' });
    const first = await send();
    expect(first.status).toBe(201);
    const again = await send();
    expect(again.status).toBe(201);
    expect(again.body.id).toBe(first.body.id);
    const rows = await Upload.findAll({ where: { ownerId: user.id } });
    expect(rows).toHaveLength(1);
    const files = readdirSync(path.join(t.dataDir, 'uploads')).filter((f) => f.startsWith(rows[0].fileKey));
    expect(files).toHaveLength(3);
  });
});
