import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CERTIFICATE_CODE } from '@shared/schemas/record';
import { AuditEvent } from '../../server/features/audit/audit-event.model';
import { Certificate } from '../../server/features/record/record.model';
import { VERIFY_LIMIT } from '../../server/features/record/certificates.router';
import { pdfText } from './support/pdf-text';
import { binary, finishCourse, recordClass } from './support/record';
import { createTestApp, ORIGIN, type TestApp } from './support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(() => t.close());

const SPRINGS = 'springs-heat-treatment';

async function finishedApprentice() {
  const cls = await recordClass(t, SPRINGS);
  const course = await finishCourse(cls.apprentice.user.id, cls.mentor.user.id, SPRINGS);
  const office = await t.signIn('admin');
  return { ...cls, course, office };
}

describe('certificates', () => {
  it('when the course is not finished, then 422 NOT_COMPLETE names the skills and projects still missing', async () => {
    const cls = await recordClass(t, SPRINGS);
    const office = await t.signIn('admin');
    const res = await office.agent
      .post('/api/certificates')
      .send({ apprenticeId: cls.apprentice.user.id, courseId: cls.course.id });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe('NOT_COMPLETE');
    expect(res.body.error.fields.skills).toHaveLength(7);
    expect(res.body.error.fields.skills).toContain('Hardening and tempering carbon steel: not signed off');
    expect(res.body.error.fields.projects).toContain('A temper-colour ladder: not passed');
    expect(await Certificate.count({ where: { apprenticeId: cls.apprentice.user.id } })).toBe(0);
  });

  it('when every skill is signed off and every project passed, then the guild office gets 201 with a long random code, once', async () => {
    const a = await finishedApprentice();
    const res = await a.office.agent
      .post('/api/certificates')
      .send({ apprenticeId: a.apprentice.user.id, courseId: a.course.id });
    expect(res.status).toBe(201);
    expect(res.body.code).toMatch(CERTIFICATE_CODE);
    const row = (await Certificate.findByPk(res.body.id))!;
    expect(row).toMatchObject({
      code: res.body.code,
      apprenticeId: a.apprentice.user.id,
      issuedById: a.office.user.id,
    });
    expect(await AuditEvent.count({ where: { action: 'certificate.issued', targetId: row.id } })).toBe(1);
    const twice = await a.office.agent
      .post('/api/certificates')
      .send({ apprenticeId: a.apprentice.user.id, courseId: a.course.id });
    expect(twice.status).toBe(409);
    const byMentor = await a.mentor.agent
      .post('/api/certificates')
      .send({ apprenticeId: a.apprentice.user.id, courseId: a.course.id });
    expect(byMentor.status).toBe(403);
  });

  it('when certificates are listed, then the apprentice sees their own, their mentor theirs, and a stranger 404', async () => {
    const a = await finishedApprentice();
    const issued = await a.office.agent
      .post('/api/certificates')
      .send({ apprenticeId: a.apprentice.user.id, courseId: a.course.id });
    const own = await a.apprentice.agent.get('/api/certificates');
    expect(own.body.certificates).toEqual([
      {
        id: issued.body.id,
        code: issued.body.code,
        apprentice: { id: a.apprentice.user.id, name: a.apprentice.user.name },
        course: { id: a.course.id, title: 'Springs and Heat Treatment' },
        issuedAt: expect.any(String),
        revokedAt: null,
      },
    ]);
    const byMentor = await a.mentor.agent.get(
      `/api/certificates?apprenticeId=${a.apprentice.user.id}&courseId=${a.course.id}`,
    );
    expect(byMentor.body.certificates.map((c: { id: number }) => c.id)).toEqual([issued.body.id]);
    const stranger = await recordClass(t, SPRINGS);
    expect((await stranger.mentor.agent.get(`/api/certificates?apprenticeId=${a.apprentice.user.id}`)).status).toBe(
      404,
    );
    expect((await stranger.mentor.agent.get('/api/certificates')).body.certificates).toEqual([]);
  });

  it('when the PDF is downloaded, then it is a PDF whose text holds the guild, the apprentice, the course, the skills and the code', async () => {
    const a = await finishedApprentice();
    const { body } = await a.office.agent
      .post('/api/certificates')
      .send({ apprenticeId: a.apprentice.user.id, courseId: a.course.id });
    const res = await a.apprentice.agent.raw.get(`/api/certificates/${body.id}/pdf`).buffer(true).parse(binary);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const pdf = res.body as Buffer;
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const text = pdfText(pdf);
    expect(text).toContain(a.apprentice.user.name);
    expect(text).toContain(body.code);
    expect(text).toContain('Saltmarsh Guild of Clockmakers');
    expect(text).toContain('Springs and Heat Treatment');
    expect(text).toContain('Measuring spring torque and evening it out');
    expect(text).toContain(`${ORIGIN}/verify/${body.code}`);
    expect(text).toContain(a.mentor.user.name);
    // The shipped fonts are embedded, not a viewer's stand-ins.
    expect(pdf.toString('latin1')).toMatch(/\/FontFile2/);
    expect(pdf.toString('latin1')).toMatch(/\+Fraunces-SemiBold/);
    expect(pdf.toString('latin1')).toMatch(/\+Inter-Regular/);
    const stranger = await recordClass(t, SPRINGS);
    expect((await stranger.mentor.agent.get(`/api/certificates/${body.id}/pdf`)).status).toBe(404);
  });

  it('when anyone checks the code without signing in, then it is valid; after a revoke it is not; an unknown code is 404', async () => {
    const a = await finishedApprentice();
    const { body } = await a.office.agent
      .post('/api/certificates')
      .send({ apprenticeId: a.apprentice.user.id, courseId: a.course.id });
    const check = await t.anon().get(`/api/verify/${body.code}`);
    expect(check.status).toBe(200);
    expect(check.body).toEqual({
      valid: true,
      apprentice: { name: a.apprentice.user.name },
      course: { title: 'Springs and Heat Treatment' },
      issuedAt: expect.any(String),
      guild: 'Saltmarsh Guild of Clockmakers',
      revokedAt: null,
    });
    expect((await a.mentor.agent.post(`/api/certificates/${body.id}/revoke`).send({ reason: 'Mistake' })).status).toBe(
      403,
    );
    const revoke = await a.office.agent
      .post(`/api/certificates/${body.id}/revoke`)
      .send({ reason: 'Issued in error.' });
    expect(revoke.status).toBe(200);
    expect((await Certificate.findByPk(body.id))!.revokeReason).toBe('Issued in error.');
    expect(await AuditEvent.count({ where: { action: 'certificate.revoked', targetId: body.id } })).toBe(1);
    const after = await t.anon().get(`/api/verify/${body.code}`);
    expect(after.body).toMatchObject({ valid: false, revokedAt: expect.any(String) });
    expect((await a.office.agent.post(`/api/certificates/${body.id}/revoke`).send({ reason: 'Again.' })).status).toBe(
      409,
    );
    const unknown = await t.anon().get('/api/verify/TW-00000-00000-00000-00000');
    expect([unknown.status, unknown.body.error.code]).toEqual([404, 'NOT_FOUND']);
  });

  it('when one client checks codes over and over, then it is refused with 429 after the limit', async () => {
    const fresh = await createTestApp();
    try {
      const anon = fresh.anon();
      for (let i = 0; i < VERIFY_LIMIT.limit; i++) await anon.get(`/api/verify/TW-GUESS-${i}`);
      const res = await anon.get('/api/verify/TW-GUESS-LAST');
      expect(res.status).toBe(429);
      expect(res.body.error.code).toBe('TOO_MANY_ATTEMPTS');
      expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
    } finally {
      await fresh.close();
    }
  });
});
