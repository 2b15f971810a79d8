import path from 'node:path';
import { parseArgs } from 'node:util';
import { CALCULATOR_NAMES } from '@shared/calc/names';
import { checkContent } from '../features/courses/content-check';

/** `npm run content:check -- --dir <folder>`: prints `file:line: problem` and exits 1 when anything is wrong. */
const { values } = parseArgs({ options: { dir: { type: 'string' } } });
const root = path.resolve(values.dir ?? path.join(import.meta.dirname, '..', '..', 'content'));
const report = checkContent(root, CALCULATOR_NAMES);
const shown = (file: string) =>
  path.relative(process.cwd(), file).startsWith('..') ? file : path.relative(process.cwd(), file);
for (const p of report.problems) console.error(`${shown(p.file)}:${p.line}: ${p.message}`);
if (report.problems.length > 0) {
  console.error(`content:check found ${report.problems.length} problem(s) in ${root}`);
  process.exit(1);
}
console.log(`content:check: ${report.courses} course(s), ${report.lessons} lesson(s) in ${root}, no problems.`);
