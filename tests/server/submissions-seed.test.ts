import { readdirSync } from 'node:fs';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedDemo } from '../../server/demo/seed';
import { Pin, Review } from '../../server/features/reviews/review.model';
import { Submission } from '../../server/features/submissions/submission.model';
import { Upload } from '../../server/features/uploads/upload.model';
import { createTestApp, TEST_PASSWORD, type TestApp } from './support/test-app';
import { User } from '../../server/features/auth/user.model';
import { hashPassword } from '../../server/features/auth/passwords';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
  await seedDemo(t.sequelize);
}, 120_000);
afterAll(() => t.close());

async function signInDemo(key: string) {
  const user = (await User.findOne({ where: { email: `${key}@saltmarsh-guild.test` } }))!;
  await user.update({ passwordHash: await hashPassword(TEST_PASSWORD) });
  return (await t.signIn(user)).agent;
}

describe('demo submissions', () => {
  it('when the demo is loaded, then Odile’s queue holds Ruth’s, Tamsin’s and Jago’s pieces and Bram’s holds Mabli’s', async () => {
    const odile = await signInDemo('odile');
    const queue = await odile.get('/api/review-queue');
    expect(queue.body.rows.map((r: { apprentice: { name: string } }) => r.apprentice.name).sort()).toEqual([
      'Jago Penhallow',
      'Ruth Ashdown',
      'Tamsin Quarrell',
    ]);
    expect((await odile.get('/api/notifications')).body.unreadCount).toBe(3);
    const bram = await signInDemo('bram');
    expect(
      (await bram.get('/api/review-queue')).body.rows.map((r: { apprentice: { name: string } }) => r.apprentice.name),
    ).toEqual(['Mabli Treharne']);
  });

  it('when Ned opens his pieces, then the pivot holes came back for rework with two pins and the pivots passed on version 2', async () => {
    const ned = await signInDemo('ned');
    const list = (await ned.get('/api/submissions')).body.items as {
      id: number;
      status: string;
      project: { title: string };
    }[];
    const holes = list.find((s) => s.project.title === 'A pair of upright pivot holes')!;
    const pivots = list.find((s) => s.project.title === 'Two burnished pivots on a practice arbor')!;
    expect(holes.status).toBe('rework');
    expect(pivots.status).toBe('passed');
    const piece = (await ned.get(`/api/submissions/${holes.id}`)).body;
    expect(piece.versions[0].review.pins).toHaveLength(2);
    const photo = await ned.get(piece.versions[0].photos[0].thumbUrl);
    expect(photo.status).toBe(200);
    expect(
      (await ned.get(`/api/submissions/${pivots.id}`)).body.versions.map(
        (v: { review: { outcome: string } }) => v.review.outcome,
      ),
    ).toEqual(['rework', 'passed']);
  });

  it('when the demo is loaded twice, then nothing is added and every photo has its three files', async () => {
    const before = {
      subs: await Submission.count(),
      reviews: await Review.count(),
      pins: await Pin.count(),
      uploads: await Upload.count(),
    };
    await seedDemo(t.sequelize);
    expect({
      subs: await Submission.count(),
      reviews: await Review.count(),
      pins: await Pin.count(),
      uploads: await Upload.count(),
    }).toEqual(before);
    expect(readdirSync(path.join(t.dataDir, 'uploads')).filter((f) => f.endsWith('.jpg'))).toHaveLength(
      before.uploads * 3,
    );
  });
});
