/** The assembly network (physics.md §2) against exact limits and its own invariants. */
import { describe, expect, it } from 'vitest';
import { assemblyNetwork, solveAssembly } from '@shared/engine/assembly';
import { EngineInputError } from '@shared/engine/errors';
import { expectClose } from '../../helpers/float';
import { layer, logicPart, model, stack } from './assemblyFixtures';

const W = 0.02;
const H = 0.016;
const A = W * H;

describe('assembly: exact 1-D limit', () => {
  it('a part covering the whole footprint equals the hand-computed two-path resistance, fluids differing (exact 1-D conduction)', () => {
    const m = model(stack(W, H, 4000, 80, 35, 25), [logicPart('p', W / 2, H / 2, W, H)], { p: { power: 50 } });
    const r = solveAssembly(m, 'run');
    const up = (0.5e-3 / 148 + 50e-6 / 3 + 2e-3 / 401 + 1 / 4000) / A;
    const down = (25e-6 / 5 + 100e-6 / 148 + 80e-6 / 2 + 1e-3 / 20 + 1 / 80) / A;
    const expected = (50 + 35 / up + 25 / down) / (1 / up + 1 / down);
    expectClose(r.parts[0].junction, expected, 1e-9, 0, 'junction (series/parallel slab resistances)');
    expectClose(r.parts[0].selfResistance, 1 / (1 / up + 1 / down), 1e-9, 0, 'R_ii');
    expectClose(r.parts[0].heatUp, (expected - 35) / up, 1e-9, 0, 'heat up');
  });
});

describe('assembly invariants', () => {
  const parts = [
    logicPart('a', 0.005, 0.005, 0.006, 0.006),
    logicPart('b', 0.014, 0.006, 0.008, 0.005),
    logicPart('c', 0.011, 0.0125, 0.01, 0.004, { tim1: null }),
  ];
  const m = model(stack(W, H), parts, { a: { power: 20 }, b: { power: 12 }, c: { power: 3 } });
  const r = solveAssembly(m, 'run');

  it('energy balance: heat to both fluids equals the power', () => {
    expect(r.energyBalance.relativeError).toBeLessThan(1e-9);
    expectClose(r.energyBalance.power, 35, 1e-12, 0, 'total power');
  });

  it('reciprocity: part and node influence matrices are symmetric', () => {
    for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) expectClose(r.influence.matrix[i][j], r.influence.matrix[j][i], 1e-9, 1e-15, `R[${i}][${j}]`);
  });

  it('contributions add up to each rise; a part without lid contact sends nothing up', () => {
    r.parts.forEach((p, i) => expectClose(r.contributions[i].reduce((a, b) => a + b, 0), p.junction - p.fluidOffset, 1e-9, 1e-12, `rise of ${p.id}`));
    expect(r.parts[2].heatUp).toBe(0);
    expect(r.truncation.lid?.converged).toBe(true);
  });

  it('rotation by 90° equals swapping width and height', () => {
    const turned = model(stack(W, H), [parts[0], { ...parts[1], width: 0.005, height: 0.008, rotation: 90 }, parts[2]], { a: { power: 20 }, b: { power: 12 }, c: { power: 3 } });
    const t = solveAssembly(turned, 'run');
    r.parts.forEach((p, i) => expectClose(t.parts[i].junction, p.junction, 1e-9, 0, `junction ${p.id}`));
  });

  it('an adiabatic board side sends all heat to the lid', () => {
    const closed = solveAssembly(model(stack(W, H, 5000, 0), parts, { a: { power: 20 }, b: { power: 12 }, c: { power: 3 } }), 'run');
    expectClose(closed.energyBalance.toTop, 35, 1e-9, 0, 'heat to the top');
    expect(closed.parts[0].junction).toBeGreaterThan(r.parts[0].junction);
  });

  it('a Laplace variable s > 0 lowers every self-impedance (heat capacity absorbs heat)', () => {
    const steady = assemblyNetwork(m);
    const laplace = assemblyNetwork(m, { s: 10 });
    const n = steady.nodes.length;
    for (let i = 0; i < n; i++) expect(laplace.R[i * n + i]).toBeLessThan(steady.R[i * n + i]);
  });

  it('a part outside the interposer is refused with its path', () => {
    const bad = model(stack(W, H), [logicPart('a', 0.019, 0.005, 0.006, 0.006)], {});
    expect(() => solveAssembly(bad)).toThrow(EngineInputError);
    try {
      solveAssembly(bad);
    } catch (e) {
      expect((e as EngineInputError).path).toBe('parts[0]');
    }
  });
});

describe('memory stack ladder', () => {
  it('powered at the base only, tier temperatures fall monotonically toward the lid', () => {
    const mem = logicPart('m', W / 2, H / 2, 0.011, 0.01, {
      kind: 'memory',
      die: layer(100e-6, 148),
      memory: { tiers: 8, tier: layer(50e-6, 148), bond: layer(20e-6, 2) },
    });
    const r = solveAssembly(model(stack(W, H), [mem], { m: { power: 3 } }), 'run');
    const temps = [r.parts[0].junction, ...r.parts[0].tiers.map((t) => t.temperature)];
    expect(temps).toHaveLength(9);
    for (let k = 1; k < temps.length; k++) expect(temps[k]).toBeLessThan(temps[k - 1]);
    expect(r.tierInfluence.matrix).toHaveLength(9);
  });
});

describe('lid placement', () => {
  const parts = [logicPart('a', 0.006, 0.008, 0.006, 0.006), logicPart('b', 0.014, 0.008, 0.006, 0.006)];
  const loads = { a: { power: 20 }, b: { power: 5 } };
  const withLid = (offsetX: number, width: number) => {
    const s = stack(W, H);
    return model({ ...s, lid: { ...s.lid, width, offsetX } }, parts, loads);
  };

  it('a larger lid spreads better; an offset lid keeps the energy balance', () => {
    const same = solveAssembly(withLid(0, W), 'run');
    const larger = solveAssembly(withLid(0, W + 0.01), 'run');
    const shifted = solveAssembly(withLid(0.004, W + 0.01), 'run');
    expect(larger.parts[0].junction).toBeLessThan(same.parts[0].junction);
    expect(shifted.energyBalance.relativeError).toBeLessThan(1e-9);
    // Shifting the lid toward +x moves its centre away from part a (at low x): a gets warmer.
    expect(shifted.parts[0].junction).toBeGreaterThan(larger.parts[0].junction);
  });

  it('a part reaching outside the lid is refused with its path', () => {
    expect(() => solveAssembly(withLid(0.006, W), 'run')).toThrow(/outside the lid/);
  });
});

describe('assembly: network reuse across scenarios', () => {
  it('a scenario switch reuses the network and gives exactly the fresh answer; a moved part builds a new one (own invariant)', async () => {
    const { lx9Model } = await import('@shared/demo/lx9');
    const m = lx9Model('A');
    solveAssembly(m, 'idle');
    const reused = solveAssembly(m, 'boost');
    const fresh = solveAssembly(m, 'boost', { cache: null });
    expect(reused.parts.map((p) => [p.junction, p.peak])).toEqual(fresh.parts.map((p) => [p.junction, p.peak]));
    expect(reused.influence.matrix).toEqual(fresh.influence.matrix);
    const moved = structuredClone(m);
    moved.parts[0].x += 0.5e-3;
    const afterMove = solveAssembly(moved, 'boost');
    expect(afterMove.parts.map((p) => p.junction)).toEqual(solveAssembly(moved, 'boost', { cache: null }).parts.map((p) => p.junction));
    expect(afterMove.parts[0].junction).not.toBe(reused.parts[0].junction);
  });
});
