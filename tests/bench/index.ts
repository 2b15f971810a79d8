import { execSync } from 'node:child_process';
import { runApiBench } from './api';
import { runBundleBudget } from './bundle-budget';
import { runLighthouseBench } from './lighthouse';
import { runQueueBench } from './queue';
import { runTrainSearchBench } from './train-search';
import { runUploadBench } from './uploads';

/** `npm run bench`: speed and size targets, measured by scripts rather than timed unit tests. */
execSync('npx vite build --logLevel warn', { stdio: 'inherit' });
const results = [
  runBundleBudget(),
  runTrainSearchBench(),
  await runUploadBench(),
  await runQueueBench(),
  await runApiBench(),
  await runLighthouseBench(),
];
process.exitCode = results.every(Boolean) ? 0 : 1;
