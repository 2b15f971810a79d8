import { Send } from 'lucide-react';
import Markdown from 'react-markdown';
import remarkGfm from 'remark-gfm';
import { formatScore, SCORE_WORDS } from '@shared/grading/score';
import type { ProjectDTO } from '@shared/schemas/course';
import { ButtonLink } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { paths } from '@/config/paths';

/** The lesson's practical task: what to make and photograph, and what each score means for each criterion. */
export function ProjectBrief({ project, canSend }: { project: ProjectDTO; canSend: boolean }) {
  const totalWeight = project.criteria.reduce((s, c) => s + c.weight, 0);
  return (
    <Card role="region" className="space-y-5" aria-labelledby="project-heading">
      <div>
        <p className="text-sm font-semibold uppercase tracking-wide text-brass-dark">Project</p>
        <h2 id="project-heading" className="font-serif text-2xl font-semibold">
          {project.title}
        </h2>
      </div>
      <div className="prose max-w-[70ch] text-ink [--tw-prose-body:var(--color-ink)] prose-p:leading-[1.75]">
        <Markdown remarkPlugins={[remarkGfm]}>{project.brief}</Markdown>
      </div>
      <p className="text-sm text-muted">
        Pass mark: a weighted score of{' '}
        <span className="num font-semibold text-ink">{formatScore(project.passMark)}</span> of{' '}
        <span className="num">4</span>, with no criterion scored 0. Scores:{' '}
        {SCORE_WORDS.map((w, i) => `${i} ${w}`).join(' · ')}.
      </p>
      <div className="space-y-4">
        {project.criteria.map((c) => (
          <div key={c.key} className="overflow-x-auto">
            <table className="w-full min-w-[32rem] border-collapse text-left text-sm">
              <caption className="mb-1 text-left font-serif text-lg font-semibold text-ink">
                {c.label}{' '}
                <span className="font-sans text-sm font-normal text-muted">
                  weight <span className="num">{c.weight}</span> of <span className="num">{totalWeight}</span>
                </span>
              </caption>
              <thead className="sr-only">
                <tr>
                  <th scope="col">Score</th>
                  <th scope="col">What it looks like</th>
                </tr>
              </thead>
              <tbody>
                {c.scores.map((meaning, score) => (
                  <tr key={score} className="border-t border-rule align-top">
                    <th scope="row" className="w-32 py-2 pr-3 font-semibold whitespace-nowrap text-ink">
                      <span className="num">{score}</span> {SCORE_WORDS[score]}
                    </th>
                    <td className="py-2 leading-relaxed text-ink">{meaning}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        ))}
      </div>
      {canSend && (
        <ButtonLink to={paths.newSubmission(project.id)}>
          <Send className="size-4" aria-hidden />
          Send for review
        </ButtonLink>
      )}
    </Card>
  );
}
