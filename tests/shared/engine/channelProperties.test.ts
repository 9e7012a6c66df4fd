/** Properties any correct flux channel has: reciprocity, linearity, energy balance; and the truncation search. */
import { describe, expect, it } from 'vitest';
import { channelInfluence, meanRises } from '@shared/engine/channel';
import { solveChannelRequest } from '@shared/engine/channelRequest';
import { fieldMap, modalTemperatures, pointValue } from '@shared/engine/field';
import type { Channel, RectSource } from '@shared/engine/types';
import { expectClose } from '../../helpers/float';

const CHANNEL: Channel = {
  lx: 0.03,
  ly: 0.02,
  above: { layers: [{ thickness: 0.3e-3, kxy: 148, kz: 148 }, { thickness: 50e-6, kxy: 3, kz: 3 }, { thickness: 1.5e-3, kxy: 390, kz: 390 }], h: 8000 },
  below: { layers: [{ thickness: 1e-3, kxy: 30, kz: 0.8, contactResistance: 5e-6 }], h: 40 },
};
const SOURCES: RectSource[] = [
  { x: 0.008, y: 0.01, width: 0.006, height: 0.008 },
  { x: 0.02, y: 0.006, width: 0.004, height: 0.003 },
  { x: 0.024, y: 0.015, width: 0.008, height: 0.005 },
];

describe('flux channel properties', () => {
  const inf = channelInfluence(CHANNEL, SOURCES, { cache: null });

  it('reciprocity: the influence matrix is symmetric (physics.md §1)', () => {
    for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) expectClose(inf.matrix[i][j], inf.matrix[j][i], 1e-12, 0, `R[${i}][${j}]`);
  });

  it('superposition: rises are linear in the powers', () => {
    const a = meanRises(inf.flat, [10, 0, 0]);
    const b = meanRises(inf.flat, [0, 3, 7]);
    const ab = meanRises(inf.flat, [10, 3, 7]);
    for (let j = 0; j < 3; j++) expectClose(ab[j], a[j] + b[j], 1e-12, 0, `rise ${j}`);
  });

  it('the automatic truncation converged and a finer fixed one agrees to its tolerance', () => {
    expect(inf.truncation.converged).toBe(true);
    const fine = channelInfluence(CHANNEL, SOURCES, { truncation: { m: 2 * inf.truncation.m, n: 2 * inf.truncation.n }, cache: null });
    for (let i = 0; i < 3; i++) expectClose(inf.matrix[i][i], fine.matrix[i][i], 1e-4, 0, `R[${i}][${i}]`);
  });

  it('the map (folded DCT) equals the direct point sum at cell centres', () => {
    const { m, n } = inf.truncation;
    const theta = modalTemperatures(inf.modes, [5, 2, 1]);
    const map = fieldMap(theta, m, n, CHANNEL.lx, CHANNEL.ly, 16, 8);
    for (const [ix, iy] of [[0, 0], [5, 3], [15, 7], [9, 4]]) {
      const direct = pointValue(theta, m, n, CHANNEL.lx, CHANNEL.ly, (ix + 0.5) * map.dx, (iy + 0.5) * map.dy);
      expectClose(map.values[iy * 16 + ix], direct, 1e-9, 1e-12, `cell ${ix},${iy}`);
    }
  });
});

describe('solveChannelRequest', () => {
  const body = {
    footprint: { x: CHANNEL.lx, y: CHANNEL.ly },
    above: { layers: [{ thickness: 0.3e-3, k: 148 }, { thickness: 50e-6, k: 3 }, { thickness: 1.5e-3, k: 390 }], h: 8000 },
    below: { layers: [{ thickness: 1e-3, kxy: 30, kz: 0.8, contactResistance: 5e-6 }], h: 40 },
    sources: SOURCES.map((s, i) => ({ ...s, power: [10, 3, 7][i] })),
  };

  it('energy balance: Q_up + Q_down = P to 1e-6, and Q_up = P·Z00/Z00,up (physics.md §1)', () => {
    const r = solveChannelRequest(body);
    expect(r.energyBalance.relativeError).toBeLessThan(1e-6);
    const up = 0.3e-3 / 148 + 50e-6 / 3 + 1.5e-3 / 390 + 1 / 8000;
    const down = 5e-6 + 1e-3 / 0.8 + 1 / 40;
    expectClose(r.energyBalance.up, (20 * down) / (up + down), 1e-12, 0, 'heat to the top (1-D split of the (0,0) mode)');
  });

  it('peak rise is at least the mean rise, and inside each rectangle', () => {
    const r = solveChannelRequest(body);
    r.peakRise.forEach((p, i) => {
      expect(p).toBeGreaterThanOrEqual(r.rise[i] * (1 - 1e-9));
      const s = SOURCES[i];
      expect(Math.abs(r.peakAt[i].x - s.x)).toBeLessThanOrEqual(s.width / 2 + 1e-12);
      expect(Math.abs(r.peakAt[i].y - s.y)).toBeLessThanOrEqual(s.height / 2 + 1e-12);
    });
  });

  it('an isolated centred square peaks at its centre', () => {
    const r = solveChannelRequest({ ...body, sources: [{ x: 0.015, y: 0.01, width: 0.004, height: 0.004, power: 5 }] });
    expectClose(r.peakAt[0].x, 0.015, 1e-3, 0, 'peak x (symmetry)');
    expectClose(r.peakAt[0].y, 0.01, 1e-3, 0, 'peak y (symmetry)');
  });

  it.each([
    [{ above: { layers: [{ thickness: -1e-3, k: 1 }], h: 10 } }, 'above.layers[0].thickness'],
    [{ above: { layers: [{ thickness: 1e-3, k: 0 }], h: 10 } }, 'above.layers[0].k'],
    [{ above: { layers: [], h: 0 }, below: { layers: [], h: 0 } }, 'above.h'],
    [{ sources: [{ x: 0.029, y: 0.01, width: 0.004, height: 0.004, power: 1 }] }, 'sources[0]'],
    [{ footprint: { x: Number.NaN, y: 0.02 } }, 'footprint.x'],
    [{ footprint: { x: Number.POSITIVE_INFINITY, y: 0.02 } }, 'footprint.x'],
    [{ truncation: { m: 4000, n: 4000 } }, 'truncation'],
    [{ truncation: { m: 1e9, n: 1 } }, 'truncation.m'],
    [{ times: [0.1, 0.05] }, 'times'],
  ])('rejects bad input %# with a field path', (patch, path) => {
    try {
      solveChannelRequest({ ...body, ...patch });
      expect.unreachable('should have thrown');
    } catch (e) {
      expect((e as Error).name).toBe('EngineInputError');
      expect((e as { path: string }).path).toBe(path);
      expect((e as Error).message.length).toBeGreaterThan(10);
    }
  });
});

describe('solveChannelRequest map', () => {
  it('returns the requested source-plane map whose hottest cell lies on the hottest source', () => {
    const r = solveChannelRequest({
      footprint: { x: 0.02, y: 0.01 },
      above: { layers: [{ thickness: 1e-3, k: 150 }], h: 5000 },
      below: { layers: [], h: 0 },
      sources: [{ x: 0.005, y: 0.005, width: 0.003, height: 0.003, power: 10 }, { x: 0.015, y: 0.005, width: 0.003, height: 0.003, power: 1 }],
      map: { nx: 32, ny: 16 },
    });
    expect(r.map?.values).toHaveLength(32 * 16);
    const values = r.map!.values;
    const hottest = values.indexOf(Math.max(...values));
    expect(((hottest % 32) + 0.5) * r.map!.dx).toBeLessThan(0.01);
    expect(Math.max(...values)).toBeLessThanOrEqual(r.peakRise[0] * (1 + 1e-9));
  });
});
