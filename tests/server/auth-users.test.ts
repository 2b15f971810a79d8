import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { UserListReply } from '@shared/schemas/user';
import { createTestApp, type TestApp } from './support/test-app';

let t: TestApp;
let admin: Awaited<ReturnType<TestApp['signIn']>>['agent'];
beforeAll(async () => {
  t = await createTestApp();
  admin = (await t.signIn('admin')).agent;
  // 25 apprentices and 3 mentors sharing a word in their names, so that searches have a known answer.
  for (let i = 1; i <= 25; i++) {
    await t.createUser('apprentice', {
      name: `Fusee Maker ${String(i).padStart(2, '0')}`,
      email: `fusee-${i}@bench.test`,
    });
  }
  for (let i = 1; i <= 3; i++)
    await t.createUser('mentor', { name: `Fusee Mentor ${i}`, email: `mentor-${i}@guild.test` });
  await t.createUser('apprentice', { name: 'Wren 100% Sure', email: 'wren@bench.test', active: false });
});
afterAll(() => t.close());

describe('the list of accounts for the guild office', () => {
  it('when searching a name, then 20 come per page in name order with the total', async () => {
    const first = UserListReply.parse((await admin.get('/api/users?q=fusee maker')).body);
    expect(first.total).toBe(25);
    expect(first.users).toHaveLength(20);
    expect(first.users[0].name).toBe('Fusee Maker 01');
    expect(first.users[19].name).toBe('Fusee Maker 20');
    const second = UserListReply.parse((await admin.get('/api/users?q=fusee maker&page=2')).body);
    expect(second.users.map((u) => u.name)).toEqual(['21', '22', '23', '24', '25'].map((n) => `Fusee Maker ${n}`));
  });

  it('when filtering by role and searching, then only that role is listed', async () => {
    const res = UserListReply.parse((await admin.get('/api/users?q=FUSEE&role=mentor')).body);
    expect(res.total).toBe(3);
    expect(res.users.every((u) => u.role === 'mentor')).toBe(true);
  });

  it('when searching part of an e-mail address, then it matches case-insensitively', async () => {
    const res = UserListReply.parse((await admin.get('/api/users?q=@GUILD.test')).body);
    expect(res.users.map((u) => u.email)).toEqual([
      'mentor-1@guild.test',
      'mentor-2@guild.test',
      'mentor-3@guild.test',
    ]);
  });

  it('when the search holds % or _, then they are matched literally, not as wildcards', async () => {
    const percent = UserListReply.parse((await admin.get('/api/users?q=100%25')).body);
    expect(percent.users.map((u) => u.name)).toEqual(['Wren 100% Sure']);
    expect(UserListReply.parse((await admin.get('/api/users?q=_')).body).total).toBe(0);
  });

  it('when listed, then each account shows whether it is active and when it was made, and never its password', async () => {
    const res = await admin.get('/api/users?q=wren');
    expect(res.body.users[0]).toMatchObject({
      name: 'Wren 100% Sure',
      active: false,
      role: 'apprentice',
      unitSystem: 'metric',
    });
    expect(Date.parse(res.body.users[0].createdAt)).not.toBeNaN();
    expect(JSON.stringify(res.body)).not.toMatch(/password/i);
  });

  it('when there are no filters or the role filter is empty, then every account is counted', async () => {
    const all = UserListReply.parse((await admin.get('/api/users')).body);
    expect(all.total).toBe(30);
    expect(UserListReply.parse((await admin.get('/api/users?role=&q=')).body).total).toBe(30);
  });

  it('when the role or page is not valid, then it answers 400', async () => {
    expect((await admin.get('/api/users?role=owner')).status).toBe(400);
    expect((await admin.get('/api/users?page=0')).status).toBe(400);
    expect((await admin.get('/api/users?page=two')).status).toBe(400);
  });
});
