import { useParams } from 'react-router-dom';
import { ErrorNotice, Loading } from '@/components/ui/states';
import { ApiError } from '@/lib/api-client';
import { useCertificateCheck } from '@/features/record/api/get-record';

const longDay = (iso: string) =>
  new Date(iso).toLocaleDateString(undefined, { day: 'numeric', month: 'long', year: 'numeric' });

/** The public check of a certificate: shown to anyone with the code, and nothing beyond what the certificate says. */
export function Component() {
  const code = useParams().code ?? '';
  const { data, isPending, error } = useCertificateCheck(code);
  const unknown = error instanceof ApiError && error.status === 404;
  return (
    <main className="mx-auto max-w-xl px-4 py-16">
      <h1 className="font-serif text-3xl font-semibold">Certificate check</h1>
      <p className="mt-1 text-muted">
        Code <span className="num">{code}</span>
      </p>
      <div className="mt-6 rounded-lg border border-rule bg-card p-6">
        {isPending && <Loading label="Checking…" />}
        {unknown && (
          <p className="text-lg">No certificate has this code. Check it letter by letter against the certificate.</p>
        )}
        {error && !unknown && <ErrorNotice error={error} title="The check could not be made" />}
        {data && (
          <p className={`mb-3 text-xl font-semibold ${data.valid ? 'text-ink' : 'text-error'}`}>
            {data.valid ? 'Valid certificate' : 'This certificate has been revoked'}
          </p>
        )}
        {data && (
          <dl className="space-y-3">
            <div>
              <dt className="text-sm text-muted">Issued by</dt>
              <dd>{data.guild}</dd>
            </div>
            <div>
              <dt className="text-sm text-muted">Apprentice</dt>
              <dd>{data.apprentice.name}</dd>
            </div>
            <div>
              <dt className="text-sm text-muted">Course</dt>
              <dd>{data.course.title}</dd>
            </div>
            <div>
              <dt className="text-sm text-muted">Issued on</dt>
              <dd>{longDay(data.issuedAt)}</dd>
            </div>
            {data.revokedAt && (
              <div>
                <dt className="text-sm text-muted">Revoked on</dt>
                <dd>{longDay(data.revokedAt)}</dd>
              </div>
            )}
          </dl>
        )}
      </div>
    </main>
  );
}
