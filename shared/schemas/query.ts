import * as z from 'zod/mini';

/** A whole number from the text of the address (`?page=2`), within [min, max]. */
export const QueryInt = (min: number, max: number) => z.coerce.number().check(z.int(), z.gte(min), z.lte(max));

/** An optional id from the address (`?apprentice=12`). */
export const QueryId = z.optional(z.coerce.number().check(z.int(), z.positive()));

/** A page number from the address, 1 when absent. */
export const QueryPage = (max: number) => z._default(QueryInt(1, max), 1);

/** A filter left empty in a form arrives as `?role=`: treated as not given. */
export const emptyAsAbsent = <S extends z.core.$ZodType>(schema: S) =>
  z.pipe(
    z.transform((v: unknown) => (v === '' ? undefined : v)),
    z.optional(schema),
  );
