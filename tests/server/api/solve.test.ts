/** Analyses over HTTP: the stateless channel solve and stored variant solves (reused while the model is unchanged). */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client, makeTestApp, signedIn, type TestApp } from '../helpers/testApp';
import { demoFixture, type Fixture } from '../helpers/fixtures';
import { expectClose } from '../../helpers/float';

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
afterAll(async () => t.dispose());

const channel = {
  footprint: { x: 0.02, y: 0.02 },
  above: { layers: [{ thickness: 5e-4, k: 150 }], h: 5000 },
  below: { layers: [{ thickness: 1e-3, k: 1 }], h: 50 },
  sources: [{ x: 0.01, y: 0.01, width: 0.005, height: 0.005, power: 10 }],
};

describe('POST /api/solve/channel', () => {
  it('solves for a signed-in user; the heat leaving both faces equals the power (first law)', async () => {
    const res = await reviewer.post('/api/solve/channel', channel);
    expect(res.status).toBe(200);
    expect(res.body.matrix).toHaveLength(1);
    expectClose(res.body.energyBalance.up + res.body.energyBalance.down, 10, 1e-6, 0, 'up + down (W), energy conservation');
  });

  it('answers 400 with the field path for bad engine input, 401 when signed out', async () => {
    const bad = await engineer.post('/api/solve/channel', { ...channel, above: { layers: [{ thickness: -1, k: 150 }], h: 5000 } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.code).toBe('engine_input');
    expect(bad.body.error.details.issues[0].path).toBe('above.layers[0].thickness');
    const anon = new Client(t.app);
    await anon.csrf();
    expect((await anon.post('/api/solve/channel', channel)).status).toBe(401);
  });
});

describe('POST /api/variants/:vid/solve', () => {
  it('solves once per unchanged model and scenario, then reuses the stored result', async () => {
    const id = await f.freshVariant();
    expect((await reviewer.get(`/api/variants/${id}/results?scenarioId=idle`)).status).toBe(404);
    const first = await engineer.post(`/api/variants/${id}/solve`, { scenarioId: 'idle' });
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ cached: false, scenarioId: 'idle', version: 1 });
    expect(first.body.result.parts.length).toBeGreaterThan(0);
    const again = await engineer.post(`/api/variants/${id}/solve`, { scenarioId: 'idle' });
    expect(again.body.cached).toBe(true);
    expect(again.body.inputHash).toBe(first.body.inputHash);
    const read = await reviewer.get(`/api/variants/${id}/results?scenarioId=idle`);
    expect(read.status).toBe(200);
    expect(read.body.result).toEqual(first.body.result);

    const v = (await engineer.get(`/api/variants/${id}`)).body;
    const model = structuredClone(v.model);
    model.stack.cooling.top.h = 8000;
    await engineer.put(`/api/variants/${id}`, { model, version: v.version });
    const after = await engineer.post(`/api/variants/${id}/solve`, { scenarioId: 'idle' });
    expect(after.body.cached).toBe(false);
    expect(after.body.inputHash).not.toBe(first.body.inputHash);
  });

  it('lets reviewers read but not run (403), rejects an unknown scenario (400)', async () => {
    expect((await reviewer.post(`/api/variants/${f.vid}/solve`, {})).status).toBe(403);
    const bad = await engineer.post(`/api/variants/${f.vid}/solve`, { scenarioId: 'no-such-case' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details.issues[0].path).toBe('scenarioId');
  });

  it('answers 400 (engine_input) for a model with no cooled face', async () => {
    const id = await f.freshVariant();
    const v = (await engineer.get(`/api/variants/${id}`)).body;
    const model = structuredClone(v.model);
    model.stack.cooling.top.h = 0;
    model.stack.cooling.bottom.h = 0;
    expect((await engineer.put(`/api/variants/${id}`, { model, version: v.version })).status).toBe(200);
    const res = await engineer.post(`/api/variants/${id}/solve`, { scenarioId: 'idle' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('engine_input');
  });
});
