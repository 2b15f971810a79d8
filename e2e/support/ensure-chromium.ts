import { execSync } from 'node:child_process';
import { existsSync } from 'node:fs';

/** Browser tests use Debian's Chromium; install it when we may (root with apt), otherwise say how. */
const chromium = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
if (!existsSync(chromium)) {
  const isRoot = process.getuid?.() === 0;
  const hasApt = existsSync('/usr/bin/apt-get');
  if (isRoot && hasApt) {
    console.log('Chromium not found: installing Debian’s chromium package (about a minute)…');
    execSync('apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium', {
      stdio: 'inherit',
    });
  } else {
    console.error(
      `No Chromium at ${chromium}. Install Debian's package as root (apt-get install -y chromium), ` +
        'or point CHROMIUM_PATH at a Chromium or Chrome binary, then run the tests again.',
    );
    process.exit(1);
  }
}
