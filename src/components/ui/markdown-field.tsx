import { useId, useState, type TextareaHTMLAttributes } from 'react';
import { UserMarkdown } from './user-markdown';

type Props = {
  label: string;
  value: string;
  onChange: (value: string) => void;
  hint?: string;
  error?: string;
} & Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, 'value' | 'onChange'>;

/** A Markdown text box with a Write / Preview switch, so the writer sees what the reader will. */
export function MarkdownField({ label, value, onChange, hint, error, rows = 6, ...rest }: Props) {
  const id = useId();
  const [tab, setTab] = useState<'write' | 'preview'>('write');
  const tabClass = (active: boolean) =>
    `min-h-11 rounded-t-md border border-b-0 px-4 text-sm font-semibold ${active ? 'border-rule bg-white text-ink' : 'border-transparent text-muted hover:text-ink'}`;
  return (
    <div className="space-y-1">
      <div className="flex flex-wrap items-end justify-between gap-2">
        <label htmlFor={`${id}-text`} className="block text-sm font-semibold text-ink">
          {label}
        </label>
        <div role="tablist" aria-label={`${label}: write or preview`} className="flex gap-1">
          <button
            type="button"
            role="tab"
            id={`${id}-tab-write`}
            aria-selected={tab === 'write'}
            aria-controls={`${id}-write`}
            className={tabClass(tab === 'write')}
            onClick={() => setTab('write')}
          >
            Write
          </button>
          <button
            type="button"
            role="tab"
            id={`${id}-tab-preview`}
            aria-selected={tab === 'preview'}
            aria-controls={`${id}-preview`}
            className={tabClass(tab === 'preview')}
            onClick={() => setTab('preview')}
          >
            Preview
          </button>
        </div>
      </div>
      <div id={`${id}-write`} role="tabpanel" aria-labelledby={`${id}-tab-write`} hidden={tab !== 'write'}>
        <textarea
          id={`${id}-text`}
          rows={rows}
          value={value}
          onChange={(e) => onChange(e.target.value)}
          aria-describedby={hint ? `${id}-hint` : undefined}
          aria-invalid={Boolean(error)}
          className="block min-h-11 w-full rounded-md border border-rule bg-white px-3 py-2 text-ink shadow-inner focus:border-steel aria-[invalid=true]:border-error"
          {...rest}
        />
      </div>
      <div
        id={`${id}-preview`}
        role="tabpanel"
        aria-labelledby={`${id}-tab-preview`}
        hidden={tab !== 'preview'}
        className="min-h-24 rounded-md border border-rule bg-white p-3"
      >
        <UserMarkdown text={value} empty="Nothing to preview yet." />
      </div>
      {hint && (
        <p id={`${id}-hint`} className="text-sm text-muted">
          {hint}
        </p>
      )}
      {error && (
        <p className="text-sm font-medium text-error" role="alert">
          {error}
        </p>
      )}
    </div>
  );
}
