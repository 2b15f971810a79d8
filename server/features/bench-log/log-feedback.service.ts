import type { LogCommentInput, LogEntryDTO, LogGradeInput } from '@shared/schemas/log-entry';
import type { UserDTO } from '@shared/schemas/user';
import { AppError } from '../../lib/app-error';
import { entryDTO, readableEntry } from './log-entries.service';
import { LogComment, LogGrade, type LogEntry } from './log-entry.model';

/** Mentors who may read the entry give feedback; a reader in another role is told no, anyone else that it is not there. */
async function entryForFeedback(viewer: UserDTO, id: number): Promise<LogEntry> {
  const row = await readableEntry(viewer, id);
  if (!row) throw AppError.notFound('That log entry');
  if (viewer.role !== 'mentor')
    throw AppError.forbidden('Only a mentor of the apprentice’s class gives feedback on an entry.');
  return row;
}

export async function addComment(viewer: UserDTO, id: number, input: LogCommentInput): Promise<LogEntryDTO> {
  const entry = await entryForFeedback(viewer, id);
  await LogComment.create({ entryId: entry.id, authorId: viewer.id, body: input.body });
  return entryDTO(entry);
}

/** A grade belongs to the version the mentor read; a later edit leaves it in place, marked as given to that version. */
export async function addGrade(viewer: UserDTO, id: number, input: LogGradeInput): Promise<LogEntryDTO> {
  const entry = await entryForFeedback(viewer, id);
  await LogGrade.create({ entryId: entry.id, mentorId: viewer.id, ...input, entryVersion: entry.version });
  return entryDTO(entry);
}
