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
});
