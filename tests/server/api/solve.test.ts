/** Analyses over HTTP: the stateless channel solve and stored variant solves (reused while the model is unchanged). */
import { QueryTypes } from 'sequelize';
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

describe('deeply nested bodies', () => {
  it('answers 400 for a body nested thousands of levels deep (not 5xx from a stack overflow), on the channel route and elsewhere', async () => {
    const deep = '['.repeat(5000) + ']'.repeat(5000);
    const raw = (url: string, text: string) => engineer.agent.post(url).set('x-csrf-token', engineer.token).set('content-type', 'application/json').send(text);
    const channelRes = await raw('/api/solve/channel', JSON.stringify(channel).replace(/"sources":\[.*\]\}$/, `"sources":${deep}}`));
    expect(channelRes.status).toBe(400);
    expect(channelRes.body.error.message).toMatch(/nested more than 32 levels/);
    expect((await raw(`/api/variants/${f.vid}/solve`, `{"scenarioId":${deep}}`)).status).toBe(400);
    expect((await engineer.post('/api/solve/channel', channel)).status).toBe(200);
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

  it('leaves the plane maps out unless asked (maps: true / ?maps=true); maps are computed once on demand and kept', async () => {
    const id = await f.freshVariant();
    const mapsColumn = async () =>
      (await t.sequelize.query<{ maps: string | null }>('SELECT maps FROM stored_results WHERE variant_id = ?', { replacements: [id], type: QueryTypes.SELECT }))[0].maps;
    const slim = await engineer.post(`/api/variants/${id}/solve`, { scenarioId: 'boost' });
    expect(slim.status).toBe(200);
    expect(slim.body).toMatchObject({ cached: false, mapsIncluded: false });
    expect(slim.body.result.maps).toBeNull();
    expect(slim.body.result.parts.length).toBeGreaterThan(0);
    expect(await mapsColumn()).toBeNull();

    // A reviewer may read the maps of a stored result: they are derived once, then kept.
    const read = await reviewer.get(`/api/variants/${id}/results?scenarioId=boost&maps=1`);
    expect(read.body).toMatchObject({ cached: true, mapsIncluded: true, createdAt: slim.body.createdAt });
    expect(read.body.result.maps.interposer).toMatchObject({ nx: 128, ny: 128 });
    expect(read.body.result.maps.interposer.values).toHaveLength(128 * 128);
    expect(await mapsColumn()).not.toBeNull();
    expect({ ...read.body.result, maps: null }).toEqual(slim.body.result);

    const full = await engineer.post(`/api/variants/${id}/solve`, { scenarioId: 'boost', maps: true });
    expect(full.body).toMatchObject({ cached: true, mapsIncluded: true });
    expect(full.body.result).toEqual(read.body.result);
    expect(Buffer.byteLength(slim.text)).toBeLessThan(Buffer.byteLength(full.text) / 5);
    expect((await reviewer.get(`/api/variants/${id}/results?scenarioId=boost&maps=yes`)).status).toBe(400);
    expect((await engineer.post(`/api/variants/${id}/solve`, { scenarioId: 'boost', maps: 'yes' })).status).toBe(400);
  });

  it('stores one result and one activity entry when the same new solve is asked for several times at once', async () => {
    const id = await f.freshVariant();
    const answers = await Promise.all([0, 1, 2, 3].map((i) => engineer.post(`/api/variants/${id}/solve`, { scenarioId: 'idle', maps: i % 2 === 0 })));
    expect(answers.map((r) => r.status)).toEqual([200, 200, 200, 200]);
    expect(new Set(answers.map((r) => r.body.createdAt)).size).toBe(1);
    const [{ n }] = await t.sequelize.query<{ n: number }>('SELECT COUNT(*) AS n FROM stored_results WHERE variant_id = ?', { replacements: [id], type: QueryTypes.SELECT });
    expect(n).toBe(1);
    const activity = await t.sequelize.query<{ n: number }>("SELECT COUNT(*) AS n FROM activity_events WHERE variant_id = ? AND kind = 'analysis.stored'", { replacements: [id], type: QueryTypes.SELECT });
    expect(activity[0].n).toBe(1);
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
