import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';

/**
 * The JavaScript a visitor downloads for each first screen, gzipped, against the 120 KB budget: the entry script and
 * the chunks it imports statically, plus the lazily loaded page and its imports. The first screens are sign-in and
 * each role's landing page (Today for apprentices and mentors; the guild office for the admin). Reads dist/.
 */
const BUDGET_KB = 120;
const dist = path.resolve(import.meta.dirname, '..', '..', 'dist');

const FIRST_SCREENS: Record<string, string> = {
  'sign-in': 'src/app/routes/sign-in.tsx',
  'Today (apprentice, mentor)': 'src/app/routes/today.tsx',
  'guild office (admin)': 'src/app/routes/guild-office/guild-office.tsx',
};

type Manifest = Record<string, { file: string; imports?: string[]; isEntry?: boolean }>;

function readManifest(): Manifest {
  const manifestFile = path.join(dist, '.vite', 'manifest.json');
  if (!existsSync(manifestFile)) throw new Error('No dist/.vite/manifest.json: run `npm run build` first.');
  return JSON.parse(readFileSync(manifestFile, 'utf8'));
}

export function firstScreenKb(page: string, manifest = readManifest()): { kb: number; files: string[] } {
  if (!manifest[page]) throw new Error(`${page} is not in the build manifest.`);
  const seen = new Set<string>();
  const visit = (key: string) => {
    const chunk = manifest[key];
    if (!chunk || seen.has(chunk.file)) return;
    seen.add(chunk.file);
    chunk.imports?.forEach(visit);
  };
  for (const [key, chunk] of Object.entries(manifest)) if (chunk.isEntry) visit(key);
  visit(page);
  const files = [...seen].filter((f) => f.endsWith('.js'));
  const bytes = files.reduce((sum, f) => sum + gzipSync(readFileSync(path.join(dist, f))).length, 0);
  return { kb: bytes / 1024, files };
}

export function runBundleBudget(): boolean {
  const manifest = readManifest();
  let ok = true;
  console.log(`First-screen JavaScript, gzipped (budget ${BUDGET_KB} KB each):`);
  for (const [name, page] of Object.entries(FIRST_SCREENS)) {
    const { kb, files } = firstScreenKb(page, manifest);
    const within = kb <= BUDGET_KB;
    ok &&= within;
    console.log(`  ${name.padEnd(28)} ${kb.toFixed(1)} KB in ${files.length} files ${within ? 'OK' : 'OVER BUDGET'}`);
  }
  return ok;
}

if (import.meta.url === `file://${process.argv[1]}`) process.exitCode = runBundleBudget() ? 0 : 1;
