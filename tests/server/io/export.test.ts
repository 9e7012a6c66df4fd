/** Export routes: model JSON round trip through import, CSVs with units, netlist, role rules (reviewers may export). */
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import Papa from 'papaparse';
import { solveAssembly } from '@shared/engine/assembly/solve';
import { makeTestApp, signedIn, type Client, type TestApp } from '../helpers/testApp';
import { demoFixture, type Fixture } from '../helpers/fixtures';

vi.mock('../../../server/api/routes', async (importOriginal) => (await import('./mountIo')).withIoRoutes(importOriginal as never));

let t: TestApp;
let f: Fixture;
let reviewer: Client;
let engineer: Client;
beforeAll(async () => {
  t = await makeTestApp();
  f = await demoFixture(t);
  reviewer = await signedIn(t.app, 'reviewer');
  engineer = await signedIn(t.app, 'engineer');
});
afterAll(async () => t.dispose());

const text = (res: { text: string }) => res.text;

describe('exports', () => {
  it('model JSON: attachment with units header; importing it gives a variant with an identical model and solve', async () => {
    const res = await reviewer.get(`/api/variants/${f.vid}/export.json`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="?[a-z0-9-]+\.heatloom\.json"?$/);
    const file = JSON.parse(text(res));
    expect(file.header.units.length).toBe('m');
    expect(file.header.source.project).toBeTruthy();

    const imported = await engineer.post(`/api/assemblies/${f.aid}/import`, { model: file, name: 'Round trip' });
    expect(imported.status).toBe(201);
    expect(imported.body.name).toBe('Round trip');
    const original = (await engineer.get(`/api/variants/${f.vid}`)).body.model;
    expect(imported.body.model).toEqual(original);
    const a = solveAssembly(original, 'boost', { mapSize: 16 });
    const b = solveAssembly(imported.body.model, 'boost', { mapSize: 16 });
    expect(b.parts.map((p) => p.junction)).toEqual(a.parts.map((p) => p.junction));
  });

  it('matrix CSV states R (K/W) in its header row; kinds and scenario choose the matrix', async () => {
    const res = await reviewer.get(`/api/variants/${f.vid}/export/matrix.csv`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    const rows = Papa.parse<string[]>(text(res).trimEnd()).data;
    expect(rows[0][0]).toMatch(/^R \(K\/W\)/);
    expect(rows.length).toBe(rows[0].length);
    const c = await reviewer.get(`/api/variants/${f.vid}/export/matrix.csv?kind=contribution&scenario=idle`);
    expect(Papa.parse<string[]>(text(c)).data[0][0]).toMatch(/^ΔT \(K\).*idle/i);
    expect((await reviewer.get(`/api/variants/${f.vid}/export/matrix.csv?kind=bogus`)).status).toBe(400);
  });

  it('temperatures CSV: all scenarios by default, one with ?scenario=, 400 for an unknown scenario', async () => {
    const all = Papa.parse<string[]>(text(await reviewer.get(`/api/variants/${f.vid}/export/temperatures.csv`)).trimEnd()).data;
    expect(all[0]).toContain('mean temperature (°C)');
    const scenarios = new Set(all.slice(1).map((r) => r[0]));
    expect(scenarios.size).toBeGreaterThan(1);
    const boost = Papa.parse<string[]>(text(await reviewer.get(`/api/variants/${f.vid}/export/temperatures.csv?scenario=boost`)).trimEnd()).data;
    expect(new Set(boost.slice(1).map((r) => r[0]))).toEqual(new Set(['boost']));
    const bad = await reviewer.get(`/api/variants/${f.vid}/export/temperatures.csv?scenario=nope`);
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toMatch(/no scenario "nope"/);
  });

  it('temperatures CSV agrees with the solve answer to the written digits, and an export stores nothing (own invariant)', async () => {
    const id = await f.freshVariant();
    const before = await reviewer.get(`/api/variants/${id}/export/temperatures.csv?scenario=boost`);
    expect((await reviewer.get(`/api/variants/${id}/results?scenarioId=boost`)).status).toBe(404);
    const solved = (await engineer.post(`/api/variants/${id}/solve`, { scenarioId: 'boost' })).body.result;
    const after = await reviewer.get(`/api/variants/${id}/export/temperatures.csv?scenario=boost`);
    expect(after.text).toBe(before.text);
    const rows = Papa.parse<string[]>(after.text.trimEnd()).data;
    const header = rows[0];
    const peakCol = header.findIndex((h) => h.startsWith('hot spot'));
    const first = rows.find((r) => r[1] === solved.parts[0].id || r[2] === solved.parts[0].name)!;
    expect(Number(first[peakCol])).toBe(Number(solved.parts[0].peak.toPrecision(10)));
  });

  it('netlist: a SPICE text file with units and caution', async () => {
    const res = await reviewer.get(`/api/variants/${f.vid}/export/netlist.cir?scenario=boost`);
    expect(res.status).toBe(200);
    expect(res.headers['content-disposition']).toMatch(/\.cir"?$/);
    expect(text(res)).toMatch(/1 V = 1 degC/);
    expect(text(res)).toMatch(/CAUTION/);
    expect(text(res).trimEnd().endsWith('.end')).toBe(true);
  });

  it('exports need a signed-in member: 401 signed out, 404 for unknown variants', async () => {
    const anon = await import('../helpers/testApp').then((m) => new m.Client(t.app));
    expect((await anon.get(`/api/variants/${f.vid}/export.json`)).status).toBe(401);
    expect((await reviewer.get('/api/variants/999999/export.json')).status).toBe(404);
  });
});
