import type { Test } from 'supertest';
import { localToday } from '@shared/schemas/log-entry';
import { ACTORS, type Actor, type SecurityCast } from './security-cast';
import { TEST_PASSWORD } from './test-app';

/**
 * The expected status of every API route for each actor. The matrix suite reads the app's own route table: a route
 * with no line here, or a line for a route that no longer exists, fails it. To add a route, add one line with the
 * eight statuses in ACTORS order (or one of the shorthands), a URL built from the cast, and a body if it takes one.
 */
export type Statuses = Record<Actor, number>;
export interface RouteCase {
  /** The concrete URL; may prepare state (a fresh target for a call that spends or changes it). */
  url: (c: SecurityCast) => string | Promise<string>;
  body?: (c: SecurityCast) => object;
  /** For a multipart request, in place of a JSON body. */
  attach?: (req: Test, c: SecurityCast) => Test;
  expect: Statuses;
  /** Calls that change who the agent is signed in as (sign-in, invitation, sign-out) run after all the others. */
  last?: true;
}

/** anon, owner, classmate, outsider, mentor, otherMentor, formerMentor, admin */
const s = (...statuses: number[]): Statuses => {
  if (statuses.length !== ACTORS.length) throw new Error(`give ${ACTORS.length} statuses`);
  return Object.fromEntries(ACTORS.map((a, i) => [a, statuses[i]])) as Statuses;
};
const everyone = (n: number) => s(n, n, n, n, n, n, n, n);
const signedIn = (n: number) => s(401, n, n, n, n, n, n, n);
const adminOnly = (n: number) => s(401, 403, 403, 403, 403, 403, 403, n);
const apprentices = (n: number) => s(401, n, n, n, 403, 403, 403, 403);
const reviewers = (n: number) => s(401, 403, 403, 403, n, n, n, n);
/** Reading the owner's work: the owner, the class's mentor and the guild office; everyone else is told 404. */
const ownersWork = (n: number) => s(401, n, 404, 404, n, 404, 404, n);
/** Changing the owner's record: readers who may not change it get 403, everyone else 404. */
const ownersChange = (n: number) => s(401, n, 404, 404, 403, 404, 404, 403);
const mentorsFeedback = (n: number) => s(401, 403, 404, 404, n, 404, 404, 403);

const jpeg = (req: Test, c: SecurityCast) =>
  req.attach('file', c.jpeg, { filename: 'plate.jpg', contentType: 'image/jpeg' });
const broach = {
  calculator: 'broach-taper',
  inputs: { taperPerMm: 0.02, refDiameterMm: 0.5, targetDiameterMm: 1.05, plateThicknessMm: 2, pivotDiameterMm: 1 },
};
const owner = (c: SecurityCast) => c.users.owner.id;

export const ROUTE_MATRIX: Record<string, RouteCase> = {
  'GET /api/health': { url: () => '/api/health', expect: everyone(200) },

  'POST /api/auth/login': {
    url: () => '/api/auth/login',
    body: (c) => ({ email: c.spare.email, password: TEST_PASSWORD }),
    expect: everyone(200),
    last: true,
  },
  'GET /api/auth/me': { url: () => '/api/auth/me', expect: signedIn(200) },
  'POST /api/auth/logout': { url: () => '/api/auth/logout', expect: everyone(204), last: true },
  'POST /api/auth/password-reset': {
    url: () => '/api/auth/password-reset',
    body: (c) => ({ email: c.fresh('forgot') }),
    expect: everyone(202),
  },
  'GET /api/auth/password-reset/:token': {
    url: async (c) => `/api/auth/password-reset/${await c.resetToken()}`,
    expect: everyone(204),
  },
  'POST /api/auth/password-reset/:token': {
    url: async (c) => `/api/auth/password-reset/${await c.resetToken()}`,
    body: () => ({ password: 'winding-square-2026' }),
    expect: everyone(204),
  },

  'GET /api/courses': { url: () => '/api/courses', expect: signedIn(200) },
  'GET /api/courses/:slug': { url: (c) => `/api/courses/${c.train.course.slug}`, expect: signedIn(200) },
  'GET /api/courses/:slug/lessons/:lessonSlug': {
    url: (c) => `/api/courses/${c.train.course.slug}/lessons/${c.lesson.slug}`,
    expect: signedIn(200),
  },
  'GET /api/lessons/next': { url: () => '/api/lessons/next', expect: apprentices(200) },
  'GET /api/lessons/:id': { url: (c) => `/api/lessons/${c.lesson.id}`, expect: signedIn(200) },
  'PUT /api/lessons/:id/done': { url: (c) => `/api/lessons/${c.lesson.id}/done`, expect: apprentices(200) },
  'DELETE /api/lessons/:id/done': { url: (c) => `/api/lessons/${c.lesson.id}/done`, expect: apprentices(200) },
  'GET /api/search': { url: () => '/api/search?q=broach', expect: signedIn(200) },
  'GET /api/content/:courseSlug/images/:file': {
    url: (c) => `/api/content/${c.train.course.slug}/images/hole-taper.svg`,
    expect: signedIn(200),
  },

  'POST /api/calculations': { url: () => '/api/calculations', body: () => broach, expect: apprentices(201) },
  'GET /api/calculations': { url: (c) => `/api/calculations?apprentice=${owner(c)}`, expect: ownersWork(200) },
  'GET /api/calculations/:id': { url: (c) => `/api/calculations/${c.calculationId}`, expect: ownersWork(200) },
  'DELETE /api/calculations/:id': {
    url: async (c) => `/api/calculations/${await c.spareCalculation()}`,
    expect: ownersChange(204),
  },

  'PATCH /api/account': { url: () => '/api/account', body: () => ({ unitSystem: 'metric' }), expect: signedIn(200) },
  'POST /api/account/password': {
    url: () => '/api/account/password',
    body: () => ({ currentPassword: 'not-the-current-one', newPassword: 'never-set-this-one' }),
    expect: signedIn(400),
  },
  'GET /api/users': { url: () => '/api/users', expect: adminOnly(200) },
  'PATCH /api/users/:id': {
    url: (c) => `/api/users/${c.spare.id}`,
    body: () => ({ active: true }),
    expect: adminOnly(200),
  },
  'GET /api/dev-mail': { url: () => '/api/dev-mail', expect: adminOnly(200) },

  'GET /api/classes/form-options': { url: () => '/api/classes/form-options', expect: adminOnly(200) },
  'POST /api/classes': {
    url: () => '/api/classes',
    body: (c) => ({
      name: 'Winter Bench',
      courseId: c.train.course.id,
      startsOn: '2027-01-11',
      endsOn: '2027-03-26',
      capacity: 10,
    }),
    expect: adminOnly(201),
  },
  'GET /api/classes': { url: () => '/api/classes', expect: signedIn(200) },
  'GET /api/classes/:id': {
    url: (c) => `/api/classes/${c.classA.id}`,
    expect: s(401, 200, 200, 404, 200, 404, 404, 200),
  },
  'PATCH /api/classes/:id': {
    url: (c) => `/api/classes/${c.classA.id}`,
    body: () => ({ capacity: 12 }),
    expect: adminOnly(200),
  },
  'GET /api/classes/:id/roster': {
    url: (c) => `/api/classes/${c.classA.id}/roster`,
    expect: s(401, 403, 403, 403, 200, 404, 404, 200),
  },
  'POST /api/classes/:id/enrolments/:userId/withdraw': {
    url: (c) => `/api/classes/${c.classA.id}/enrolments/${c.spare.id}/withdraw`,
    expect: adminOnly(200),
  },
  'POST /api/classes/:id/enrolments/:userId/reenrol': {
    url: (c) => `/api/classes/${c.classA.id}/enrolments/${c.spare.id}/reenrol`,
    expect: adminOnly(200),
  },
  'POST /api/classes/:id/invitations': {
    url: (c) => `/api/classes/${c.office.id}/invitations`,
    body: (c) => ({ emails: [c.fresh('invited')] }),
    expect: adminOnly(200),
  },
  'POST /api/classes/:id/roster/preview': {
    url: (c) => `/api/classes/${c.office.id}/roster/preview`,
    attach: (req, c) =>
      req.attach('file', Buffer.from(`name,email\nAda Quill,${c.fresh('roster')}\n`), {
        filename: 'roster.csv',
        contentType: 'text/csv',
      }),
    expect: adminOnly(200),
  },
  'POST /api/classes/:id/roster/import': {
    url: (c) => `/api/classes/${c.office.id}/roster/import`,
    body: (c) => ({ rows: [{ name: 'Ada Quill', email: c.fresh('imported') }] }),
    expect: adminOnly(200),
  },

  'GET /api/invitations': { url: () => '/api/invitations', expect: adminOnly(200) },
  'POST /api/invitations/:id/resend': {
    url: (c) => `/api/invitations/${c.openInvitation.id}/resend`,
    expect: adminOnly(200),
  },
  'POST /api/invitations/:id/revoke': {
    url: async (c) => `/api/invitations/${(await c.invitation()).id}/revoke`,
    expect: adminOnly(204),
  },
  // A fresh link each time: resending rotates the token of the open one.
  'GET /api/invitations/:token': {
    url: async (c) => `/api/invitations/${(await c.invitation()).token}`,
    expect: everyone(200),
  },
  'POST /api/invitations/:token/accept': {
    url: async (c) => `/api/invitations/${(await c.invitation()).token}/accept`,
    body: () => ({ name: 'Wren Tallack', password: 'escapement-pallets-1' }),
    expect: everyone(201),
    last: true,
  },
  'GET /api/audit': { url: () => '/api/audit', expect: adminOnly(200) },
  'GET /api/outbox': { url: () => '/api/outbox?state=failed', expect: adminOnly(200) },
  // Only the guild office may resend; a message that does not exist is 404 even to it.
  'POST /api/outbox/:id/resend': { url: () => '/api/outbox/999999/resend', expect: adminOnly(404) },

  'POST /api/uploads': { url: () => '/api/uploads', attach: jpeg, expect: apprentices(201) },
  'GET /api/uploads/usage': { url: () => '/api/uploads/usage', expect: signedIn(200) },
  'GET /api/uploads/:id': { url: (c) => `/api/uploads/${c.waiting.uploadIds[0]}`, expect: ownersWork(200) },

  // Apprentices always list their own pieces, whoever they name.
  'GET /api/submissions': {
    url: (c) => `/api/submissions?apprentice=${owner(c)}`,
    expect: s(401, 200, 200, 200, 200, 404, 404, 200),
  },
  'GET /api/submissions/link-options': { url: () => '/api/submissions/link-options', expect: apprentices(200) },
  'GET /api/submissions/projects/:projectId': {
    url: (c) => `/api/submissions/projects/${c.waitingProject.id}`,
    expect: s(401, 200, 200, 404, 403, 403, 403, 403),
  },
  'POST /api/submissions': {
    url: () => '/api/submissions',
    body: (c) => ({ projectId: c.waitingProject.id }),
    expect: s(401, 409, 201, 404, 403, 403, 403, 403),
  },
  'GET /api/submissions/:id': { url: (c) => `/api/submissions/${c.waiting.id}`, expect: ownersWork(200) },
  'PATCH /api/submissions/:id': {
    url: async (c) => `/api/submissions/${await c.draftAgain()}`,
    body: () => ({ notes: 'Plates drilled and broached.' }),
    expect: s(401, 200, 404, 404, 403, 403, 403, 403),
  },
  'POST /api/submissions/:id/send': {
    url: async (c) => `/api/submissions/${await c.draftAgain()}/send`,
    expect: s(401, 200, 404, 404, 403, 403, 403, 403),
  },
  'GET /api/review-queue': { url: () => '/api/review-queue', expect: reviewers(200) },
  'GET /api/review-queue/count': { url: () => '/api/review-queue/count', expect: reviewers(200) },
  'GET /api/review-queue/filters': { url: () => '/api/review-queue/filters', expect: reviewers(200) },
  'GET /api/reviews': { url: () => '/api/reviews', expect: signedIn(200) },
  'POST /api/submissions/:id/reviews': {
    url: async (c) => `/api/submissions/${await c.waitingAgain()}/reviews`,
    body: (c) => ({
      scores: Object.fromEntries(c.waitingProject.criteria.map((k) => [k.key, 3])),
      comment: 'Even shake all round.',
      pins: [],
      outcome: 'rework',
    }),
    expect: s(401, 403, 403, 403, 201, 404, 404, 201),
  },

  'GET /api/notifications': { url: () => '/api/notifications', expect: signedIn(200) },
  'GET /api/notifications/count': { url: () => '/api/notifications/count', expect: signedIn(200) },
  'POST /api/notifications/read-all': { url: () => '/api/notifications/read-all', expect: signedIn(200) },
  'POST /api/notifications/:id/read': {
    url: (c) => `/api/notifications/${c.noticeId}/read`,
    expect: s(401, 200, 404, 404, 404, 404, 404, 404),
  },

  'POST /api/log-entries': {
    url: () => '/api/log-entries',
    body: () => ({ date: localToday(), minutes: 5, title: 'Oiled the pivots' }),
    expect: apprentices(201),
  },
  'GET /api/log-entries': { url: (c) => `/api/log-entries?apprentice=${owner(c)}`, expect: ownersWork(200) },
  'GET /api/log-entries/export.csv': {
    url: (c) => `/api/log-entries/export.csv?apprentice=${owner(c)}`,
    expect: ownersWork(200),
  },
  'GET /api/log-entries/summary': {
    url: (c) => `/api/log-entries/summary?apprentice=${owner(c)}`,
    expect: ownersWork(200),
  },
  'GET /api/log-entries/to-read': { url: () => '/api/log-entries/to-read', expect: reviewers(200) },
  'GET /api/log-entries/apprentices': { url: () => '/api/log-entries/apprentices', expect: reviewers(200) },
  'GET /api/log-entries/:id': { url: (c) => `/api/log-entries/${c.entryId}`, expect: ownersWork(200) },
  'PATCH /api/log-entries/:id': {
    url: (c) => `/api/log-entries/${c.entryId}`,
    body: () => ({ minutes: 50 }),
    expect: ownersChange(200),
  },
  'DELETE /api/log-entries/:id': {
    url: async (c) => `/api/log-entries/${await c.spareEntry()}`,
    expect: ownersChange(204),
  },
  'POST /api/log-entries/:id/comments': {
    url: (c) => `/api/log-entries/${c.entryId}/comments`,
    body: () => ({ body: 'Measure the end shake with the plates pinned.' }),
    expect: mentorsFeedback(201),
  },
  'POST /api/log-entries/:id/grades': {
    url: (c) => `/api/log-entries/${c.entryId}/grades`,
    body: () => ({ completeness: 3, measurements: 3, photos: 2 }),
    expect: mentorsFeedback(201),
  },

  'GET /api/apprentices/:id/record': { url: (c) => `/api/apprentices/${owner(c)}/record`, expect: ownersWork(200) },
  'GET /api/apprentices/:id/portfolio.zip': {
    url: (c) => `/api/apprentices/${owner(c)}/portfolio.zip`,
    expect: ownersWork(200),
  },
  'POST /api/apprentices/:id/sign-offs': {
    url: async (c) => {
      await c.noStandingSignOff();
      return `/api/apprentices/${owner(c)}/sign-offs`;
    },
    body: (c) => c.signOffBody(),
    expect: s(401, 403, 403, 403, 201, 404, 404, 201),
  },
  'POST /api/sign-offs/:id/withdraw': {
    url: async (c) => `/api/sign-offs/${await c.freshSignOff()}/withdraw`,
    body: () => ({ reason: 'Seen again: the tilt is uneven.' }),
    expect: s(401, 403, 403, 403, 200, 404, 404, 200),
  },
  // The owner has not done the springs course: the guild office is told what is missing.
  'POST /api/certificates': {
    url: () => '/api/certificates',
    body: (c) => ({ apprenticeId: owner(c), courseId: c.springs.course.id }),
    expect: adminOnly(422),
  },
  'GET /api/certificates': { url: (c) => `/api/certificates?apprenticeId=${owner(c)}`, expect: ownersWork(200) },
  'GET /api/certificates/:id/pdf': { url: (c) => `/api/certificates/${c.certificate.id}/pdf`, expect: ownersWork(200) },
  'POST /api/certificates/:id/revoke': {
    url: async (c) => `/api/certificates/${await c.freshCertificate()}/revoke`,
    body: () => ({ reason: 'Issued to the wrong course.' }),
    expect: adminOnly(200),
  },
  'GET /api/verify/:code': { url: (c) => `/api/verify/${c.certificate.code}`, expect: everyone(200) },
};
