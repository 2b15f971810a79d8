import type { Sequelize } from 'sequelize';
import { Course, Lesson, Project } from './course.model';
import { lessonOutline, lessonPlainText, parseLessonMarkdown, type OutlineHeading } from './lesson-markdown';
import { buildSearchIndex, type LessonSearchIndex } from './lesson-search';

export interface CatalogueLesson {
  lesson: Lesson;
  outline: OutlineHeading[];
  /** The readable text without headings, for search snippets. */
  text: string;
  project: Project | null;
}

export interface CatalogueCourse {
  course: Course;
  /** Live lessons in course order. */
  lessons: CatalogueLesson[];
}

/**
 * The live courses, lessons and projects with every lesson's Markdown already parsed into its outline, text and search
 * index. Content only changes when content/ is synced, so it is prepared then and every course, lesson and search read
 * is answered from memory; only an apprentice's done marks come from the database.
 */
export interface Catalogue {
  courses: CatalogueCourse[];
  bySlug: Map<string, CatalogueCourse>;
  search: LessonSearchIndex;
}

const catalogues = new WeakMap<Sequelize, Catalogue>();

export function catalogueOf(sequelize: Sequelize): Catalogue {
  const catalogue = catalogues.get(sequelize);
  if (!catalogue) throw new Error('Content has not been synced into this database yet (syncContent runs at start-up).');
  return catalogue;
}

/** Reads the live content rows once and keeps them, prepared, for this database. Called at the end of every sync. */
export async function prepareCatalogue(sequelize: Sequelize): Promise<Catalogue> {
  const live = { retiredAt: null };
  const courses = await Course.findAll({
    where: live,
    order: [
      ['position', 'ASC'],
      ['title', 'ASC'],
    ],
  });
  const lessons = await Lesson.findAll({ where: live, order: [['position', 'ASC']] });
  const projects = new Map((await Project.findAll({ where: live })).map((p) => [p.lessonId, p]));
  const entries = courses.map((course) => ({
    course,
    lessons: lessons
      .filter((lesson) => lesson.courseId === course.id)
      .map((lesson) => {
        const tree = parseLessonMarkdown(lesson.body);
        return {
          lesson,
          outline: lessonOutline(tree),
          text: lessonPlainText(tree),
          project: projects.get(lesson.id) ?? null,
        };
      }),
  }));
  const catalogue: Catalogue = {
    courses: entries,
    bySlug: new Map(entries.map((e) => [e.course.slug, e])),
    search: buildSearchIndex(entries),
  };
  catalogues.set(sequelize, catalogue);
  return catalogue;
}
