/** Model JSON file: header with units, round trip to an identical model and solve, readable issues with paths. */
import { describe, expect, it } from 'vitest';
import { lx9Model } from '@shared/demo/lx9';
import { solveAssembly } from '@shared/engine/assembly/solve';
import { MODEL_UNITS, modelToJson, readModelFile } from '@shared/export';

const source = { project: 'LX-9', assembly: 'Module', variant: 'A', version: 2 };

describe('model JSON file', () => {
  it('starts with a header stating SI units, the source and the caution', () => {
    const text = modelToJson(lx9Model('A'), source, new Date('2026-03-04T05:06:07Z'));
    const obj = JSON.parse(text);
    expect(Object.keys(obj)[0]).toBe('header');
    expect(obj.header.units).toEqual(MODEL_UNITS);
    expect(obj.header.units.length).toBe('m');
    expect(obj.header.source).toEqual(source);
    expect(obj.header.caution).toMatch(/JESD51/);
    expect(obj.units).toBe('SI');
  });

  it('reads back to an identical model whose solve is identical (round trip)', () => {
    const model = lx9Model('B');
    const read = readModelFile(modelToJson(model, source));
    expect(read.ok).toBe(true);
    if (!read.ok) return;
    expect(read.model).toEqual(model);
    expect(read.header?.source?.variant).toBe('A');
    const a = solveAssembly(model, 'boost', { mapSize: 16 });
    const b = solveAssembly(read.model, 'boost', { mapSize: 16 });
    expect(b.parts.map((p) => p.junction)).toEqual(a.parts.map((p) => p.junction));
    expect(b.influence.matrix).toEqual(a.influence.matrix);
  });

  it('accepts a bare model without header', () => {
    const read = readModelFile(JSON.stringify(lx9Model('C')));
    expect(read.ok).toBe(true);
  });

  it('reports bad JSON, wrong units and schema errors with field paths', () => {
    const bad = readModelFile('{"parts": [');
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.issues[0].message).toMatch(/not valid JSON/);

    const obj = JSON.parse(modelToJson(lx9Model('A'), source));
    obj.header.units.length = 'mm';
    obj.parts[1].width = -3;
    delete obj.stack.cooling;
    const read = readModelFile(JSON.stringify(obj));
    expect(read.ok).toBe(false);
    if (read.ok) return;
    const paths = read.issues.map((i) => i.path);
    expect(paths).toContain('header.units.length');
    expect(paths).toContain('parts[1].width');
    expect(paths).toContain('stack.cooling');
  });

  it('finds references a schema cannot check: duplicate ids, loads of unknown parts, too many tier powers', () => {
    const m = lx9Model('A');
    m.parts[1].id = m.parts[0].id;
    m.scenarios[0].loads.ghost = { power: 3 };
    const mem = m.parts.find((p) => p.kind === 'memory')!;
    m.scenarios[1].loads[mem.id] = { power: 1, tiers: Array(12).fill(0.1) };
    const read = readModelFile(JSON.stringify(m));
    expect(read.ok).toBe(false);
    if (read.ok) return;
    const text = read.issues.map((i) => `${i.path}: ${i.message}`).join('\n');
    expect(text).toMatch(/Two or more parts have the id/);
    expect(text).toMatch(/scenarios\[0\]\.loads\.ghost/);
    expect(text).toMatch(/tier powers/);
  });

  it('rejects something that is not a model object', () => {
    for (const text of ['[]', '42', '{"format": "other-tool"}']) expect(readModelFile(text).ok).toBe(false);
  });
});
