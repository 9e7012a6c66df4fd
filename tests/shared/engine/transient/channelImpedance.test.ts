import { describe, expect, it } from 'vitest';
import { EngineInputError } from '@shared/engine/errors';
import { channelImpedance, solveChannelTransient } from '@shared/engine/transient';
import { expectClose } from '../../../helpers/float';

// Silicon at 300 K: k 148 W/m·K, ρ 2330 kg/m³, c_p 712 J/kg·K (Incropera & DeWitt, Table A.1)
const [k, rho, cp] = [148, 2330, 712];
const alpha = k / (rho * cp);

describe('channel impedance against outside references', () => {
  it('early time: constant flux on a semi-infinite solid, (2q/k)√(αt/π) (Carslaw & Jaeger; Incropera & DeWitt)', () => {
    const [L, a] = [0.04, 0.01];
    const channel = { lx: L, ly: L, above: { layers: [], h: 0 }, below: { layers: [{ thickness: 0.02, kxy: k, kz: k, rho, cp }], h: 1e4 } };
    const times = [1e-5, 1e-4];
    const r = channelImpedance(channel, [{ x: L / 2, y: L / 2, width: a, height: a }], times, { truncation: { m: 400, n: 400 } });
    times.forEach((t, i) => {
      const oneD = (2 / (a * a * k)) * Math.sqrt((alpha * t) / Math.PI);
      // edge loss of a square a×a: the product of 1-D strip solutions (Carslaw & Jaeger 1959, ch. 10)
      // expanded to first order in √(αt)/a gives the factor 1 − (2/√π)·√(αt)/a (our algebra)
      const edge = 1 - (2 / Math.sqrt(Math.PI)) * (Math.sqrt(alpha * t) / a);
      expectClose(r.impedance[i][0][0], oneD * edge, 1e-3, 0, `Z(${t})`);
    });
  });

  it('a thin, highly conductive plate follows the lumped P·R(1 − e^{−t/RC}) (Incropera & DeWitt ch. 5, Bi ≪ 0.1)', () => {
    // copper 1 mm, 10 × 10 mm, h = 100 W/m²K on its top: Bi = h·t/k ≈ 2.5e-4
    const [Lc, t, h] = [0.01, 0.001, 100];
    const channel = { lx: Lc, ly: Lc, above: { layers: [{ thickness: t, kxy: 401, kz: 401, rho: 8933, cp: 385 }], h }, below: { layers: [], h: 0 } };
    const times = [3, 10, 30, 100];
    const r = channelImpedance(channel, [{ x: Lc / 2, y: Lc / 2, width: Lc, height: Lc }], times);
    const [R, C] = [1 / (h * Lc * Lc), 8933 * 385 * t * Lc * Lc];
    times.forEach((s, i) => expectClose(r.impedance[i][0][0], R * (1 - Math.exp(-s / (R * C))), 2e-3, 0, `Z(${s})`));
  });

  it('two sources: reciprocity at every time, causality, monotone self-impedance, steady limit', () => {
    const L = 0.02;
    const channel = { lx: L, ly: L, above: { layers: [{ thickness: 0.0005, kxy: 148, kz: 148, rho, cp }], h: 2e4 }, below: { layers: [], h: 0 } };
    const times = Array.from({ length: 30 }, (_, q) => 1e-6 * 2 ** (q / 1.2));
    const r = channelImpedance(channel, [{ x: 0.005, y: 0.006, width: 0.004, height: 0.003 }, { x: 0.013, y: 0.012, width: 0.005, height: 0.006 }], times);
    r.impedance.forEach((Z, q) => expectClose(Z[0][1], Z[1][0], 1e-10, 1e-15, `reciprocity at ${times[q]}`));
    for (const j of [0, 1]) {
      expect(r.impedance[0][j][j] / r.steady[j][j]).toBeLessThan(1e-2);
      // non-decreasing up to Stehfest round-off (weights ~1e8 times double precision: ~1e-5 of R, from memory)
      for (let q = 1; q < times.length; q++) expect(r.impedance[q][j][j]).toBeGreaterThanOrEqual(r.impedance[q - 1][j][j] - 1e-5 * r.steady[j][j]);
      expectClose(r.impedance[times.length - 1][j][j], r.steady[j][j], 1e-3, 0, 'settled');
    }
  });
});

describe('channel transient request', () => {
  const body = {
    footprint: { x: 0.01, y: 0.01 },
    above: { layers: [{ thickness: 0.0005, k: 148, rho, cp }], h: 1e4 },
    below: { layers: [], h: 0 },
    sources: [{ x: 0.005, y: 0.005, width: 0.002, height: 0.002, power: 1 }],
    times: [1e-4, 1e-3, 1e-2],
  };
  it('returns impedance[k][j][i] for the requested times', () => {
    const r = solveChannelTransient(body);
    expect(r.impedance).toHaveLength(3);
    expect(r.impedance[0]).toHaveLength(1);
    expect(r.impedance[2][0][0]).toBeGreaterThan(r.impedance[0][0][0]);
  });
  it('missing rho·cp where a transient is asked → a typed error naming the layer', () => {
    const bad = { ...body, above: { layers: [{ thickness: 0.0005, k: 148 }], h: 1e4 } };
    expect(() => solveChannelTransient(bad)).toThrow(EngineInputError);
    try {
      solveChannelTransient(bad);
    } catch (e) {
      expect((e as EngineInputError).path).toBe('above.layers[0].rho');
    }
  });
  it('non-increasing times → a typed error', () => {
    expect(() => solveChannelTransient({ ...body, times: [1e-3, 1e-3] })).toThrow(EngineInputError);
  });
});
