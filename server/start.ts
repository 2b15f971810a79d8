import { execSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import path from 'node:path';
import { loadConfigOrExit } from './config/env';

/** `npm start`: check the configuration, build the client once if there is no build yet, then run the server. */
process.env.NODE_ENV ??= 'production';
loadConfigOrExit();
const root = path.resolve(import.meta.dirname, '..');
if (!existsSync(path.join(root, 'dist', 'index.html'))) {
  console.log('No client build found: building it once (about a minute)…');
  execSync('npx vite build --logLevel warn', { cwd: root, stdio: 'inherit' });
}
await import('./index');
