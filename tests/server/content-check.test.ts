import { execFile } from 'node:child_process';
import { appendFileSync, cpSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import { afterEach, describe, expect, it } from 'vitest';
import { CALCULATOR_NAMES } from '@shared/calc/names';
import { CONTENT_DIR } from '../../server/boot';
import { checkContent } from '../../server/features/courses/content-check';

const run = promisify(execFile);
const ROOT = path.resolve(import.meta.dirname, '..', '..');
const BROACHING = path.join('going-train-wall-regulator', '04-broaching-pivot-holes.md');
const copies: string[] = [];

function contentCopy(): string {
  const dir = mkdtempSync(path.join(tmpdir(), 'tickwright-check-'));
  cpSync(CONTENT_DIR, dir, { recursive: true });
  copies.push(dir);
  return dir;
}

function edit(file: string, change: (text: string) => string) {
  writeFileSync(file, change(readFileSync(file, 'utf8')));
}

/** The line of the file holding `needle` (1-based), to check that problems point at the right line. */
const lineOf = (file: string, needle: string) =>
  readFileSync(file, 'utf8')
    .split('\n')
    .findIndex((l) => l.includes(needle)) + 1;

async function cli(dir: string): Promise<{ code: number; stdout: string; stderr: string }> {
  try {
    const { stdout, stderr } = await run('npx', ['tsx', 'server/scripts/content-check.ts', '--dir', dir], {
      cwd: ROOT,
    });
    return { code: 0, stdout, stderr };
  } catch (err) {
    const e = err as { code: number; stdout: string; stderr: string };
    return { code: e.code, stdout: e.stdout, stderr: e.stderr };
  }
}

afterEach(() => {
  for (const dir of copies.splice(0)) rmSync(dir, { recursive: true, force: true });
});

describe('content check', () => {
  it('when content/ is checked, then it passes with both courses and every lesson counted', () => {
    const report = checkContent(CONTENT_DIR, CALCULATOR_NAMES);
    expect(report.problems).toEqual([]);
    expect(report.courses).toBe(2);
    expect(report.lessons).toBeGreaterThanOrEqual(14);
  });

  it('when a skill has no standard, or no lesson with a project teaches it, then both are reported against course.md', () => {
    const dir = contentCopy();
    const course = path.join(dir, 'springs-heat-treatment', 'course.md');
    edit(course, (s) => s.replace(/(key: click-making\n\s+label: [^\n]+\n)\s+standard: >-\n(\s{6}[^\n]+\n)+/, '$1'));
    // The torque lesson is the only one with a project that teaches torque-evening.
    edit(path.join(dir, 'springs-heat-treatment', '07-adjusting-rod-and-evening-the-torque.md'), (s) =>
      s.replace(
        'skills: [torque-evening, fusee-layout, mainspring-handling]',
        'skills: [fusee-layout, mainspring-handling]',
      ),
    );
    const messages = checkContent(dir, CALCULATOR_NAMES).problems.map((p) => `${path.basename(p.file)}: ${p.message}`);
    expect(messages).toContain(
      'course.md: skill "click-making" has no standard: say in a sentence or two what a mentor must see to sign it off',
    );
    expect(messages).toContain(
      'course.md: skill "torque-evening" is taught by no lesson with a project: a sign-off needs a piece to judge',
    );
    expect(messages).toHaveLength(2);
  });

  it('when a lesson names an unknown calculator, then the problem names the file and the directive’s line', () => {
    const dir = contentCopy();
    const file = path.join(dir, BROACHING);
    edit(file, (s) => s.replace('::calculator{name="broach-taper"}', '::calculator{name="broach-tapir"}'));
    const { problems } = checkContent(dir, CALCULATOR_NAMES);
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatchObject({ file, line: lineOf(file, 'broach-tapir') });
    expect(problems[0].message).toContain('unknown calculator "broach-tapir"');
  });

  it('when a lesson front matter is broken, then the problem names the file and the field', () => {
    const dir = contentCopy();
    const file = path.join(dir, BROACHING);
    edit(file, (s) => s.replace(/^minutes: \d+$/m, 'minutes: a while'));
    const { problems } = checkContent(dir, CALCULATOR_NAMES);
    expect(problems).toHaveLength(1);
    expect(problems[0].file).toBe(file);
    expect(problems[0].message).toMatch(/minutes/);
  });

  it('when a body holds raw HTML, an h1, a missing image, an inline directive and an unknown block, then each is named', () => {
    const dir = contentCopy();
    const file = path.join(dir, BROACHING);
    appendFileSync(
      file,
      [
        '',
        '# A second title',
        '',
        'A line break<br>in HTML, then ratio:one by mistake.',
        '',
        '![A plate](images/no-such-plate.svg "Missing")',
        '',
        '![Elsewhere](https://example.test/a.png)',
        '',
        ':::warning',
        'Not a known block.',
        ':::',
        '',
      ].join('\n'),
    );
    const messages = checkContent(dir, CALCULATOR_NAMES).problems.map((p) => `${p.line}: ${p.message}`);
    expect(messages).toEqual([
      expect.stringMatching(new RegExp(`^${lineOf(file, '# A second title')}: a level-1 heading`)),
      expect.stringMatching(/raw HTML is not allowed: <br>/),
      expect.stringMatching(/unknown inline directive ":one"/),
      expect.stringMatching(/images\/no-such-plate.svg" does not exist/),
      expect.stringMatching(/must point into the course's images folder/),
      expect.stringMatching(/unknown block directive ":::warning"/),
    ]);
  });

  it('when a lesson’s calculator example shows a figure the calculator does not give, then the check names the lesson, the figure and what the calculator gives', () => {
    const dir = contentCopy();
    const file = path.join(dir, BROACHING);
    // The lesson's own example gives 23.49 mm for Ruth's five-sided broach; the plain-reading mark 27.5 mm is wrong.
    edit(file, (s) =>
      s.replace('insertionDepthMm: "23.49"', 'insertionDepthMm: "27.5"').replace('23.49 mm', '27.5 mm'),
    );
    const { problems } = checkContent(dir, CALCULATOR_NAMES);
    expect(problems).toEqual([
      {
        file,
        line: lineOf(file, 'calculatorExamples:'),
        message:
          'calculator example 1 (broach-taper): the lesson shows insertionDepthMm = 27.5 but the calculator gives 23.487',
      },
    ]);
  });

  it('when an example’s figure agrees with the calculator but the lesson text never prints it, then the check says so', () => {
    const dir = contentCopy();
    const file = path.join(dir, BROACHING);
    edit(file, (s) => s.replaceAll('2.05°', 'about two degrees'));
    const messages = checkContent(dir, CALCULATOR_NAMES).problems.map((p) => p.message);
    expect(messages).toEqual([
      "calculator example 1 (broach-taper): tiltDeg = 2.05 is checked but the lesson's text never shows that figure",
    ]);
  });

  it('when a lesson embeds a calculator with no worked example for it, then the problem points at the directive', () => {
    const dir = contentCopy();
    const file = path.join(dir, BROACHING);
    edit(file, (s) => s.replace(/calculatorExamples:[\s\S]*?\n---\n/, '---\n'));
    const { problems } = checkContent(dir, CALCULATOR_NAMES);
    expect(problems).toEqual([
      {
        file,
        line: lineOf(file, '::calculator{name="broach-taper"}'),
        message:
          'calculator "broach-taper" is embedded but calculatorExamples gives no worked example for it, so its figures cannot be checked',
      },
    ]);
  });

  it('when an example’s inputs are not valid for its calculator, then the problem names the input', () => {
    const dir = contentCopy();
    const file = path.join(dir, BROACHING);
    edit(file, (s) => s.replace('      broachSides: 5\n', '      broachSides: 2\n'));
    const messages = checkContent(dir, CALCULATOR_NAMES).problems.map((p) => p.message);
    expect(messages).toEqual([
      'calculator example 1 (broach-taper): the inputs are not valid: broachSides: Enter 0 for a round broach, or 3 to 12 sides.',
    ]);
  });

  it('when an example names a result the calculator does not have, then the check says so', () => {
    const dir = contentCopy();
    const file = path.join(dir, BROACHING);
    edit(file, (s) => s.replace('      tiltDeg: "2.05"', '      tiltDegrees: "2.05"'));
    const messages = checkContent(dir, CALCULATOR_NAMES).problems.map((p) => p.message);
    expect(messages).toEqual(['calculator example 1 (broach-taper): the calculator has no result "tiltDegrees"']);
  });

  it('when an SVG in images/ carries a script, then the check refuses it', () => {
    const dir = contentCopy();
    const svg = path.join(dir, 'going-train-wall-regulator', 'images', 'bad.svg');
    writeFileSync(svg, '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 10 10">\n<script>alert(1)</script></svg>');
    const { problems } = checkContent(dir, CALCULATOR_NAMES);
    expect(problems).toEqual([{ file: svg, line: 2, message: 'SVG must not contain scripts' }]);
  });

  it('when the CLI runs on content/, then it exits 0 and reports the count', async () => {
    const res = await cli(CONTENT_DIR);
    expect(res.code).toBe(0);
    expect(res.stdout).toMatch(/2 course\(s\), \d+ lesson\(s\).*no problems/);
  });

  it('when the CLI runs on a broken copy, then it exits 1 printing file:line: problem for each file', async () => {
    const dir = contentCopy();
    const file = path.join(dir, BROACHING);
    edit(file, (s) => s.replace('::calculator{name="broach-taper"}', '::calculator{name="no-such-calculator"}'));
    const course = path.join(dir, 'springs-heat-treatment', 'course.md');
    edit(course, (s) => s.replace(/^level: .*$/m, 'level: expert'));
    const res = await cli(dir);
    expect(res.code).toBe(1);
    expect(res.stderr).toContain(
      `${file}:${lineOf(file, 'no-such-calculator')}: unknown calculator "no-such-calculator"`,
    );
    expect(res.stderr).toMatch(new RegExp(`${course.replace(/[.]/g, '\\.')}:1: front matter level`));
  });

  it('when the CLI runs on a copy whose example disagrees with its calculator, then it exits 1 naming the figure', async () => {
    const dir = contentCopy();
    const file = path.join(dir, 'going-train-wall-regulator', '10-train-count-and-pendulum.md');
    edit(file, (s) => s.replace('pendulumLengthMm: "993.6"', 'pendulumLengthMm: "993.7"'));
    const res = await cli(dir);
    expect(res.code).toBe(1);
    expect(res.stderr).toContain('the lesson shows pendulumLengthMm = 993.7 but the calculator gives 993.621');
  });
});
