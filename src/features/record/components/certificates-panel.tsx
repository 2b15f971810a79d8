import { Link } from 'react-router-dom';
import type { CertificateDTO } from '@shared/schemas/record';
import { ErrorNotice } from '@/components/ui/states';
import { paths } from '@/config/paths';
import { useCertificates } from '../api/get-record';
import { useRevokeCertificate } from '../api/record-actions';
import { shortDay } from './evidence-list';
import { ReasonStep } from './reason-step';

/** The apprentice's certificates, each to download and check; the guild office may revoke one. */
export function CertificatesPanel({ apprenticeId, isOffice }: { apprenticeId: number; isOffice: boolean }) {
  const { data, error } = useCertificates(apprenticeId);
  return (
    <section aria-labelledby="certificates" className="space-y-2">
      <h2 id="certificates" className="font-serif text-2xl font-semibold">
        Certificates
      </h2>
      {error && <ErrorNotice error={error} title="The certificates could not be loaded" />}
      {data?.certificates.length === 0 && (
        <p className="text-muted">No certificate yet. One is issued when every skill of a course is signed off.</p>
      )}
      <ul className="space-y-2">
        {data?.certificates.map((c) => (
          <CertificateRow key={c.id} certificate={c} isOffice={isOffice} />
        ))}
      </ul>
    </section>
  );
}

function CertificateRow({ certificate: c, isOffice }: { certificate: CertificateDTO; isOffice: boolean }) {
  const revoke = useRevokeCertificate();
  return (
    <li className="flex flex-wrap items-center gap-3 rounded-lg border border-rule bg-card p-4">
      <div className="min-w-0 flex-1">
        <p className="font-semibold">{c.course.title}</p>
        <p className="text-sm text-muted">
          Issued {shortDay(c.issuedAt)} · code <span className="num">{c.code}</span>
          {c.revokedAt && <span className="text-error"> · revoked {shortDay(c.revokedAt)}</span>}
        </p>
      </div>
      <a href={`/api/certificates/${c.id}/pdf`} download className="font-semibold">
        Download PDF
      </a>
      <Link to={paths.verify(c.code)}>Public check</Link>
      {isOffice && !c.revokedAt && (
        <ReasonStep
          label="Revoke"
          ariaLabel={`Revoke the certificate for ${c.course.title}`}
          reasonLabel="Why is it revoked?"
          confirmLabel="Revoke certificate"
          busy={revoke.isPending}
          error={revoke.error}
          onConfirm={(reason) => revoke.mutate({ id: c.id, reason })}
        />
      )}
    </li>
  );
}
