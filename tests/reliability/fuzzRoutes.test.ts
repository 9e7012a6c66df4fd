/**
 * Property-based bad input on every JSON route (fast-check, fixed seed): hostile values at random
 * places of a valid body, hostile whole bodies and broken JSON. Each answer must be < 500 and come
 * within the request timeout; a 4xx must leave every table's row count unchanged; nothing may
 * reach Object.prototype.
 */
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeTestApp, type TestApp } from '../server/helpers/testApp';
import { demoFixture, type Fixture } from '../server/helpers/fixtures';
import { jsonRoutes, type JsonRoute } from './jsonRoutes';
import { brokenJson, hostileValue, mutated } from './hostile';

/** Inputs per route (31 routes × 40 ≈ 1 240 requests). */
const RUNS_PER_ROUTE = 40;
const SEED = 20261202;

let t: TestApp;
let f: Fixture;
let routes: JsonRoute[];
let tables: string[];
const tally = { inputs: 0, rejected: 0, accepted: 0 };

beforeAll(async () => {
  t = await makeTestApp({ LOGIN_RATE_LIMIT: '10000' });
  f = await demoFixture(t);
  routes = await jsonRoutes(f);
  const [rows] = await t.sequelize.query("SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%'");
  tables = (rows as { name: string }[]).map((r) => r.name);
}, 60_000);
afterAll(async () => {
  console.info(`fuzz: ${tally.inputs} inputs, ${tally.rejected} rejected with 4xx, ${tally.accepted} accepted as valid`);
  await t.dispose();
});

async function counts(): Promise<string> {
  const sql = `SELECT ${tables.map((n) => `(SELECT COUNT(*) FROM "${n}") AS "${n}"`).join(', ')}`;
  const [rows] = await t.sequelize.query(sql);
  return JSON.stringify(rows[0]);
}

async function send(r: JsonRoute, text: string): Promise<{ status: number; body: { error?: { code: string } } }> {
  return f.owner.agent[r.method](r.path).set('x-csrf-token', f.owner.token).set('content-type', 'application/json').timeout(20_000).send(text);
}

describe('hostile JSON bodies on every JSON route', () => {
  it('covers the routes in the list', () => expect(routes.length).toBeGreaterThanOrEqual(31));

  it.each([...Array(31).keys()])('route #%i: 4xx (or a valid 2xx), never 500, never a write on rejection', async (i) => {
    const r = routes[i];
    const body = fc.oneof({ weight: 6, arbitrary: mutated(r.valid) }, { weight: 2, arbitrary: hostileValue }, { weight: 1, arbitrary: brokenJson });
    await fc.assert(
      fc.asyncProperty(body, async (text) => {
        const before = await counts();
        const res = await send(r, text);
        tally.inputs++;
        expect(res.status, `${r.route} ← ${text.slice(0, 200)}: ${JSON.stringify(res.body).slice(0, 300)}`).toBeLessThan(500);
        expect(({} as Record<string, unknown>).polluted, 'Object.prototype polluted').toBeUndefined();
        if (res.status >= 400) {
          tally.rejected++;
          expect(res.body.error?.code, `${r.route}: error body shape`).toBeTypeOf('string');
          expect(await counts(), `${r.route} wrote on a rejected request ← ${text.slice(0, 200)}`).toBe(before);
        } else tally.accepted++;
      }),
      { numRuns: RUNS_PER_ROUTE, seed: SEED + i, endOnFailure: true },
    );
  }, 120_000);
});
