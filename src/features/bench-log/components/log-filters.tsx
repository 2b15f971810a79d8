import { Download } from 'lucide-react';
import type { LogEntryFilters } from '@shared/schemas/log-entry';
import { buttonClass } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { filterQuery } from '../lib/query-string';
import { LessonSelect } from './lesson-select';

/** Date range and lesson, shared by the list and the CSV export, so the file holds what the page shows. */
export function LogFilters({
  filters,
  onChange,
}: {
  filters: LogEntryFilters;
  onChange: (f: LogEntryFilters) => void;
}) {
  const set = (patch: Partial<LogEntryFilters>) => onChange({ ...filters, ...patch });
  return (
    <div className="flex flex-wrap items-end gap-3">
      <div className="w-44">
        <TextField
          label="From"
          type="date"
          value={filters.from ?? ''}
          onChange={(e) => set({ from: e.target.value || undefined })}
        />
      </div>
      <div className="w-44">
        <TextField
          label="To"
          type="date"
          value={filters.to ?? ''}
          onChange={(e) => set({ to: e.target.value || undefined })}
        />
      </div>
      <div className="min-w-64 flex-1">
        <LessonSelect
          emptyLabel="All lessons"
          value={filters.lessonId ? String(filters.lessonId) : ''}
          onChange={(e) => set({ lessonId: e.target.value ? Number(e.target.value) : undefined })}
        />
      </div>
      <a
        href={`/api/log-entries/export.csv${filterQuery(filters)}`}
        download
        className={buttonClass('secondary', 'no-underline')}
      >
        <Download className="size-4" aria-hidden />
        Download these entries (CSV)
      </a>
    </div>
  );
}
