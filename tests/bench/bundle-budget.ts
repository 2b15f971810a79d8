import { existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';

/**
 * The JavaScript a visitor downloads for the first screen (the entry script, the chunks it imports statically, and the
 * lazily loaded sign-in page), gzipped, against the 150 KB budget. Reads the build in dist/.
 */
const BUDGET_KB = 150;
const dist = path.resolve(import.meta.dirname, '..', '..', 'dist');

export function firstScreenKb(): { kb: number; files: string[] } {
  const manifestFile = path.join(dist, '.vite', 'manifest.json');
  if (!existsSync(manifestFile)) throw new Error('No dist/.vite/manifest.json: run `npm run build` first.');
  const manifest: Record<string, { file: string; imports?: string[]; isEntry?: boolean; src?: string }> = JSON.parse(
    readFileSync(manifestFile, 'utf8'),
  );
  const seen = new Set<string>();
  const visit = (key: string) => {
    const chunk = manifest[key];
    if (!chunk || seen.has(chunk.file)) return;
    seen.add(chunk.file);
    chunk.imports?.forEach(visit);
  };
  for (const [key, chunk] of Object.entries(manifest)) {
    if (chunk.isEntry || key.endsWith('src/app/routes/sign-in.tsx')) visit(key);
  }
  const files = [...seen].filter((f) => f.endsWith('.js'));
  const bytes = files.reduce((sum, f) => sum + gzipSync(readFileSync(path.join(dist, f))).length, 0);
  return { kb: bytes / 1024, files };
}

export function runBundleBudget(): boolean {
  const { kb, files } = firstScreenKb();
  const ok = kb <= BUDGET_KB;
  console.log(
    `First-screen JavaScript: ${kb.toFixed(1)} KB gzipped in ${files.length} files (budget ${BUDGET_KB} KB) ${ok ? 'OK' : 'OVER BUDGET'}`,
  );
  return ok;
}

if (import.meta.url === `file://${process.argv[1]}`) process.exitCode = runBundleBudget() ? 0 : 1;
