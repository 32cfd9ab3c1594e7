import { RequestMethod } from '@nestjs/common';
import { METHOD_METADATA, PATH_METADATA } from '@nestjs/common/constants';
import { MetadataScanner, ModulesContainer, Reflector } from '@nestjs/core';
import { NestExpressApplication } from '@nestjs/platform-express';
import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { DataSource } from 'typeorm';
import { AuthCookies } from '../src/auth/auth-cookies';
import { hashPassword } from '../src/auth/password-hasher';
import { ACCESS_RULE, type AccessRule } from '../src/common/decorators/access.decorator';
import { ACCESS_CODES } from '../src/auth/access.guard';
import { hashSecretToken, newSecretToken } from '../src/common/secret-token';
import { createTestApp } from './create-test-app';
import { uniqueClientIp, uniqueEmail } from './support/accounts';

/**
 * Every route of the app, called as each kind of caller, against the rule it declares. Routes are found
 * by walking Nest's controllers (and checked against Express's router), so a route added tomorrow is
 * covered tomorrow, and a route without an access rule fails here.
 */

jest.setTimeout(120_000);

interface Route {
  method: string;
  path: string;
  rule: AccessRule | undefined;
  handler: string;
}

const ROLES = ['anonymous', 'non-member', 'editor', 'owner', 'admin'] as const;
type Role = (typeof ROLES)[number];
type Outcome = 'allowed' | 'sign-in' | 'forbidden' | 'not-found';

const READS = new Set(['GET', 'HEAD', 'OPTIONS']);

/** What the access contract promises (DEVELOPERS.md, "Access rules"). */
function expected(rule: AccessRule, role: Role, method: string): Outcome {
  if (rule === 'public') return 'allowed';
  if (role === 'anonymous') return 'sign-in';
  if (rule === 'signed-in') return 'allowed';
  if (rule === 'admin') return role === 'admin' ? 'allowed' : 'forbidden';
  // Workshop rules.
  if (role === 'owner') return 'allowed';
  if (role === 'editor') return rule === 'workshop-editor' ? 'allowed' : 'forbidden';
  if (role === 'admin') return READS.has(method) ? 'allowed' : 'not-found';
  return 'not-found';
}

function observed(status: number, body: { code?: unknown }): Outcome | string {
  if (status === 401 && body.code === ACCESS_CODES.signInRequired) return 'sign-in';
  if (status === 403 && body.code === ACCESS_CODES.forbidden) return 'forbidden';
  if (status === 404 && body.code === ACCESS_CODES.workshopNotFound) return 'not-found';
  if (status === 401 || (status === 403 && typeof body.code === 'string' && Object.values(ACCESS_CODES).includes(body.code as never))) {
    return `refused (${status} ${String(body.code)})`;
  }
  return 'allowed';
}

const joinPath = (...parts: string[]) =>
  `/${parts
    .flatMap((part) => part.split('/'))
    .filter(Boolean)
    .join('/')}`;

/** Every controller method Nest mapped, with its rule as the guard reads it. */
function discoverRoutes(app: NestExpressApplication): Route[] {
  const reflector = new Reflector();
  const scanner = new MetadataScanner();
  const routes: Route[] = [];
  for (const module of app.get(ModulesContainer).values()) {
    for (const wrapper of module.controllers.values()) {
      const controller = wrapper.metatype as (new (...args: never[]) => object) | undefined;
      if (!controller) continue;
      const prefixes = [Reflect.getMetadata(PATH_METADATA, controller) as string | string[] | undefined].flat();
      for (const name of scanner.getAllMethodNames(controller.prototype)) {
        const handler = (controller.prototype as Record<string, unknown>)[name] as (...args: unknown[]) => unknown;
        const methodIndex = Reflect.getMetadata(METHOD_METADATA, handler) as RequestMethod | undefined;
        if (methodIndex === undefined) continue;
        const paths = [Reflect.getMetadata(PATH_METADATA, handler) as string | string[] | undefined].flat();
        const rule: AccessRule | undefined = reflector.getAllAndOverride(ACCESS_RULE, [handler, controller]);
        for (const prefix of prefixes) {
          for (const path of paths) {
            routes.push({
              method: RequestMethod[methodIndex],
              path: joinPath('api', prefix ?? '', path ?? ''),
              rule,
              handler: `${controller.name}.${name}`,
            });
          }
        }
      }
    }
  }
  return routes;
}

interface ExpressLayer {
  route?: { path: string | string[]; methods: Record<string, boolean> };
}

/** What Express will actually answer under /api (API docs aside). */
function expressApiRoutes(app: NestExpressApplication): string[] {
  const express = app.getHttpAdapter().getInstance() as { router: { stack: ExpressLayer[] } };
  return express.router.stack.flatMap((layer) => {
    if (!layer.route) return [];
    const { methods } = layer.route;
    return [layer.route.path].flat().flatMap((path) =>
      path.startsWith('/api/') && !path.startsWith('/api/docs')
        ? Object.keys(methods)
            .filter((method) => methods[method] && method !== '_all')
            .map((method) => `${method.toUpperCase()} ${path}`)
        : [],
    );
  });
}

describe('authorization matrix: every route × anonymous, non-member, editor, owner, admin', () => {
  let app: NestExpressApplication;
  let db: DataSource;
  let routes: Route[];
  const workshopId = randomUUID();
  const slug = `matrix-${Date.now().toString(36)}`;
  const people = {} as Record<Exclude<Role, 'anonymous'>, { id: string; token: string }>;
  const clientIps = Object.fromEntries(ROLES.map((role) => [role, uniqueClientIp()])) as Record<Role, string>;

  beforeAll(async () => {
    app = await createTestApp();
    db = app.get(DataSource);
    routes = discoverRoutes(app);
    const passwordHash = await hashPassword('matrix password, never used');
    for (const role of ['non-member', 'editor', 'owner', 'admin'] as const) {
      const id = randomUUID();
      await db.query(
        `INSERT INTO users (id, email, password_hash, display_name, email_verified_at, is_admin)
         VALUES (?, ?, ?, ?, NOW(3), ?)`,
        [id, uniqueEmail(`matrix-${role}`), passwordHash, `Matrix ${role}`, role === 'admin' ? 1 : 0],
      );
      people[role] = { id, token: newSecretToken() };
    }
    await db.query('INSERT INTO workshops (id, slug, name) VALUES (?, ?, ?)', [workshopId, slug, 'Matrix Workshop']);
    await restoreFixture();
  });
  afterAll(async () => app?.close());

  /** Puts back whatever an allowed call changed: memberships, flags, sessions (a sign-out deletes one). */
  async function restoreFixture(): Promise<void> {
    const ids = Object.values(people).map((person) => person.id);
    await db.query('UPDATE users SET disabled_at = NULL, is_admin = (id = ?) WHERE id IN (?)', [people.admin.id, ids]);
    await db.query('UPDATE workshops SET disabled_at = NULL WHERE id = ?', [workshopId]);
    await db.query('DELETE FROM workshop_members WHERE workshop_id = ? AND user_id NOT IN (?)', [workshopId, [people.owner.id, people.editor.id]]);
    for (const [role, person] of [['owner', people.owner], ['editor', people.editor]] as const) {
      await db.query(
        `INSERT INTO workshop_members (id, workshop_id, user_id, role) VALUES (?, ?, ?, ?)
         ON DUPLICATE KEY UPDATE role = VALUES(role)`,
        [randomUUID(), workshopId, person.id, role],
      );
    }
    for (const person of Object.values(people)) {
      await db.query(
        `INSERT IGNORE INTO sessions (id, user_id, token_hash, expires_at, last_seen_at)
         VALUES (?, ?, ?, NOW(3) + INTERVAL 1 DAY, NOW(3))`,
        [randomUUID(), person.id, hashSecretToken(person.token)],
      );
    }
  }

  function call(route: Route, role: Role): request.Test {
    const url = route.path
      .replace(/:workshopId\b/g, workshopId)
      .replace(/:[A-Za-z_]\w*/g, () => randomUUID())
      .replace(/\*\w*|\{\*\w+\}/g, 'x');
    const server = request(app.getHttpServer());
    const method = route.method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete' | 'head' | 'options';
    // CSRF tokens are signed to their session: each caller sends the one a browser of theirs would hold.
    const sessionToken = role === 'anonymous' ? undefined : people[role].token;
    const csrf = app.get(AuthCookies).csrfTokenFor(sessionToken);
    const cookies = [`fw_csrf=${csrf}`];
    if (sessionToken) cookies.push(`fw_session=${sessionToken}`);
    const test = server[method](url)
      .set('Cookie', cookies.join('; '))
      .set('X-CSRF-Token', csrf)
      .set('X-Forwarded-For', clientIps[role]);
    return ['post', 'put', 'patch'].includes(method) ? test.send({}) : test;
  }

  it('finds the routes, and Express serves no /api route that Nest does not guard', () => {
    expect(routes.length).toBeGreaterThan(20);
    const discovered = new Set(routes.map((route) => `${route.method} ${route.path}`));
    const unguarded = expressApiRoutes(app).filter((route) => !discovered.has(route));
    expect(unguarded).toEqual([]);
    // The routes this issue adds are among them.
    for (const route of [
      'POST /api/auth/login',
      'GET /api/workshops/:workshopId/members',
      'GET /api/admin/users',
      // The build page's fit-news record (editors read, owners retry).
      'GET /api/workshops/:workshopId/builds/:buildId/fit-news',
      'POST /api/workshops/:workshopId/builds/:buildId/fit-news/retry',
      // Published revisions and the reader's last-read record.
      'GET /api/guides/:workshopSlug/:guideSlug/revisions',
      'GET /api/guides/:workshopSlug/:guideSlug/revisions/compare',
      'GET /api/guides/:workshopSlug/:guideSlug/revisions/:number',
      'GET /api/guides/:workshopSlug/:guideSlug/reading',
      'PUT /api/guides/:workshopSlug/:guideSlug/reading',
      // An invitation mail's "stop invitations to this address" link (no sign-in: the token is the key).
      'GET /api/invitations/opt-out',
      'PUT /api/invitations/opt-out',
    ]) {
      expect(discovered).toContain(route);
    }
  });

  it('every route declares an access rule', () => {
    const missing = routes.filter((route) => !route.rule).map((route) => `${route.method} ${route.path} (${route.handler})`);
    expect(missing).toEqual([]);
  });

  it('every workshop rule sits on a route with a :workshopId parameter', () => {
    const misplaced = routes
      .filter((route) => route.rule?.startsWith('workshop-') && !route.path.includes(':workshopId'))
      .map((route) => `${route.method} ${route.path} (${route.handler})`);
    expect(misplaced).toEqual([]);
  });

  it('answers each kind of caller as the route’s rule says', async () => {
    const mismatches: string[] = [];
    let calls = 0;
    for (const route of routes) {
      if (!route.rule) continue;
      for (const role of ROLES) {
        const response = await call(route, role);
        calls += 1;
        const want = expected(route.rule, role, route.method);
        const got = observed(response.status, response.body ?? {});
        if (got !== want) {
          mismatches.push(
            `${route.method} ${route.path} [${route.rule}] as ${role}: expected ${want}, got ${got} (${response.status} ${JSON.stringify(response.body?.message ?? '')})`,
          );
        }
        if (!READS.has(route.method)) await restoreFixture();
      }
    }
    expect(mismatches).toEqual([]);
    expect(calls).toBeGreaterThan(100);
  });

  it('refuses a route that lost its rule, and logs it (the guard’s own safety net)', async () => {
    // The guard reads the rule at request time: remove one and the route closes for everybody.
    const route = routes.find((candidate) => candidate.path === '/api/auth/me')!;
    const [controllerName, methodName] = route.handler.split('.');
    const controller = [...app.get(ModulesContainer).values()]
      .flatMap((module) => [...module.controllers.values()])
      .find((wrapper) => wrapper.metatype?.name === controllerName)!.metatype as { prototype: Record<string, object> };
    const handler = controller.prototype[methodName];
    const rule = Reflect.getMetadata(ACCESS_RULE, handler) as AccessRule;
    Reflect.deleteMetadata(ACCESS_RULE, handler);
    try {
      const response = await request(app.getHttpServer()).get('/api/auth/me').expect(403);
      expect(response.body.code).toBe(ACCESS_CODES.noRule);
    } finally {
      Reflect.defineMetadata(ACCESS_RULE, rule, handler);
    }
    await request(app.getHttpServer()).get('/api/auth/me').expect(200);
  });
});
