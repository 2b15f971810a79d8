import { Router, type Request } from 'express';
import * as z from 'zod/mini';
import {
  LogCommentInput,
  LogEntryCreateInput,
  LogEntryFilters,
  LogEntryListQuery,
  LogEntryPatch,
  LogGradeInput,
  LogSummaryQuery,
  localToday,
} from '@shared/schemas/log-entry';
import type { AppDeps } from '../../app';
import { AppError } from '../../lib/app-error';
import { idParam, parseBody, parseQuery } from '../../lib/validate';
import { currentUser, requireAuth, requireRole } from '../auth/guards';
import { idempotent } from '../idempotency/idempotent';
import { notify } from '../notifications/notifications.service';
import { csvFileName, entriesCsv } from './log-export';
import { allEntries, createEntry, deleteEntry, getEntry, listEntries, updateEntry } from './log-entries.service';
import { addComment, addGrade } from './log-feedback.service';
import { entriesToRead, logApprentices, logSummary } from './log-summary.service';

/**
 * Like parseBody, but a problem inside a list names its row as well ("measurements.1.unit") next to the list itself,
 * so the form can mark the exact cell while a plain client still finds `measurements` in the fields.
 */
function parseEntryBody<S extends z.core.$ZodType>(schema: S, req: Request): z.output<S> {
  const parsed = z.safeParse(schema, req.body ?? {});
  if (parsed.success) return parsed.data;
  const fields: Record<string, string[]> = {};
  const add = (key: string, message: string) => (fields[key] ??= []).push(message);
  for (const issue of parsed.error.issues) {
    const [top, row] = issue.path;
    const key = top === undefined ? '_' : String(top);
    if (issue.path.length > 1 && typeof row === 'number') {
      add(key, `Row ${row + 1}: ${issue.message}`);
      add(issue.path.join('.'), issue.message);
    } else add(key, issue.message);
  }
  throw AppError.badRequest('Some fields need attention.', fields);
}

const entryLink = (id: number) => `/bench-log/${id}`;

export function logEntriesRouter({ sequelize, config }: AppDeps) {
  const router = Router();
  router.use(requireAuth);
  const apprentice = requireRole('apprentice');

  router.post('/', apprentice, idempotent, async (req, res) => {
    const input = parseEntryBody(LogEntryCreateInput, req);
    res.status(201).json(await createEntry(sequelize, currentUser(req), input));
  });

  router.get('/', async (req, res) => {
    res.json(await listEntries(currentUser(req), parseQuery(LogEntryListQuery, req)));
  });

  // Fixed paths come before /:id, which would otherwise take "export.csv" for an id.
  router.get('/export.csv', async (req, res) => {
    const filters = parseQuery(LogEntryFilters, req);
    const { apprenticeName, entries } = await allEntries(currentUser(req), filters);
    res.attachment(csvFileName(apprenticeName, localToday()));
    res.type('text/csv; charset=utf-8').send(entriesCsv(entries));
  });

  router.get('/summary', async (req, res) => {
    res.json(await logSummary(sequelize, currentUser(req), parseQuery(LogSummaryQuery, req)));
  });

  router.get('/to-read', requireRole('mentor', 'admin'), async (req, res) => {
    res.json(await entriesToRead(sequelize, currentUser(req)));
  });

  router.get('/apprentices', requireRole('mentor', 'admin'), async (req, res) => {
    res.json(await logApprentices(sequelize, currentUser(req)));
  });

  router.get('/:id', async (req, res) => {
    res.json(await getEntry(currentUser(req), idParam(req)));
  });

  router.patch('/:id', async (req, res) => {
    const patch = parseEntryBody(LogEntryPatch, req);
    res.json(await updateEntry(sequelize, currentUser(req), idParam(req), patch));
  });

  router.delete('/:id', async (req, res) => {
    await deleteEntry(sequelize, currentUser(req), idParam(req));
    res.status(204).end();
  });

  /** Feedback and the apprentice's notice (with its e-mail in the outbox) are stored in one transaction. */
  function withNotice<T extends { id: number; title: string; date: string; apprentice: { id: number } }>(
    give: () => Promise<T>,
    tell: (entry: T) => { title: string; body: string },
  ): Promise<T> {
    return sequelize.transaction(async () => {
      const entry = await give();
      const notice = { kind: 'log-feedback', ...tell(entry), link: entryLink(entry.id) };
      await notify(entry.apprentice.id, notice, { appUrl: config.appUrl });
      return entry;
    });
  }

  router.post('/:id/comments', async (req, res) => {
    const mentor = currentUser(req);
    const input = parseBody(LogCommentInput, req);
    const entry = await withNotice(
      () => addComment(mentor, idParam(req), input),
      (e) => ({
        title: `${mentor.name} commented on “${e.title}”`,
        body: `${mentor.name} wrote on your bench-log entry “${e.title}” (${e.date}).`,
      }),
    );
    res.status(201).json(entry);
  });

  router.post('/:id/grades', async (req, res) => {
    const mentor = currentUser(req);
    const input = parseBody(LogGradeInput, req);
    const entry = await withNotice(
      () => addGrade(mentor, idParam(req), input),
      (e) => ({
        title: `${mentor.name} graded “${e.title}”`,
        body: `${mentor.name} graded the record of your bench-log entry “${e.title}” (${e.date}).`,
      }),
    );
    res.status(201).json(entry);
  });

  return router;
}
