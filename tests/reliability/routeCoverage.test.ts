/**
 * Every API route, listed from the Express router stack, is either in the role × route matrix
 * (tests/server/api/roleMatrix.test.ts) or checked here: a signed-out visitor gets 401 and a member
 * of another workspace gets 404 — unless the route is public on purpose (listed below).
 */
import fs from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client, makeTestApp, type TestApp } from '../server/helpers/testApp';
import { createUser, demoFixture, type Fixture } from '../server/helpers/fixtures';

/** Routes open to signed-out visitors by design (sign-in, first-run setup, invitation links, health). */
const PUBLIC = new Set([
  'GET /health', 'GET /auth/csrf', 'GET /auth/setup', 'POST /auth/setup', 'POST /auth/login', 'POST /auth/logout',
  'GET /invitations/:token', 'POST /invitations/:token/accept',
  // password reset: whoever forgot their password is signed out; the e-mailed single-use token is the credential
  'POST /auth/password-reset', 'GET /auth/password-reset/:token', 'POST /auth/password-reset/:token',
]);

interface Layer { route?: { path: string; methods: Record<string, boolean> }; handle: { stack?: Layer[] }; rawPath?: unknown }

/** "METHOD /path" of every route under /api. */
function listRoutes(stack: Layer[], prefix = ''): string[] {
  const out: string[] = [];
  for (const layer of stack) {
    if (layer.route) {
      for (const m of Object.keys(layer.route.methods)) out.push(`${m.toUpperCase()} ${prefix}${layer.route.path}`);
    } else if (layer.handle?.stack) {
      const mount = typeof layer.rawPath === 'string' && layer.rawPath !== '/' ? layer.rawPath : '';
      out.push(...listRoutes(layer.handle.stack, prefix + mount));
    }
  }
  return out;
}

/** Routes named in the role matrix test ("PATCH /variants/:vid/status (approve)" → "PATCH /variants/:vid/status"). */
function matrixRoutes(): Set<string> {
  const text = fs.readFileSync('tests/server/api/roleMatrix.test.ts', 'utf8');
  return new Set([...text.matchAll(/route: '([A-Z]+ [^' (]+)/g)].map((m) => m[1].trim()));
}

let t: TestApp;
let f: Fixture;
let anon: Client;
let outsider: Client;
let routes: string[];
beforeAll(async () => {
  t = await makeTestApp();
  f = await demoFixture(t);
  anon = new Client(t.app);
  await anon.csrf();
  await createUser(t, 'otto.outsider@elsewhere.example', 'outsider-password', { newName: 'Elsewhere Works' });
  outsider = new Client(t.app);
  await outsider.login('otto.outsider@elsewhere.example', 'outsider-password');
  const api = (t.app as unknown as { router: { stack: Layer[] } }).router.stack;
  routes = [...new Set(listRoutes(api).map((r) => r.replace(/^(\w+) \/api/, '$1 ')))].map((r) => r.replace(/^(\w+) {2}/, '$1 '));
});
afterAll(async () => t.dispose());

function concrete(route: string): { method: string; path: string; ownedIdsOnly: boolean } {
  const [method, p] = route.split(' ');
  const ids: Record<string, number | string> = { wid: f.wid, pid: f.pid, aid: f.aid, vid: f.vid, n: 1, uid: 1, id: 1, token: 'x' };
  return { method, path: '/api' + p.replace(/:(\w+)/g, (_, k: string) => String(ids[k] ?? 1)), ownedIdsOnly: !/:(id|uid|token)\b/.test(p) };
}

async function call(c: Client, method: string, path: string) {
  if (method === 'GET') return c.get(path);
  if (method === 'DELETE') return c.del(path);
  return c[method.toLowerCase() as 'post' | 'put' | 'patch'](path, {});
}

describe('route coverage', () => {
  it('lists the API routes from the router stack', () => {
    expect(routes.length).toBeGreaterThan(60);
    expect(routes).toContain('PUT /variants/:vid');
  });

  it('guards every route outside the role matrix: 401 signed out, 404 for another workspace', async () => {
    const inMatrix = matrixRoutes();
    const unguarded: string[] = [];
    const checked: string[] = [];
    for (const route of routes) {
      if (inMatrix.has(route) || PUBLIC.has(route)) continue;
      const { method, path, ownedIdsOnly } = concrete(route);
      const a = await call(anon, method, path);
      if (a.status !== 401) unguarded.push(`${route} signed out → ${a.status}`);
      if (ownedIdsOnly && /:(wid|pid|aid|vid)/.test(route)) {
        const o = await call(outsider, method, path);
        if (o.status !== 404) unguarded.push(`${route} other workspace → ${o.status}`);
      }
      checked.push(route);
    }
    console.info(`route coverage: ${routes.length} routes, ${inMatrix.size} in the role matrix, ${PUBLIC.size} public, ${checked.length} checked here: ${checked.join(', ')}`);
    expect(unguarded).toEqual([]);
  });
});
