import type { RequestHandler } from 'express';
import { AppError } from './app-error';

/**
 * A null character, or half of a UTF-16 pair with its other half missing, is never meaningful text: SQLite cuts
 * strings at a null, and a lone half cannot be written as UTF-8. Both are refused at the door with 400, in the path,
 * the query and the body alike, so no feature has to think about them.
 */
const BAD_CHARACTER = /\0|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;
const NOT_ALLOWED = 'This text holds a character that is not allowed (a null character or a broken one).';

export const hasBadCharacter = (text: string) => BAD_CHARACTER.test(text);

/**
 * The top-level field under which a bad string (a value or a key) sits in parsed JSON or a query, or null. Walked with
 * a stack rather than recursion, so that deeply nested input cannot overflow the call stack.
 */
export function fieldWithBadText(value: unknown): string | null {
  if (typeof value === 'string') return hasBadCharacter(value) ? '_' : null;
  if (value === null || typeof value !== 'object') return null;
  const stack: [unknown, string][] = [];
  for (const [key, v] of Object.entries(value)) {
    if (hasBadCharacter(key)) return '_';
    stack.push([v, key]);
  }
  while (stack.length) {
    const [item, field] = stack.pop()!;
    if (typeof item === 'string') {
      if (hasBadCharacter(item)) return field;
    } else if (item !== null && typeof item === 'object') {
      for (const [key, v] of Object.entries(item)) {
        if (hasBadCharacter(key)) return field;
        stack.push([v, field]);
      }
    }
  }
  return null;
}

const refuse = (field: string | null) =>
  AppError.badRequest(field === '_' ? NOT_ALLOWED : 'Some fields need attention.', { [field ?? '_']: [NOT_ALLOWED] });

/** The path and the query of every request, pages included. */
export const rejectBadAddress: RequestHandler = (req, _res, next) => {
  let path: string;
  try {
    path = decodeURIComponent(req.path);
  } catch {
    return next(AppError.badRequest('The address of this request is not valid.'));
  }
  if (hasBadCharacter(path)) return next(AppError.badRequest('The address holds a character that is not allowed.'));
  const field = fieldWithBadText(req.query);
  next(field ? refuse(field) : undefined);
};

/** The parsed body of an API request. */
export const rejectBadBody: RequestHandler = (req, _res, next) => {
  const field = fieldWithBadText(req.body);
  next(field ? refuse(field) : undefined);
};
