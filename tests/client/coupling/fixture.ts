/** A small hand-made assembly result (invented numbers) for component tests: two logic parts and a two-tier memory stack. */
import type { AssemblyResult, PartResult } from '@shared/engine';

const map = (value: number) => ({ nx: 2, ny: 2, x0: 0, y0: 0, dx: 0.01, dy: 0.01, values: [value, value + 1, value + 2, value + 3] });

function part(id: string, name: string, kind: PartResult['kind'], extra: Partial<PartResult>): PartResult {
  return {
    id, name, kind, power: 0, junction: 40, peak: 40, peakAt: { x: 0, y: 0 }, tiers: [], heatUp: 0, heatDown: 0,
    selfResistance: 0, couplingShare: 0, fluidOffset: 40, limit: 105, extendedLimit: null, margin: 0, ...extra,
  };
}

/**
 * Influence (K/W) and powers (W) chosen by hand: P = [100, 10, 2 (base 1 + tiers 0.5 + 0.5)].
 * contributions[i][j] = Σ over j's nodes of R·P, written out below.
 */
export function smallResult(): AssemblyResult {
  const influence = [
    [0.4, 0.05, 0.1],
    [0.05, 0.8, 0.2],
    [0.1, 0.2, 1.0],
  ];
  const contributions = [
    [40, 0.5, 0.2],
    [5, 8, 0.4],
    [10, 2, 2],
  ];
  return {
    scenario: { id: 'boost', name: 'Boost' },
    parts: [
      part('cpu', 'Compute A', 'compute', { power: 100, junction: 80.7, peak: 84, selfResistance: 0.4, couplingShare: 0.7 / 40.7, margin: 21 }),
      part('io', 'I/O die', 'io', { power: 10, junction: 53.4, peak: 54, selfResistance: 0.8, couplingShare: 5.4 / 13.4, margin: 51 }),
      part('mem', 'Memory 1', 'memory', {
        power: 2, junction: 54, peak: 55, selfResistance: 1.0, couplingShare: 12 / 14, limit: 85, extendedLimit: 95, margin: 29.5,
        tiers: [{ tier: 1, power: 0.5, temperature: 54.5 }, { tier: 2, power: 0.5, temperature: 54.75 }],
      }),
    ],
    influence: { partIds: ['cpu', 'io', 'mem'], matrix: influence },
    contributions,
    tierInfluence: {
      nodes: [{ partId: 'cpu', tier: 0 }, { partId: 'io', tier: 0 }, { partId: 'mem', tier: 0 }, { partId: 'mem', tier: 1 }, { partId: 'mem', tier: 2 }],
      matrix: [
        [0.4, 0.05, 0.1, 0.1, 0.1],
        [0.05, 0.8, 0.2, 0.2, 0.2],
        [0.1, 0.2, 1.0, 1.0, 1.0],
        [0.1, 0.2, 1.0, 1.5, 1.5],
        [0.1, 0.2, 1.0, 1.5, 2.0],
      ],
    },
    energyBalance: { power: 112, toTop: 104, toBottom: 8, relativeError: 2e-12 },
    maps: { interposer: map(50), lid: map(45) },
    truncation: { lid: null, interposer: { m: 64, n: 64, auto: true, converged: true, lastChange: 1e-5 } },
    idealisations: ['Layers are homogenised.'],
    warnings: [],
  } as AssemblyResult;
}
