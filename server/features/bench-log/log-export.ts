import { GRADE_ASPECTS, formatMinutes, type LogEntryDTO } from '@shared/schemas/log-entry';
import { SCORE_WORDS } from '@shared/grading/score';
import { toCsv } from '../../lib/csv';

const COLUMNS = [
  'Date',
  'Time spent',
  'Minutes',
  'Title',
  'Course',
  'Lesson',
  'Measurements',
  'Notes',
  'Photos',
  'Saved results',
  'Comments',
  'Latest grade',
];

/** "end shake 0.15 mm; side shake 0.03 mm": the measurements as a person would read them aloud. */
const measurementText = (e: LogEntryDTO) => e.measurements.map((m) => `${m.name} ${m.value} ${m.unit}`).join('; ');

function gradeText(e: LogEntryDTO): string {
  const g = e.grades.at(-1);
  if (!g) return '';
  const scores = GRADE_ASPECTS.map((a) => `${a} ${g[a]} ${SCORE_WORDS[g[a]]}`).join(', ');
  return `${scores} (${g.mentor.name}, version ${g.entryVersion} of ${e.version})`;
}

/** One row per entry; toCsv keeps an entry's text from acting as a formula in the spreadsheet that opens it. */
export function entriesCsv(entries: LogEntryDTO[]): string {
  const data = entries.map((e) => [
    e.date,
    formatMinutes(e.minutes),
    e.minutes,
    e.title,
    e.lesson?.course.title ?? '',
    e.lesson?.title ?? '',
    measurementText(e),
    e.notes,
    e.photos.length,
    e.calculations.map((c) => c.title).join('; '),
    e.comments.map((c) => `${c.author.name}: ${c.body}`).join(' | '),
    gradeText(e),
  ]);
  return toCsv(COLUMNS, data);
}

export function csvFileName(apprenticeName: string, today: string): string {
  const slug = apprenticeName
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '');
  return `bench-log-${slug || 'apprentice'}-${today}.csv`;
}
