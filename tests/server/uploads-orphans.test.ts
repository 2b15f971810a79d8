import { existsSync, mkdirSync, mkdtempSync, readdirSync, rmSync, utimesSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { openAndMigrate } from '../../server/boot';
import { loadConfig } from '../../server/config/env';
import { User } from '../../server/features/auth/user.model';
import { storeUpload } from '../../server/features/uploads/uploads.service';
import { makeJpeg } from './support/pieces';
import { ORIGIN } from './support/test-app';

const dataDir = mkdtempSync(path.join(tmpdir(), 'tickwright-orphans-'));
afterAll(() => rmSync(dataDir, { recursive: true, force: true }));
const config = loadConfig({
  NODE_ENV: 'test',
  DATA_DIR: dataDir,
  APP_URL: ORIGIN,
  SESSION_SECRET: 'orphans-secret-orphans',
});
const uploads = path.join(dataDir, 'uploads');

/** A file as a killed upload would leave it, dated `hoursAgo` back. */
function leftBehind(name: string, hoursAgo: number) {
  const file = path.join(uploads, name);
  writeFileSync(file, 'half a photo');
  const when = new Date(Date.now() - hoursAgo * 3600 * 1000);
  utimesSync(file, when, when);
  return file;
}

describe('photo files an interrupted upload left behind', { timeout: 60_000 }, () => {
  it('when the server starts again, then old files with no row are gone and every stored photo and recent file stays', async () => {
    const first = await openAndMigrate(config);
    const owner = await User.create({ name: 'Ned Applegarth', email: 'ned-orphans@example.test', role: 'apprentice' });
    const kept = await storeUpload(dataDir, owner.id, await makeJpeg(), null);
    const keptFiles = readdirSync(uploads);
    expect(keptFiles).toHaveLength(3);
    await first.sequelize.close();
    mkdirSync(uploads, { recursive: true });
    // Killed after the files were renamed into place but before the row was committed:
    const orphans = ['0123456789abcdef0123456789abcdef-original.jpg', '0123456789abcdef0123456789abcdef-view.jpg'].map(
      (name) => leftBehind(name, 2),
    );
    // Killed in the middle of writing:
    orphans.push(leftBehind('fedcba9876543210fedcba9876543210-thumb.jpg.4242.tmp', 3));
    // Perhaps still being stored by another process: too young to judge.
    const young = leftBehind('00112233445566778899aabbccddeeff-view.jpg', 0.1);
    // An old photo that does have its row stays, however old.
    for (const name of keptFiles) {
      const when = new Date(Date.now() - 48 * 3600 * 1000);
      utimesSync(path.join(uploads, name), when, when);
    }

    const second = await openAndMigrate(config);
    for (const file of orphans) expect(existsSync(file), file).toBe(false);
    expect(existsSync(young)).toBe(true);
    for (const name of keptFiles) expect(existsSync(path.join(uploads, name)), name).toBe(true);
    expect(kept.id).toBeGreaterThan(0);
    await second.sequelize.close();
  });
});
