import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLES, type Role } from '../src/users/user-role';
import { type DeclaredRoute, declaredRoutes, expressRoutes } from './support/routes';
import { anonymousSession, signInAs, type Session } from './support/sessions';
import { startTestApp, type TestApp } from './support/test-app';

type Principal = 'anonymous' | Role;
const PRINCIPALS: Principal[] = ['anonymous', ...ROLES];

/** Served by @nestjs/swagger outside any controller: the API documentation, public by design. */
const DOCUMENTATION_PREFIX = '/api/docs';

const DENIED = new Set([401, 403]);

const STAFF: Principal[] = ['desk', 'tech', 'manager'];
const SIGNED_IN: Principal[] = ['customer', ...STAFF];

/**
 * Who each route is meant for, written out by hand: a route whose declared access differs (or
 * a new route missing here) fails, so access is always a decision someone wrote down.
 */
const INTENDED_ACCESS: Record<string, Principal[]> = {
  'GET /api/auth/csrf': PRINCIPALS,
  'POST /api/auth/register': PRINCIPALS,
  'POST /api/auth/sign-in': PRINCIPALS,
  'POST /api/auth/sign-out': PRINCIPALS,
  'GET /api/auth/me': SIGNED_IN,
  'POST /api/auth/password-reset': PRINCIPALS,
  'POST /api/auth/password-reset/confirm': PRINCIPALS,
  'GET /api/staff': ['manager'],
  'POST /api/staff': ['manager'],
  'PATCH /api/staff/:id': ['manager'],
  'GET /api/health/live': PRINCIPALS,
  'GET /api/health/ready': PRINCIPALS,
  // Issue 3: catalogue, vehicle specifications and the fit report.
  'GET /api/vehicle-models': PRINCIPALS,
  'GET /api/vehicle-models/makes': PRINCIPALS,
  'GET /api/vehicle-models/:id': PRINCIPALS,
  'POST /api/vehicle-models': ['manager'],
  'PATCH /api/vehicle-models/:id': ['manager'],
  'GET /api/my/vehicles': ['customer'],
  'POST /api/my/vehicles': ['customer'],
  'PATCH /api/my/vehicles/:id': ['customer'],
  'GET /api/products': PRINCIPALS,
  'GET /api/products/:id': PRINCIPALS,
  'POST /api/products': ['manager'],
  'PATCH /api/products/:id': ['manager'],
  'POST /api/catalogue/import/preview': ['manager'],
  'POST /api/catalogue/import/apply': ['manager'],
  'GET /api/catalogue/export.csv': ['manager'],
  'GET /api/fitment/tyre-size': PRINCIPALS,
  'POST /api/fitment/check': PRINCIPALS,
  'GET /api/rule-sets': ['desk', 'manager'],
  'GET /api/rule-sets/:id': ['desk', 'manager'],
  'PATCH /api/rule-sets/:id': ['manager'],
  // Issue 4: workshop card and pricing policy, planner options and quotes.
  'GET /api/workshop': PRINCIPALS,
  'GET /api/policies': ['desk', 'manager'],
  'PUT /api/policies': ['manager'],
  'POST /api/planner/options': PRINCIPALS,
  'POST /api/quotes/preview': PRINCIPALS,
  'POST /api/quotes': ['customer', 'desk', 'manager'],
  'GET /api/quotes': ['customer', 'desk', 'manager'],
  'GET /api/quotes/:id': ['customer', 'desk', 'manager'],
  'GET /api/quotes/:id/versions/:n/pdf': ['customer', 'desk', 'manager'],
  'POST /api/quotes/:id/versions/:n/accept': ['customer'],
  'POST /api/quotes/:id/versions/:n/decline': ['customer'],
  'POST /api/quotes/:id/versions/:n/send': ['desk', 'manager'],
  // Issue 7: the desk revises a quote.
  'POST /api/quotes/:id/revisions/preview': ['desk', 'manager'],
  'POST /api/quotes/:id/revisions': ['desk', 'manager'],
  // Issue 4: customer photos and customers for walk-in quotes. The matrix sends POST
  // /api/uploads as JSON, not multipart: allowed callers get 400 (no photo), which is enough to
  // tell them from the refused ones (401/403 come from the guards before the body is read).
  'POST /api/uploads': ['customer', 'desk', 'manager'],
  'GET /api/uploads': ['customer', 'desk', 'manager'],
  'GET /api/uploads/:id': SIGNED_IN,
  'GET /api/uploads/:id/thumbnail': SIGNED_IN,
  'DELETE /api/uploads/:id': ['customer', 'desk', 'manager'],
  'GET /api/customers': ['desk', 'manager'],
  'POST /api/customers': ['desk', 'manager'],
  // Issue 5: workshop set-up (Manage → Workshop): the desk reads, the manager changes.
  'GET /api/workshop/setup': ['desk', 'manager'],
  'PUT /api/workshop/calendar': ['manager'],
  'POST /api/workshop/bays': ['manager'],
  'PATCH /api/workshop/bays/:id': ['manager'],
  'POST /api/workshop/closures': ['manager'],
  'DELETE /api/workshop/closures/:id': ['manager'],
  'PUT /api/workshop/holidays/:date': ['manager'],
  // Issue 5: availability and bookings (a customer's own; the desk and the manager every one).
  'GET /api/availability': ['customer', 'desk', 'manager'],
  'POST /api/bookings': ['customer', 'desk', 'manager'],
  'GET /api/bookings': ['customer', 'desk', 'manager'],
  'GET /api/bookings/:id': ['customer', 'desk', 'manager'],
  'POST /api/bookings/:id/move': ['customer', 'desk', 'manager'],
  'POST /api/bookings/:id/cancel': ['customer', 'desk', 'manager'],
  'POST /api/bookings/:id/move-request': ['customer'],
  // Issue 7: the desk confirms and moves bookings along their work.
  'POST /api/bookings/:id/advance': ['desk', 'manager'],
  // Issue 6: deposits. The webhook is public (the provider calls it, proving itself by the
  // signature; every principal here gets 400 for the missing one).
  'POST /api/bookings/:id/deposit-checkout': ['customer', 'desk', 'manager'],
  // Issue 7: the difference when an accepted revision raised the deposit.
  'POST /api/bookings/:id/top-up-checkout': ['customer', 'desk', 'manager'],
  // Issue 7: the desk marks the vehicle in.
  'POST /api/bookings/:id/arrived': ['desk', 'manager'],
  'POST /api/payments/webhook': PRINCIPALS,
};

function sorted(principals: Principal[]): string {
  return PRINCIPALS.filter((principal) => principals.includes(principal)).join(', ');
}

function allowedFor(route: DeclaredRoute): Principal[] {
  if (route.rule.kind === 'public') return PRINCIPALS;
  if (route.rule.kind === 'roles')
    return PRINCIPALS.filter(
      (p) => p !== 'anonymous' && route.rule.kind === 'roles' && route.rule.roles.includes(p),
    );
  return [];
}

describe('role matrix: every route answers exactly the roles it declares', () => {
  let testApp: TestApp;
  let routes: DeclaredRoute[];

  beforeAll(async () => {
    testApp = await startTestApp();
    routes = declaredRoutes(testApp.app);
  });

  afterAll(async () => {
    await testApp.close();
  });

  it('finds the routes from the running application', () => {
    expect(routes.length).toBeGreaterThan(0);
    // Nest mounts middleware (request id, ORM context, session) on the prefix and on wildcards.
    const isMiddlewareMount = (path: string) => path === '/api' || path.includes('{*');
    const fromExpress = expressRoutes(testApp.app).filter((route) => {
      const path = route.split(' ')[1];
      return !isMiddlewareMount(path) && !path.startsWith(DOCUMENTATION_PREFIX);
    });
    const fromControllers = routes.map((route) => `${route.method} ${route.path}`);
    // Nothing reaches Express that the matrix below does not call, and the other way round.
    expect([...new Set(fromExpress)].sort()).toEqual([...fromControllers].sort());
  });

  it('has an access decision (@Public or @Roles, not both) on every route', () => {
    const undecided = routes
      .filter((route) => route.rule.kind === 'none')
      .map((route) => `${route.method} ${route.path} (${route.handler})`);
    expect(undecided, 'routes without @Public() or @Roles(...)').toEqual([]);
  });

  it('declares on every route the access it is meant to have', () => {
    const declared = Object.fromEntries(
      routes.map((route) => [`${route.method} ${route.path}`, sorted(allowedFor(route))]),
    );
    const intended = Object.fromEntries(
      Object.entries(INTENDED_ACCESS).map(([route, principals]) => [route, sorted(principals)]),
    );
    expect(declared).toEqual(intended);
  });

  it('lets in exactly the declared principals on every route', async () => {
    async function sessionFor(principal: Principal): Promise<Session> {
      return principal === 'anonymous' ? anonymousSession(testApp) : signInAs(testApp, principal);
    }

    const mismatches: string[] = [];
    const serverErrors: string[] = [];
    for (const route of routes) {
      const path = route.path.replace(/:[A-Za-z]+/g, randomUUID());
      const actuallyAllowed: Principal[] = [];
      for (const principal of PRINCIPALS) {
        // A fresh session per call: some routes (sign-in, sign-out) replace or end it.
        const session = await sessionFor(principal);
        const call =
          session.agent[route.method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete'](
            path,
          );
        const response = await (route.method === 'GET'
          ? call
          : call.set('x-csrf-token', session.csrfToken).send({}));
        if (!DENIED.has(response.status)) actuallyAllowed.push(principal);
        if (response.status >= 500)
          serverErrors.push(`${route.method} ${route.path} as ${principal}: ${response.status}`);
      }
      const expected = allowedFor(route);
      if (actuallyAllowed.join(',') !== expected.join(',')) {
        mismatches.push(
          `${route.method} ${route.path}: declared [${expected.join(', ')}], answered [${actuallyAllowed.join(', ')}]`,
        );
      }
    }
    expect(mismatches).toEqual([]);
    expect(serverErrors).toEqual([]);
  });

  it('serves the API documentation to anyone', async () => {
    await request(testApp.server).get('/api/docs').expect(200);
    const document = await request(testApp.server).get('/api/docs-json').expect(200);
    const paths = Object.keys((document.body as { paths: Record<string, unknown> }).paths);
    const documented = routes.map((route) => route.path.replace(/:([A-Za-z]+)/g, '{$1}'));
    expect([...new Set(documented)].sort()).toEqual(paths.sort());
  });

  it('documents every schema the OpenAPI document refers to', async () => {
    const document = await request(testApp.server).get('/api/docs-json').expect(200);
    const body = document.body as { components: { schemas: Record<string, unknown> } };
    const refs = [
      ...JSON.stringify(body).matchAll(/"\$ref":"#\/components\/schemas\/([^"]+)"/g),
    ].map((match) => match[1]);
    expect(refs.length).toBeGreaterThan(0);
    const missing = [...new Set(refs)].filter((name) => !(name in body.components.schemas));
    expect(missing).toEqual([]);
  });
});
