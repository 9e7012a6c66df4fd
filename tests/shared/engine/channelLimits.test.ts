/** Flux channel against exact limits: 1-D slab, point source far field, disc-free checks of the (0,0) mode. */
import { describe, it } from 'vitest';
import { channelInfluence } from '@shared/engine/channel';
import { modalTemperatures, pointValue } from '@shared/engine/field';
import type { Channel } from '@shared/engine/types';
import { expectClose } from '../../helpers/float';

describe('1-D limit: a source covering the whole face (physics.md §5, exact)', () => {
  it('one cooled side: (Σ t/k + Σ r + 1/h)/(Lx Ly)', () => {
    const channel: Channel = {
      lx: 0.02,
      ly: 0.015,
      above: {
        layers: [
          { thickness: 0.5e-3, kxy: 148, kz: 100, contactResistance: 2e-6 },
          { thickness: 2e-3, kxy: 401, kz: 401 },
        ],
        h: 3000,
      },
      below: { layers: [], h: 0 },
    };
    const r = channelInfluence(channel, [{ x: 0.01, y: 0.0075, width: 0.02, height: 0.015 }]).matrix[0][0];
    const perArea = 0.5e-3 / 100 + 2e-6 + 2e-3 / 401 + 1 / 3000;
    expectClose(r, perArea / (0.02 * 0.015), 1e-12, 0, 'slab resistance (exact 1-D conduction)');
  });

  it('two cooled sides in parallel, contact resistance below counted once', () => {
    const channel: Channel = {
      lx: 0.01,
      ly: 0.01,
      above: { layers: [{ thickness: 1e-3, kxy: 10, kz: 10 }], h: 1000 },
      below: { layers: [{ thickness: 2e-3, kxy: 20, kz: 5, contactResistance: 1e-5 }], h: 200 },
    };
    const r = channelInfluence(channel, [{ x: 0.005, y: 0.005, width: 0.01, height: 0.01 }]).matrix[0][0];
    const up = 1e-3 / 10 + 1 / 1000;
    const down = 1e-5 + 2e-3 / 5 + 1 / 200;
    expectClose(r, 1 / (1 / up + 1 / down) / 1e-4, 1e-12, 0, 'parallel slab resistances (exact 1-D conduction)');
  });
});

describe('point source far field on a half-space: ΔT = P/(2πkr) (Carslaw & Jaeger, Conduction of Heat in Solids, 1959)', () => {
  it('differences between radii match (the finite block adds a near-uniform offset)', () => {
    const k = 50;
    const a = 0.2e-3;
    const L = 40e-3;
    const channel: Channel = { lx: L, ly: L, above: { layers: [{ thickness: L, kxy: k, kz: k }], h: 1e9 }, below: { layers: [], h: 0 } };
    const inf = channelInfluence(channel, [{ x: L / 2, y: L / 2, width: a, height: a }], { truncation: { m: 1000, n: 1000 } });
    const theta = modalTemperatures(inf.modes, [1]);
    const at = (r: number): number => pointValue(theta, 1000, 1000, L, L, L / 2 + r, L / 2);
    const r1 = 10 * a;
    const r2 = 20 * a;
    const expected = (1 / (2 * Math.PI * k)) * (1 / r1 - 1 / r2);
    expectClose(at(r1) - at(r2), expected, 0.01, 0, 'P/(2πk)(1/r1 − 1/r2), Carslaw & Jaeger');
  });
});
