/** Placement rules: overlap, outside the interposer, minimum gap (0.2 mm, common practice), larger than the interposer. */
import { describe, expect, test } from 'vitest';
import { checkLayout } from '@shared/layout/rules';
import type { Part } from '@shared/schemas/model';

const layer = { thickness: 1e-4, kxy: 100, kz: 100 };
const part = (id: string, x: number, y: number, w = 0.01, h = 0.01, rotation: Part['rotation'] = 0): Part => ({
  id, name: id, kind: 'compute', x, y, width: w, height: h, rotation, die: layer, tim1: layer, bumps: layer, limits: { junction: 105 },
});
const stack = { interposer: { width: 0.046, height: 0.034, layers: [layer] } } as never;
const layout = (parts: Part[], minGap = 0.0002) => checkLayout({ parts, stack, settings: { minGap, snap: 1e-4 } });

describe('checkLayout', () => {
  test('two parts 1 mm apart inside the interposer break no rule', () => {
    expect(layout([part('a', 0.01, 0.01), part('b', 0.021, 0.01)])).toEqual([]);
  });
  test('overlap is reported once, naming both parts', () => {
    const v = layout([part('a', 0.01, 0.01), part('b', 0.015, 0.01)]);
    expect(v.map((x) => x.rule)).toEqual(['overlap']);
    expect(v[0].partIds).toEqual(['a', 'b']);
  });
  test('parts closer than the minimum gap are flagged, touching is a gap of 0', () => {
    expect(layout([part('a', 0.01, 0.01), part('b', 0.0201, 0.01)]).map((x) => x.rule)).toEqual(['gap']);
    expect(layout([part('a', 0.01, 0.01), part('b', 0.02, 0.01)]).map((x) => x.rule)).toEqual(['gap']);
    expect(layout([part('a', 0.01, 0.01), part('b', 0.0201, 0.01)], 0)).toEqual([]);
  });
  test('a part reaching past the edge is outside; rotation swaps its footprint', () => {
    expect(layout([part('a', 0.004, 0.01)]).map((x) => x.rule)).toEqual(['outside']);
    expect(layout([part('a', 0.008, 0.02, 0.016, 0.004)])).toEqual([]);
    expect(layout([part('a', 0.008, 0.02, 0.016, 0.004, 90)]).map((x) => x.rule)).toEqual([]);
    expect(layout([part('a', 0.008, 0.005, 0.016, 0.004, 90)]).map((x) => x.rule)).toEqual(['outside']);
  });
  test('a part larger than the interposer says so', () => {
    expect(layout([part('a', 0.023, 0.017, 0.05, 0.01)]).map((x) => x.rule)).toEqual(['too-large']);
  });
});
