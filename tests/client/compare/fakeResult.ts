/** Small hand-made solver results for the compare tests (invented numbers, only the fields the table reads). */
import type { AssemblyResult, PartResult } from '@shared/engine/assembly/result';

/** One part: id, name, hot spot (°C), limit (°C) and optional DRAM tier temperatures (°C). */
export function fakePart(id: string, peak: number, limit: number, tiers: number[] = []): PartResult {
  const hottest = Math.max(peak, ...tiers);
  return {
    id, name: `Part ${id}`, kind: tiers.length ? 'memory' : 'compute', power: 10, junction: peak - 1, peak, peakAt: { x: 0, y: 0 },
    tiers: tiers.map((t, k) => ({ tier: k + 1, power: 0.5, temperature: t })), heatUp: 9, heatDown: 1,
    selfResistance: 0.2, couplingShare: 0.1, fluidOffset: 40, limit, extendedLimit: null, margin: limit - hottest,
  };
}

/** A result with the given parts, coupling contributions (K) and heat to the lid (W) of a total power (W). */
export function fakeResult(parts: PartResult[], contributions: number[][], power: number, toTop: number): AssemblyResult {
  const grid = { nx: 2, ny: 2, x0: 0, y0: 0, dx: 0.01, dy: 0.01, values: [40, 50, 60, 70] };
  return {
    scenario: { id: 'boost', name: 'Boost' }, parts, contributions,
    influence: { partIds: parts.map((p) => p.id), matrix: [] }, tierInfluence: { nodes: [], matrix: [] },
    energyBalance: { power, toTop, toBottom: power - toTop, relativeError: 0 },
    maps: { interposer: grid, lid: null },
    truncation: { lid: null, interposer: null as unknown as AssemblyResult['truncation']['interposer'] },
    idealisations: [], warnings: [],
  };
}
