import type { Test } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROUTE_MATRIX, type RouteCase } from './support/route-matrix';
import { ACTORS, appRoutes, makeSecurityCast, type Actor, type SecurityCast } from './support/security-cast';
import { createTestApp, type TestApp } from './support/test-app';

/**
 * Every route of the app, called as each of eight actors, against the statuses in support/route-matrix.ts. The list
 * of routes is read from the app itself, so a route added without a line in the matrix fails here.
 */
let t: TestApp;
let cast: SecurityCast;
beforeAll(async () => {
  t = await createTestApp();
  cast = await makeSecurityCast(t);
}, 60_000);
afterAll(() => t.close());

function call(actor: Actor, method: string, url: string, route: RouteCase): Test {
  const agent = cast.agents[actor];
  const verb = method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
  const req = agent[verb](url);
  if (route.attach) return route.attach(req, cast);
  return route.body ? req.send(route.body(cast)) : req;
}

/** Actors expected to succeed go last, so that a call that changes the record cannot mask another actor's answer. */
const callOrder = (route: RouteCase) =>
  [...ACTORS].sort((a, b) => Number(route.expect[a] < 300) - Number(route.expect[b] < 300));

describe('authorization matrix', () => {
  it('when the app is built, then every route it answers has a line in the matrix, and every line is a route', () => {
    const routes = appRoutes(t.app);
    expect(routes.length).toBeGreaterThan(50);
    expect(routes.filter((r) => !(r in ROUTE_MATRIX))).toEqual([]);
    expect(Object.keys(ROUTE_MATRIX).filter((r) => !routes.includes(r))).toEqual([]);
  });

  const keys = Object.keys(ROUTE_MATRIX);
  const ordered = [...keys.filter((k) => !ROUTE_MATRIX[k].last), ...keys.filter((k) => ROUTE_MATRIX[k].last)];
  for (const key of ordered) {
    it(`${key}: each actor gets the expected status`, async () => {
      const route = ROUTE_MATRIX[key];
      const [method] = key.split(' ');
      const got = {} as Record<Actor, number>;
      const bodies: Partial<Record<Actor, unknown>> = {};
      for (const actor of callOrder(route)) {
        const res = await call(actor, method, await route.url(cast), route);
        got[actor] = res.status;
        if (res.status >= 400) {
          bodies[actor] = res.body;
          expect(res.body, `${actor}: error shape`).toMatchObject({
            error: { code: expect.any(String), message: expect.any(String) },
          });
        }
      }
      expect({ statuses: got }, JSON.stringify(bodies)).toEqual({ statuses: route.expect });
    });
  }
});
