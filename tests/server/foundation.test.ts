import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ConfigError, loadConfig } from '../../server/config/env';
import { createTestApp, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

describe('foundation', () => {
  it('when the health route is asked, then it reports the database and the package version', async () => {
    const res = await t.anon().get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ok: true, db: 'ok', version: '0.1.0' });
  });

  it('when an unknown API path is asked, then it answers 404 in the error shape', async () => {
    const res = await t.anon().get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.error).toMatchObject({ code: 'NOT_FOUND' });
    expect(typeof res.body.error.message).toBe('string');
  });

  it('when the body is not valid JSON, then it answers 400 in the error shape', async () => {
    const res = await t.anon().post('/api/auth/login').set('Content-Type', 'application/json').send('{oops');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('BAD_REQUEST');
  });

  it('when the migrations have run, then the core tables exist with WAL and foreign keys on', async () => {
    const [tables] = await t.sequelize.query("SELECT name FROM sqlite_master WHERE type='table'");
    const names = (tables as { name: string }[]).map((r) => r.name);
    expect(names).toEqual(expect.arrayContaining(['users', 'sessions', 'courses', 'lessons', 'classes', 'enrolments']));
    const journal = await t.sequelize.query('PRAGMA journal_mode', { type: QueryTypes.SELECT });
    expect(journal).toEqual([{ journal_mode: 'wal' }]);
    const fk = await t.sequelize.query('PRAGMA foreign_keys', { type: QueryTypes.SELECT });
    expect(fk).toEqual([{ foreign_keys: 1 }]);
  });

  it('when the response is served, then helmet sets a same-origin content security policy', async () => {
    const res = await t.anon().get('/api/health');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
  });
});

describe('configuration', () => {
  it('when PORT is not a number, then loading fails naming PORT', () => {
    expect(() => loadConfig({ PORT: 'abc', DATA_DIR: t.dataDir })).toThrow(ConfigError);
    expect(() => loadConfig({ PORT: 'abc', DATA_DIR: t.dataDir })).toThrow(/PORT/);
  });

  it('when no SESSION_SECRET is set, then one is generated once and kept in DATA_DIR', () => {
    const a = loadConfig({ DATA_DIR: t.dataDir });
    const b = loadConfig({ DATA_DIR: t.dataDir });
    expect(a.sessionSecret).toHaveLength(64);
    expect(b.sessionSecret).toBe(a.sessionSecret);
  });
});
