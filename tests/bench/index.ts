import { execSync } from 'node:child_process';
import { runBundleBudget } from './bundle-budget';

/** `npm run bench`: speed and size targets, measured by scripts rather than timed unit tests. */
execSync('npx vite build --logLevel warn', { stdio: 'inherit' });
const results = [runBundleBudget()];
process.exitCode = results.every(Boolean) ? 0 : 1;
