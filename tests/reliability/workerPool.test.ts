/** The engine worker pool and background jobs: solves leave the event loop free, a full queue says 503, jobs report progress and cancel. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeTestApp, signedIn, type Client, type TestApp } from '../server/helpers/testApp';
import { demoFixture, type Fixture } from '../server/helpers/fixtures';
import { configurePool, POOL_DEFAULTS, runEngineTask } from '../../server/lib/workerPool';
import { demoContent } from '../../server/db/seeders/demoContent';

let t: TestApp;
let f: Fixture;
let engineer: Client;
let reviewer: Client;
beforeAll(async () => {
  t = await makeTestApp();
  f = await demoFixture(t);
  engineer = await signedIn(t.app, 'engineer');
  reviewer = await signedIn(t.app, 'reviewer');
});
afterAll(async () => {
  await configurePool(POOL_DEFAULTS);
  await t.dispose();
});

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

async function waitFor(c: Client, id: string, done: (b: { status: string }) => boolean): Promise<{ status: string; progress: number; result?: unknown; error?: unknown }> {
  for (let i = 0; i < 600; i++) {
    const b = (await c.get(`/api/jobs/${id}`)).body;
    if (done(b)) return b;
    await sleep(100);
  }
  throw new Error(`job ${id} did not reach the expected state in 60 s`);
}

describe('engine worker pool', () => {
  it('keeps the event loop answering while a long impedance job runs', async () => {
    const start = await engineer.post(`/api/variants/${f.vid}/jobs`, { kind: 'impedance', count: 40 });
    expect(start.status).toBe(202);
    expect(start.body).toMatchObject({ status: 'running', progress: 0, kind: 'impedance' });
    const health = await engineer.get('/api/health');
    expect(health.status).toBe(200);
    const done = await waitFor(engineer, start.body.id, (b) => b.status !== 'running');
    expect(done.status, JSON.stringify(done.error)).toBe('done');
    expect(done.progress).toBe(1);
    expect((done.result as { times: number[] }).times).toHaveLength(40);
  });

  it('cancels a running job; only its owner sees it; a reviewer may not start one', async () => {
    const start = await engineer.post(`/api/variants/${f.vid}/jobs`, { kind: 'impedance', count: 200 });
    expect(start.status).toBe(202);
    expect((await f.owner.get(`/api/jobs/${start.body.id}`)).status).toBe(404);
    const cancelled = await engineer.del(`/api/jobs/${start.body.id}`);
    expect(cancelled.status).toBe(200);
    expect(cancelled.body.status).toBe('cancelled');
    expect((await engineer.get(`/api/jobs/${start.body.id}`)).body.status).toBe('cancelled');
    expect((await reviewer.post(`/api/variants/${f.vid}/jobs`, { kind: 'impedance' })).status).toBe(403);
    expect((await engineer.post(`/api/variants/${f.vid}/jobs`, { kind: 'sweep' })).status).toBe(400);
    expect((await engineer.get('/api/jobs/not-a-uuid')).status).toBe(400);
  });

  it('refuses work beyond the queue bound with 503 solver_busy, and recovers afterwards', async () => {
    await configurePool({ maxThreads: 1, maxQueue: 1 });
    const model = demoContent().variants[1].model;
    const tasks = Array.from({ length: 4 }, () => runEngineTask({ kind: 'impedance', model, count: 10 }).then(() => 'ok', (e: { status?: number; code?: string }) => `${e.status} ${e.code}`));
    const outcomes = await Promise.all(tasks);
    expect(outcomes.filter((o) => o === 'ok').length).toBeGreaterThanOrEqual(1);
    expect(outcomes).toContain('503 solver_busy');
    await configurePool(POOL_DEFAULTS);
    const res = await engineer.post(`/api/variants/${await f.freshVariant()}/solve`, { scenarioId: 'idle' });
    expect(res.status).toBe(200);
  });
});
