import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import matter from 'gray-matter';
import {
  CourseFrontMatter,
  LESSON_FILE,
  LessonFrontMatter,
  type CourseFrontMatter as CourseMeta,
  type LessonFrontMatter as LessonMeta,
} from '@shared/schemas/content';

export interface LoadedLesson {
  file: string;
  slug: string;
  position: number;
  meta: LessonMeta;
  body: string;
  /** Lines in the file before the body starts, so problems in the body can name their line. */
  bodyLineOffset: number;
}

export interface LoadedCourse {
  dir: string;
  meta: CourseMeta;
  intro: string;
  introLineOffset: number;
  lessons: LoadedLesson[];
}

export interface ContentProblem {
  file: string;
  line: number;
  message: string;
}

/** Reads every course folder under `root`; front matter problems are collected, not thrown. */
export function loadContent(root: string): { courses: LoadedCourse[]; problems: ContentProblem[] } {
  const courses: LoadedCourse[] = [];
  const problems: ContentProblem[] = [];
  if (!existsSync(root)) return { courses, problems: [{ file: root, line: 0, message: 'content folder not found' }] };
  const dirs = readdirSync(root).filter((d) => statSync(path.join(root, d)).isDirectory());
  for (const dir of dirs.sort()) {
    const courseFile = path.join(root, dir, 'course.md');
    const course = readFront(courseFile, CourseFrontMatter, problems);
    if (!course) continue;
    if (course.meta.slug !== dir) {
      problems.push({
        file: courseFile,
        line: 1,
        message: `slug "${course.meta.slug}" must equal the folder name "${dir}"`,
      });
    }
    const skillKeys = new Set(course.meta.skills.map((s) => s.key));
    const lessons: LoadedLesson[] = [];
    for (const name of readdirSync(path.join(root, dir)).sort()) {
      if (name === 'course.md' || !name.endsWith('.md')) continue;
      const file = path.join(root, dir, name);
      const match = LESSON_FILE.exec(name);
      if (!match) {
        problems.push({ file, line: 1, message: 'lesson files are named NN-slug.md, e.g. 03-turning-pivots.md' });
        continue;
      }
      const lesson = readFront(file, LessonFrontMatter, problems);
      if (!lesson) continue;
      for (const skill of lesson.meta.skills) {
        if (!skillKeys.has(skill))
          problems.push({ file, line: 2, message: `skill "${skill}" is not listed in course.md` });
      }
      lessons.push({ file, slug: match[2], position: Number(match[1]), ...lesson });
    }
    courses.push({
      dir: path.join(root, dir),
      meta: course.meta,
      intro: course.body,
      introLineOffset: course.bodyLineOffset,
      lessons,
    });
  }
  return { courses, problems };
}

function readFront<T>(
  file: string,
  schema: {
    safeParse(
      v: unknown,
    ): { success: true; data: T } | { success: false; error: { issues: { path: PropertyKey[]; message: string }[] } };
  },
  problems: ContentProblem[],
): { meta: T; body: string; bodyLineOffset: number } | null {
  let parsed: matter.GrayMatterFile<string>;
  try {
    parsed = matter(readFileSync(file, 'utf8'));
  } catch (err) {
    const mark = (err as { mark?: { line?: number } }).mark;
    problems.push({
      file,
      line: (mark?.line ?? 0) + 1,
      message: `front matter is not valid YAML: ${(err as Error).message.split('\n')[0]}`,
    });
    return null;
  }
  const result = schema.safeParse(parsed.data);
  if (!result.success) {
    for (const issue of result.error.issues) {
      problems.push({ file, line: 1, message: `front matter ${issue.path.join('.') || '(root)'}: ${issue.message}` });
    }
    return null;
  }
  const raw = readFileSync(file, 'utf8');
  // The body is trimmed, so blank lines before it count towards the offset too.
  const leading = parsed.content.length - parsed.content.trimStart().length;
  const bodyLineOffset = raw.slice(0, raw.length - parsed.content.length + leading).split('\n').length - 1;
  return { meta: result.data, body: parsed.content.trim(), bodyLineOffset };
}
