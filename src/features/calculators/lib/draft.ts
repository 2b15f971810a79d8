import type { z } from 'zod';

/**
 * The state of a calculator form: one string per field, lengths in mm, temperatures in °C and masses in g (whatever
 * units the user sees). Strings, because that is what the page address holds and what a half-typed field is.
 */
export type Draft = Record<string, string>;

/** A number from a draft field: blank is "not given" (undefined), anything unreadable is NaN, so the schema says so. */
export function num(text: string | undefined): number | undefined {
  if (text === undefined || text.trim() === '') return undefined;
  return Number(text.trim().replace(',', '.'));
}

/** A list of numbers written "80, 72" (or as JSON "[80,72]"); an unreadable item becomes NaN and is reported. */
export function list(text: string | undefined): number[] | undefined {
  if (text === undefined || text.trim() === '') return undefined;
  return text
    .replace(/^\s*\[|\]\s*$/g, '')
    .split(/[\s,;]+/)
    .filter(Boolean)
    .map((item) => Number(item));
}

/** Saved inputs as a draft: plain values as text, lists of numbers as "80, 72", anything else as JSON. */
export function inputToDraft(input: Record<string, unknown>): Draft {
  const draft: Draft = {};
  for (const [key, value] of Object.entries(input)) {
    if (value === undefined || value === null) continue;
    if (typeof value === 'number' || typeof value === 'string' || typeof value === 'boolean')
      draft[key] = String(value);
    else if (Array.isArray(value) && value.every((v) => typeof v === 'number')) draft[key] = value.join(', ');
    else draft[key] = JSON.stringify(value);
  }
  return draft;
}

export function draftToSearch(draft: Draft): string {
  return new URLSearchParams(Object.entries(draft)).toString();
}

export interface FieldIssue {
  code: string;
  message: string;
  minimum?: number;
  maximum?: number;
  inclusive?: boolean;
  expected?: string;
}

/** Issues keyed by the joined path ("readings.2.massG") and by the top-level field, the most telling one kept. */
export type FieldIssues = Record<string, FieldIssue>;

// A missing or unreadable number says more than a range, and the tightest bound says more than a looser one.
function better(a: FieldIssue, b: FieldIssue): FieldIssue {
  if (a.code === 'invalid_type') return a;
  if (b.code === 'invalid_type') return b;
  if (a.code === 'too_small' && b.code === 'too_small') return (b.minimum ?? 0) > (a.minimum ?? 0) ? b : a;
  if (a.code === 'too_big' && b.code === 'too_big') return (b.maximum ?? 0) < (a.maximum ?? 0) ? b : a;
  return a;
}

export function collectIssues(error: z.ZodError): FieldIssues {
  const issues: FieldIssues = {};
  for (const raw of error.issues) {
    const issue = raw as unknown as FieldIssue & { path: PropertyKey[] };
    const picked: FieldIssue = {
      code: issue.code,
      message: issue.message,
      minimum: typeof issue.minimum === 'number' ? issue.minimum : undefined,
      maximum: typeof issue.maximum === 'number' ? issue.maximum : undefined,
      inclusive: issue.inclusive,
      expected: issue.expected,
    };
    const keys = new Set([issue.path.map(String).join('.') || '_', String(issue.path[0] ?? '_')]);
    for (const key of keys) issues[key] = issues[key] ? better(issues[key], picked) : picked;
  }
  return issues;
}
