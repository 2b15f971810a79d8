import type { Request } from 'express';
import * as z from 'zod/mini';

/** Parse a part of the request with a shared schema; a ZodError reaches the error handler as a 400 with fields. */
export const parseBody = <S extends z.core.$ZodType>(schema: S, req: Request): z.output<S> =>
  z.parse(schema, req.body ?? {});
export const parseQuery = <S extends z.core.$ZodType>(schema: S, req: Request): z.output<S> =>
  z.parse(schema, req.query);

/** Route ids are positive integers; anything else is treated as not found, never as a crash. */
export function idParam(req: Request, name = 'id'): number {
  const raw = req.params[name];
  const id = Number(raw);
  return Number.isSafeInteger(id) && id > 0 && String(id) === raw ? id : -1;
}
