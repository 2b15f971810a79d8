import fc from 'fast-check';
import type { Test } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROUTE_MATRIX, type RouteCase } from './support/route-matrix';
import { appRoutes, makeSecurityCast, type Actor, type Agent, type SecurityCast } from './support/security-cast';
import { createTestApp, type TestApp } from './support/test-app';

/**
 * Every write route of the app, fed bodies and query values it never expects: wrong types, huge strings, NaN and
 * Infinity, nested objects, null characters, broken characters, text that is not JSON. Whatever comes in, the answer
 * is never a 5xx, and any refusal has the one error shape. Each route is called as someone allowed to reach it, so
 * the input gets past the guards to the validation and the services.
 */
const RUNS_PER_ROUTE = 12;

let t: TestApp;
let cast: SecurityCast;
beforeAll(async () => {
  t = await createTestApp();
  cast = await makeSecurityCast(t);
}, 60_000);
afterAll(() => t.close());

const hostileValue: fc.Arbitrary<unknown> = fc.oneof(
  fc.string({ maxLength: 40 }),
  fc.string({ unit: 'binary', maxLength: 20 }),
  fc.constantFrom(
    '',
    ' ',
    '\u0000',
    'plate\u0000',
    'x\uD800',
    '\uDC00y',
    'a'.repeat(200_000),
    '2026-02-30',
    '1899-12-31',
    '9999-12-31',
    'NaN',
    'Infinity',
    '-1',
    '1e309',
    '<script>alert(1)</script>',
    "'; DROP TABLE users; --",
    '=HYPERLINK("http://example.test")',
    '../../etc/passwd',
  ),
  fc.integer(),
  fc.double(),
  fc.constantFrom(Number.MAX_VALUE, -Number.MAX_VALUE, Number.MAX_SAFE_INTEGER + 2, -0, 0, -1, 1.5),
  fc.boolean(),
  fc.constant(null),
  fc.array(fc.anything({ maxDepth: 2 }), { maxLength: 5 }),
  fc.dictionary(fc.string({ maxLength: 8 }), fc.anything({ maxDepth: 2 }), { maxKeys: 4 }),
);

/** Text sent as application/json that is not JSON, or not the JSON a route could take. */
const notJson = fc.oneof(
  fc.string({ maxLength: 60 }),
  fc.constantFrom(
    '{"minutes": NaN}',
    '{"value": Infinity}',
    '{"a": -Infinity}',
    '{"a":1e999}',
    '{',
    '[',
    '{"a":"\\u0000"}',
    '{"a":"\\ud800"}',
    `${'['.repeat(5000)}${']'.repeat(5000)}`,
    '{"__proto__":{"role":"admin"}}',
    '{"constructor":{"prototype":{"role":"admin"}}}',
    'null',
    '12',
    '"text"',
  ),
);

type Payload = { kind: 'json'; body: unknown } | { kind: 'raw'; text: string };

/** The route's own field names with hostile values, any JSON at all, or text that is not JSON. */
function payloadFor(fields: string[]): fc.Arbitrary<Payload> {
  const own =
    fields.length > 0
      ? fc.record(Object.fromEntries(fields.map((f) => [f, hostileValue])), { requiredKeys: [] })
      : fc.constant({});
  return fc.oneof(
    own.map((body) => ({ kind: 'json' as const, body })),
    fc.anything({ maxDepth: 3 }).map((body) => ({ kind: 'json' as const, body })),
    notJson.map((text) => ({ kind: 'raw' as const, text })),
  );
}

const QUERY_KEYS = ['apprentice', 'page', 'q', 'size', 'from', 'to', 'classId', 'limit', 'sort', 'dir', 'id'];
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g;
/** A URL can only carry UTF-8, so a broken character goes as the replacement character; raw escapes come below. */
const encode = (v: unknown) =>
  encodeURIComponent(
    (typeof v === 'object' && v !== null ? JSON.stringify(v) : String(v)).replace(LONE_SURROGATE, '\uFFFD'),
  );
/** Escapes that decode to a null, to a UTF-8-encoded surrogate, or to nothing valid at all. */
const rawEscape = fc.constantFrom('%00', 'a%00b', '%ED%A0%80', '%FF', '%', '%E0%A4%A', '%C0%AF');
const queryString = fc
  .array(
    fc.tuple(
      fc.oneof(fc.constantFrom(...QUERY_KEYS), fc.string({ maxLength: 6 })).map(encode),
      // Node itself answers a request line over 16 KB (431, no body), before the app sees it; keep query values shorter.
      fc.oneof(
        hostileValue.map(encode).filter((v) => v.length < 4000),
        rawEscape,
      ),
    ),
    { maxLength: 3 },
  )
  .map((pairs) => pairs.map(([k, v]) => `${k}=${v}`).join('&'));

/** Someone the route lets through: the first actor it answers with success, or at least not with 401 or 403. */
function actorFor(route: RouteCase): Actor {
  const preference: Actor[] = ['owner', 'mentor', 'admin', 'classmate', 'anon'];
  return (
    preference.find((a) => route.expect[a] < 300) ??
    preference.find((a) => ![401, 403].includes(route.expect[a])) ??
    'owner'
  );
}

function send(agent: Agent, method: string, url: string, payload: Payload): Test {
  const req = agent[method.toLowerCase() as 'post' | 'put' | 'patch' | 'delete'](url);
  if (payload.kind === 'raw') return req.set('Content-Type', 'application/json').send(payload.text);
  // supertest sends a bare string as form text, so anything that is not an object or array goes as JSON text.
  return typeof payload.body === 'object' && payload.body !== null
    ? req.send(payload.body as object)
    : req.set('Content-Type', 'application/json').send(JSON.stringify(payload.body) ?? '');
}

const ErrorShape = (body: unknown) => {
  const error = (body as { error?: Record<string, unknown> })?.error;
  expect(Object.keys(body as object)).toEqual(['error']);
  expect(error).toEqual({
    code: expect.any(String),
    message: expect.any(String),
    ...(error && 'fields' in error ? { fields: expect.any(Object) } : {}),
  });
  for (const messages of Object.values((error?.fields as Record<string, unknown>) ?? {})) {
    expect(messages).toEqual(expect.arrayContaining([expect.any(String)]));
  }
};

describe('fuzzing every route', { timeout: 120_000 }, () => {
  const writes = Object.keys(ROUTE_MATRIX).filter((k) => !k.startsWith('GET '));

  it('when the app is built, then every write route it answers is fuzzed here', () => {
    const fromApp = appRoutes(t.app).filter((k) => !k.startsWith('GET '));
    expect(fromApp.sort()).toEqual([...writes].sort());
  });

  // Read routes take no body, but their query values are fuzzed all the same.
  for (const key of Object.keys(ROUTE_MATRIX).filter((k) => k.startsWith('GET '))) {
    it(`${key}: any query answers without a 5xx, refusals in the error shape`, async () => {
      const route = ROUTE_MATRIX[key];
      await fc.assert(
        fc.asyncProperty(queryString, async (qs) => {
          const base = await route.url(cast);
          const res = await cast.agents[actorFor(route)].get(
            qs ? `${base}${base.includes('?') ? '&' : '?'}${qs}` : base,
          );
          expect(res.status, `${res.status} ${JSON.stringify(res.body)}`).toBeLessThan(500);
          if (res.status >= 400) ErrorShape(res.body);
        }),
        // Besides the random runs: every known query name carrying a null, one at a time.
        { numRuns: RUNS_PER_ROUTE / 2, examples: QUERY_KEYS.map((k) => [`${k}=%00`] as [string]) },
      );
    });
  }

  for (const key of writes) {
    it(`${key}: never a 5xx, always the error shape`, async () => {
      const route = ROUTE_MATRIX[key];
      const [method] = key.split(' ');
      const fields = Object.keys(route.body?.(cast) ?? {});
      // Routes that sign someone in or out would change the shared agent, so they get a fresh one each time.
      const agentFor = () => (route.last ? t.anon() : cast.agents[actorFor(route)]);
      await fc.assert(
        fc.asyncProperty(payloadFor(fields), queryString, async (payload, qs) => {
          const base = await route.url(cast);
          const url = qs ? `${base}${base.includes('?') ? '&' : '?'}${qs}` : base;
          const res = await send(agentFor(), method, url, payload);
          expect(res.status, `${res.status} ${JSON.stringify(res.body)}`).toBeLessThan(500);
          if (res.status >= 400) ErrorShape(res.body);
        }),
        {
          numRuns: RUNS_PER_ROUTE,
          // Besides the random runs: each of the route's own fields holding a null, then a broken character.
          examples: fields.flatMap((f) =>
            ['\u0000', '\uD800'].map(
              (bad) => [{ kind: 'json', body: { ...route.body?.(cast), [f]: bad } }, ''] as [Payload, string],
            ),
          ),
        },
      );
    });
  }
});
