import { existsSync, readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import type { Root } from 'mdast';
import { visit } from 'unist-util-visit';
import { checkCalculatorExamples, type EmbeddedCalculator } from './calculator-examples';
import { loadContent, type ContentProblem, type LoadedCourse } from './content-loader';
import { parseLessonMarkdown } from './lesson-markdown';

/** Names an image may have: what the image route will serve, and nothing that could climb out of the folder. */
export const SAFE_IMAGE_NAME = /^[a-z0-9][a-z0-9._-]*\.(svg|png|jpe?g|webp)$/i;

interface ContentReport {
  problems: ContentProblem[];
  courses: number;
  lessons: number;
}

interface BodyContext {
  file: string;
  lineOffset: number;
  images: Set<string>;
  calculatorNames: readonly string[];
}

/**
 * Everything the lesson page relies on, checked before the server ever syncs it: front matter (by the loader),
 * calculator names, images, the Markdown dialect (no raw HTML, no unknown directives, no h1 in a body), and every
 * worked calculator example against what the calculator computes.
 */
export function checkContent(root: string, calculatorNames: readonly string[]): ContentReport {
  const { courses, problems } = loadContent(root);
  let lessons = 0;
  for (const course of courses) {
    const images = checkImagesFolder(path.join(course.dir, 'images'), problems);
    const courseFile = path.join(course.dir, 'course.md');
    checkSkills(course, courseFile, problems);
    checkBody(
      course.intro,
      { file: courseFile, lineOffset: course.introLineOffset, images, calculatorNames },
      problems,
    );
    for (const lesson of course.lessons) {
      lessons++;
      const ctx = { file: lesson.file, lineOffset: lesson.bodyLineOffset, images, calculatorNames };
      const embedded = checkBody(lesson.body, ctx, problems);
      checkCalculatorExamples(
        { file: lesson.file, body: lesson.body, examples: lesson.meta.calculatorExamples },
        embedded.filter((e) => calculatorNames.includes(e.name)),
        problems,
      );
    }
  }
  problems.sort((a, b) => a.file.localeCompare(b.file) || a.line - b.line);
  return { problems, courses: courses.length, lessons };
}

/**
 * A skill is signed off against the standard it states and the pieces sent for it, so every skill needs a standard
 * and at least one lesson that teaches it and ends with a project.
 */
function checkSkills(course: LoadedCourse, courseFile: string, problems: ContentProblem[]) {
  for (const skill of course.meta.skills) {
    if (!skill.standard)
      problems.push({
        file: courseFile,
        line: 1,
        message: `skill "${skill.key}" has no standard: say in a sentence or two what a mentor must see to sign it off`,
      });
    if (!course.lessons.some((l) => l.meta.project && l.meta.skills.includes(skill.key)))
      problems.push({
        file: courseFile,
        line: 1,
        message: `skill "${skill.key}" is taught by no lesson with a project: a sign-off needs a piece to judge`,
      });
  }
}

/** Checks one body and returns the calculators it embeds, with their lines. */
function checkBody(body: string, ctx: BodyContext, problems: ContentProblem[]): EmbeddedCalculator[] {
  const tree: Root = parseLessonMarkdown(body);
  const lineOf = (node: { position?: { start: { line: number } } }) =>
    (node.position?.start.line ?? 1) + ctx.lineOffset;
  const report = (node: { position?: { start: { line: number } } }, message: string) =>
    problems.push({ file: ctx.file, line: lineOf(node), message });
  const embedded: EmbeddedCalculator[] = [];

  visit(tree, (node) => {
    switch (node.type) {
      case 'html':
        report(node, `raw HTML is not allowed: ${node.value.trim().slice(0, 40)}`);
        break;
      case 'heading':
        if (node.depth === 1)
          report(node, 'a level-1 heading (#) in the body: the title is the only one; use ## or ###');
        break;
      case 'image':
        checkImage(node.url, ctx, (m) => report(node, m));
        break;
      case 'containerDirective':
        if (node.name !== 'caution') report(node, `unknown block directive ":::${node.name}" (only :::caution)`);
        break;
      case 'leafDirective':
        if (node.name === 'calculator') {
          const name = node.attributes?.name;
          if (!name) report(node, 'calculator directive without a name: write ::calculator{name="..."}');
          else if (!ctx.calculatorNames.includes(name))
            report(node, `unknown calculator "${name}" (known: ${ctx.calculatorNames.join(', ')})`);
          if (name) embedded.push({ name, line: lineOf(node) });
        } else if (node.name === 'caution') {
          report(node, 'a caution is a block: open it with :::caution and close it with :::');
        } else {
          report(node, `unknown directive "::${node.name}" (only ::calculator)`);
        }
        break;
      case 'textDirective':
        report(node, `unknown inline directive ":${node.name}" (a colon right before a word starts one; add a space)`);
        break;
    }
  });
  return embedded;
}

function checkImage(url: string, ctx: BodyContext, report: (message: string) => void) {
  const match = /^images\/([^/]+)$/.exec(url);
  if (!match) return report(`image "${url}" must point into the course's images folder: images/<file>`);
  if (!ctx.images.has(match[1])) report(`image "${url}" does not exist in the course's images folder`);
}

/** The images a course may use; hand-written SVG must be self-contained and script-free. */
function checkImagesFolder(dir: string, problems: ContentProblem[]): Set<string> {
  const names = new Set<string>();
  if (!existsSync(dir)) return names;
  for (const name of readdirSync(dir)) {
    const file = path.join(dir, name);
    if (!SAFE_IMAGE_NAME.test(name)) {
      problems.push({
        file,
        line: 0,
        message: 'image file names use a-z, 0-9, dot, dash and underscore (svg, png, jpg, webp)',
      });
      continue;
    }
    names.add(name);
    if (name.toLowerCase().endsWith('.svg')) checkSvg(file, problems);
  }
  return names;
}

const SVG_RULES: [RegExp, string][] = [
  [/<script/i, 'SVG must not contain scripts'],
  [/\son[a-z]+\s*=/i, 'SVG must not contain event attributes (onload=, onclick=, ...)'],
  [/<foreignObject/i, 'SVG must not contain foreignObject'],
  [/(?:href|src)\s*=\s*["'](?:https?:|\/\/|data:)/i, 'SVG must not refer to outside files or data'],
];

function checkSvg(file: string, problems: ContentProblem[]) {
  const text = readFileSync(file, 'utf8');
  const lineOf = (index: number) => text.slice(0, index).split('\n').length;
  if (!/<svg[^>]*\sviewBox=/i.test(text)) problems.push({ file, line: 1, message: 'SVG needs a viewBox' });
  for (const [rule, message] of SVG_RULES) {
    const hit = rule.exec(text);
    if (hit) problems.push({ file, line: lineOf(hit.index), message });
  }
}
