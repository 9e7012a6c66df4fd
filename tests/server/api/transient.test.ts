/** Stored transient analyses over HTTP: a scenario's timeline and timing answers, reused while the model is unchanged. */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Client, makeTestApp, signedIn, type TestApp } from '../helpers/testApp';
import { demoFixture, type Fixture } from '../helpers/fixtures';

let t: TestApp;
let f: Fixture;
let engineer: Client;
beforeAll(async () => {
  t = await makeTestApp();
  f = await demoFixture(t);
  engineer = await signedIn(t.app, 'engineer');
});
afterAll(async () => t.dispose());

describe('POST /api/variants/:vid/timeline and /timing', () => {
  it('simulates the boost pulse profile once and then answers from the store', async () => {
    const first = await engineer.post(`/api/variants/${f.vid}/timeline`, { scenarioId: 'boost' });
    expect(first.status).toBe(200);
    expect(first.body.cached).toBe(false);
    const sim = first.body.result as { status: string; times: number[]; temperatures: number[][] };
    expect(sim.status).toBe('complete');
    expect(sim.times.length).toBeGreaterThan(10);
    // Pulses on a warm start: every node stays above the 40 °C coolant (demo model, product.md).
    for (const row of sim.temperatures) expect(Math.min(...row)).toBeGreaterThan(40);
    const again = await engineer.post(`/api/variants/${f.vid}/timeline`, { scenarioId: 'boost' });
    expect(again.body.cached).toBe(true);
    expect(again.body.inputHash).toBe(first.body.inputHash);
  });

  it('answers how long a compute die may boost, as a sentence with numbers', async () => {
    const res = await engineer.post(`/api/variants/${f.vid}/timing`, { partId: 'cpu-w', scenarioId: 'boost', boostPower: 145, startFrom: 'idle', period: 0.1 });
    expect(res.status).toBe(200);
    const answers = res.body.result as { boost: { sentence: string; time: number | null } };
    expect(answers.boost.sentence).toMatch(/°C/);
    expect(answers.boost.time === null || answers.boost.time > 0).toBe(true);
  });

  it('refuses an unknown part or scenario with the field named, and a bad body with 400', async () => {
    const part = await engineer.post(`/api/variants/${f.vid}/timing`, { partId: 'nope', boostPower: 10 });
    expect(part.status).toBe(400);
    expect(JSON.stringify(part.body)).toContain('partId');
    const scen = await engineer.post(`/api/variants/${f.vid}/timeline`, { scenarioId: 'nope' });
    expect(scen.status).toBe(400);
    const bad = await engineer.post(`/api/variants/${f.vid}/timing`, { partId: 'cpu-w', boostPower: 'lots' });
    expect(bad.status).toBe(400);
  });
});
