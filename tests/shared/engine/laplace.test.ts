/** The Laplace variable s in the channel (physics.md §3): limits with independent closed forms. */
import { describe, it } from 'vitest';
import { channelInfluence } from '@shared/engine/channel';
import { expectClose } from '../../helpers/float';

const K = 148;
const RHO = 2330;
const CP = 712;
const ALPHA = K / (RHO * CP);

describe('Laplace-domain flux channel', () => {
  it('a full-face source on a thick slab gives the semi-infinite solid: θ(s) = q/(k·√(s/α)) (Carslaw & Jaeger 1959)', () => {
    const L = 0.01;
    const channel = { lx: L, ly: L, above: { layers: [{ thickness: 0.05, kxy: K, kz: K, rho: RHO, cp: CP }], h: 1000 }, below: { layers: [], h: 0 } };
    for (const s of [10, 100, 1000]) {
      const r = channelInfluence(channel, [{ x: L / 2, y: L / 2, width: L, height: L }], { s, truncation: { m: 4, n: 4 }, cache: null });
      expectClose(r.matrix[0][0] * L * L, 1 / (K * Math.sqrt(s / ALPHA)), 1e-9, 0, `s = ${s} (semi-infinite solid, Carslaw & Jaeger)`);
    }
  });

  it('a thin slab behaves as a lumped capacitance in parallel with h: θ(s) = 1/(h + s·ρc·t) per area (Incropera & DeWitt, ch. 5)', () => {
    const L = 0.01;
    const t = 1e-5;
    const channel = { lx: L, ly: L, above: { layers: [{ thickness: t, kxy: K, kz: K, rho: RHO, cp: CP }], h: 500 }, below: { layers: [], h: 0 } };
    const s = 20;
    const r = channelInfluence(channel, [{ x: L / 2, y: L / 2, width: L, height: L }], { s, truncation: { m: 4, n: 4 }, cache: null });
    expectClose(r.matrix[0][0] * L * L, 1 / (500 + s * RHO * CP * t), 1e-4, 0, 'lumped capacitance (Incropera & DeWitt ch. 5)');
  });

  it('s → 0 recovers the steady influence matrix', () => {
    const channel = {
      lx: 0.02,
      ly: 0.02,
      above: { layers: [{ thickness: 1e-3, kxy: K, kz: K, rho: RHO, cp: CP }], h: 3000 },
      below: { layers: [{ thickness: 1e-3, kxy: 20, kz: 2, rho: 2000, cp: 900 }], h: 50 },
    };
    const sources = [
      { x: 0.006, y: 0.006, width: 0.004, height: 0.004 },
      { x: 0.014, y: 0.012, width: 0.005, height: 0.003 },
    ];
    const truncation = { m: 80, n: 80 };
    const steady = channelInfluence(channel, sources, { truncation, cache: null });
    const tiny = channelInfluence(channel, sources, { truncation, s: 1e-9, cache: null });
    for (let k = 0; k < 4; k++) expectClose(tiny.flat[k], steady.flat[k], 1e-6, 0, `entry ${k} (continuity in s)`);
  });
});
