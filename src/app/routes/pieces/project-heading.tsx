import { Link } from 'react-router-dom';
import type { ProjectSummary } from '@shared/schemas/submission';
import { UserMarkdown } from '@/components/ui/user-markdown';
import { paths } from '@/config/paths';

/** The brief, folded away, so the apprentice can check what to photograph without leaving the form. */
export function ProjectBriefFold({ project }: { project: ProjectSummary }) {
  return (
    <details className="mb-6 rounded-lg border border-rule bg-card p-4">
      <summary className="min-h-11 cursor-pointer content-center font-semibold">
        The brief and what the mentor will judge
      </summary>
      <div className="mt-3 space-y-3">
        <UserMarkdown text={project.brief} />
        <ul className="list-disc pl-6 text-sm">
          {project.criteria.map((c) => (
            <li key={c.key}>
              <span className="font-semibold">{c.label}</span> (weight <span className="num">{c.weight}</span>): a
              “sound” piece, score <span className="num">3</span>: {c.scores[3]}
            </li>
          ))}
        </ul>
        <Link to={paths.lesson(project.course.slug, project.lesson.slug)}>Open the lesson: {project.lesson.title}</Link>
      </div>
    </details>
  );
}
