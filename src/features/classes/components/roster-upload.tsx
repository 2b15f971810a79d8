import { Check, CircleAlert } from 'lucide-react';
import { useId, useRef, useState } from 'react';
import type { InviteResult, RosterPreviewReply } from '@shared/schemas/invitation';
import { Button } from '@/components/ui/button';
import { ErrorNotice } from '@/components/ui/states';
import { useImportRoster, usePreviewRoster } from '../api/invitations';
import { plural } from './format';
import { InviteResults } from './invite-results';

/**
 * Upload, look, then confirm: the file is only read for the preview; the rows without a problem are invited when the
 * admin confirms, and the server checks them again at that moment.
 */
export function RosterUpload({ classId }: { classId: number }) {
  const inputId = useId();
  const fileRef = useRef<HTMLInputElement>(null);
  const [preview, setPreview] = useState<RosterPreviewReply | null>(null);
  const [results, setResults] = useState<InviteResult[] | null>(null);
  const read = usePreviewRoster(classId);
  const importRows = useImportRoster(classId);

  function choose(file: File | undefined) {
    setPreview(null);
    setResults(null);
    importRows.reset();
    if (file) read.mutate(file, { onSuccess: setPreview });
  }

  function confirm() {
    if (!preview) return;
    const rows = preview.rows.filter((r) => r.ok).map(({ name, email }) => ({ name, email }));
    importRows.mutate(rows, {
      onSuccess: (reply) => {
        setResults(reply.results);
        setPreview(null);
        if (fileRef.current) fileRef.current.value = '';
      },
    });
  }

  return (
    <div className="space-y-4">
      <div className="space-y-1">
        <label htmlFor={inputId} className="block text-sm font-semibold">
          Roster file (CSV)
        </label>
        <input
          id={inputId}
          ref={fileRef}
          type="file"
          accept=".csv,text/csv,text/plain"
          aria-describedby={`${inputId}-hint`}
          className="block min-h-11 w-full text-sm file:mr-3 file:min-h-11 file:rounded-md file:border file:border-rule file:bg-card file:px-4 file:font-semibold"
          onChange={(e) => choose(e.target.files?.[0])}
        />
        <p id={`${inputId}-hint`} className="text-sm text-muted">
          A header row naming the columns <code>name</code> and <code>e-mail</code>, then one person per row; commas or
          semicolons between the columns. A spreadsheet saved as CSV (UTF-8) works.
        </p>
      </div>
      {read.isPending && (
        <p role="status" className="text-muted">
          Reading the file…
        </p>
      )}
      {read.error && <ErrorNotice error={read.error} title="The file could not be read" />}
      {preview && <PreviewTable preview={preview} />}
      {preview && (
        <div className="flex flex-wrap items-center gap-3">
          <Button onClick={confirm} busy={importRows.isPending} disabled={preview.okCount === 0}>
            Import {plural(preview.okCount, 'person', 'people')}
          </Button>
          <Button variant="quiet" onClick={() => choose(undefined)}>
            Discard
          </Button>
          {preview.problemCount > 0 && (
            <span className="text-sm text-muted">
              {plural(preview.problemCount, 'row')} with a problem will be left out.
            </span>
          )}
        </div>
      )}
      {importRows.error && <ErrorNotice error={importRows.error} title="Nothing was imported" />}
      {results && <InviteResults results={results} />}
    </div>
  );
}

function PreviewTable({ preview }: { preview: RosterPreviewReply }) {
  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-card">
      <table className="w-full text-left text-sm">
        <caption className="p-3 text-left font-semibold">
          Preview: {plural(preview.okCount, 'row')} ready, {plural(preview.problemCount, 'row')} with a problem
        </caption>
        <thead className="border-y border-rule text-muted">
          <tr>
            <th scope="col" className="p-3">
              Line
            </th>
            <th scope="col" className="p-3">
              Name
            </th>
            <th scope="col" className="p-3">
              E-mail
            </th>
            <th scope="col" className="p-3">
              Result
            </th>
          </tr>
        </thead>
        <tbody>
          {preview.rows.map((r) => (
            <tr
              key={r.line}
              data-problem={r.ok ? undefined : r.outcome}
              className={`border-b border-rule/60 last:border-0 ${r.ok ? '' : 'bg-error/5'}`}
            >
              <td className="num p-3">{r.line}</td>
              <td className="p-3">{r.name}</td>
              <td className="p-3">{r.email}</td>
              <td className={`p-3 ${r.ok ? '' : 'font-semibold text-error'}`}>
                <span className="inline-flex items-start gap-2">
                  {r.ok ? (
                    <Check className="mt-0.5 size-4 text-steel" aria-hidden />
                  ) : (
                    <CircleAlert className="mt-0.5 size-4" aria-hidden />
                  )}
                  <span>
                    {!r.ok && <span className="sr-only">Problem: </span>}
                    {r.message}
                  </span>
                </span>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
