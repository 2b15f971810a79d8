import { Check, CircleAlert } from 'lucide-react';
import type { InviteResult } from '@shared/schemas/invitation';

/** Per address: what was done, or why nothing was. */
export function InviteResults({ results }: { results: InviteResult[] }) {
  const done = results.filter((r) => r.outcome === 'invited' || r.outcome === 'enrolled').length;
  return (
    <div role="status" className="space-y-2">
      <p className="font-semibold">
        <span className="num">{done}</span> of <span className="num">{results.length}</span> addresses done.
      </p>
      <ul className="space-y-1 text-sm">
        {results.map((r, i) => {
          const ok = r.outcome === 'invited' || r.outcome === 'enrolled';
          return (
            <li key={`${r.email}-${i}`} className={`flex items-start gap-2 ${ok ? '' : 'text-error'}`}>
              {ok ? (
                <Check className="mt-0.5 size-4 shrink-0 text-steel" aria-hidden />
              ) : (
                <CircleAlert className="mt-0.5 size-4 shrink-0" aria-hidden />
              )}
              <span>
                <span className="font-semibold">{r.email || '(empty)'}</span>: {r.message}
                {r.mail === 'queued' && (
                  <span className="text-muted">
                    {' '}
                    The e-mail is queued; the pending invitations show when it has gone out.
                  </span>
                )}
              </span>
            </li>
          );
        })}
      </ul>
    </div>
  );
}
