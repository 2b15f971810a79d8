import { useState } from 'react';
import type { ApprenticeRecord, RecordCourse } from '@shared/schemas/record';
import type { UserDTO } from '@shared/schemas/user';
import { Button } from '@/components/ui/button';
import { EmptyState, ErrorNotice } from '@/components/ui/states';
import { ApiError } from '@/lib/api-client';
import { useIssueCertificate } from '../api/record-actions';
import { CertificatesPanel } from './certificates-panel';
import { HoursPanel } from './hours-panel';
import { PortfolioExport } from './portfolio-export';
import { SkillCard } from './skill-card';

/** The whole record as each reader sees it: the apprentice their own, a mentor or the guild office with actions. */
export function RecordView({ record, viewer }: { record: ApprenticeRecord; viewer: UserDTO }) {
  const own = viewer.id === record.apprentice.id;
  const signer = viewer.role === 'apprentice' ? null : { id: viewer.id, isOffice: viewer.role === 'admin' };
  return (
    <div className="space-y-10">
      {record.courses.length === 0 && (
        <EmptyState title="No course on the record yet">
          <p>Skills appear here once {own ? 'you are' : 'the apprentice is'} enrolled in a class.</p>
        </EmptyState>
      )}
      {record.courses.map((course) => (
        <section key={course.course.id} aria-labelledby={`course-${course.course.id}`} className="space-y-4">
          <div className="flex flex-wrap items-end justify-between gap-3">
            <h2 id={`course-${course.course.id}`} className="font-serif text-2xl font-semibold">
              {course.course.title}
            </h2>
            <p className="text-sm text-muted">
              <span className="num">{course.skills.filter((s) => s.status === 'signed-off').length}</span> of{' '}
              <span className="num">{course.skills.length}</span> skills signed off
            </p>
          </div>
          {viewer.role === 'admin' && <IssueCertificate apprenticeId={record.apprentice.id} course={course} />}
          {course.hours && <HoursPanel hours={course.hours} who={own ? 'you' : record.apprentice.name} />}
          <ul className="space-y-3">
            {course.skills.map((skill) => (
              <SkillCard
                key={skill.key}
                apprentice={record.apprentice}
                courseId={course.course.id}
                skill={skill}
                signer={signer}
              />
            ))}
          </ul>
        </section>
      ))}
      <CertificatesPanel apprenticeId={record.apprentice.id} isOffice={viewer.role === 'admin'} />
      <PortfolioExport apprenticeId={record.apprentice.id} />
    </div>
  );
}

/** The guild office issues a course's certificate; when something is missing, the server's list is shown. */
function IssueCertificate({ apprenticeId, course }: { apprenticeId: number; course: RecordCourse }) {
  const [done, setDone] = useState<string | null>(null);
  const issue = useIssueCertificate();
  const missing = issue.error instanceof ApiError && issue.error.code === 'NOT_COMPLETE' ? issue.error.fields : null;
  return (
    <div className="space-y-2">
      <Button
        variant="secondary"
        busy={issue.isPending}
        onClick={() =>
          issue.mutate(
            { apprenticeId, courseId: course.course.id },
            { onSuccess: (c) => setDone(`Certificate issued: code ${c.code}.`) },
          )
        }
      >
        Issue certificate for {course.course.title}
      </Button>
      {done && (
        <p role="status" className="text-sm">
          {done}
        </p>
      )}
      {missing ? (
        <div role="alert" className="rounded-md border border-rework/50 bg-rework/5 p-3 text-sm">
          <p className="font-semibold text-rework">Not finished yet:</p>
          <ul className="ml-5 list-disc">
            {Object.values(missing)
              .flat()
              .map((m) => (
                <li key={m}>{m}</li>
              ))}
          </ul>
        </div>
      ) : (
        issue.error && <ErrorNotice error={issue.error} title="No certificate issued" />
      )}
    </div>
  );
}
