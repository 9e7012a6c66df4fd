/**
 * solveAssembly: one scenario of one model → per-part junction temperatures (mean and hot spot),
 * memory tiers, heat split, JEDEC-style figures, influence matrices, energy balance and plane maps.
 */
import type { Model } from '../../schemas/model';
import { defaultImpedanceCache, ImpedanceCache } from '../cache';
import { EngineInputError } from '../errors';
import type { Truncation } from '../types';
import { lidOrigin } from './geometry';
import { hotSpots } from './hotspot';
import { IDEALISATIONS } from './idealisations';
import { findScenario, nodePowers, partPowers } from './loads';
import { assemblyNetwork, solveNetwork, type AssemblyNetwork } from './network';
import { planeMaps } from './planeMaps';
import type { AssemblyResult, MapResult, PartResult } from './result';
import { overlapWarnings, truncationWarnings } from './warnings';

/** Options of solveAssembly (all optional). */
export interface AssemblyOptions {
  /** Plane map side (cells, a power of two); default 128. */
  mapSize?: number;
  /** Fixed truncations per plane (automatic when absent). */
  truncation?: { lid?: Truncation; interposer?: Truncation };
  cache?: ImpedanceCache | null;
}

/** Default plane map side. */
export const ASSEMBLY_MAP_SIZE = 128;

/**
 * The last few networks built with each impedance cache, by everything but the scenarios: the network
 * does not depend on loads, so switching scenario or editing powers skips building and factoring it.
 * `cache: null` (no caching) always builds afresh.
 */
const NETWORK_MEMO_SIZE = 4;
const networkMemos = new WeakMap<ImpedanceCache, Map<string, AssemblyNetwork>>();

function memoNetwork(model: Model, options: AssemblyOptions): AssemblyNetwork {
  if (options.cache === null) return assemblyNetwork(model, { truncation: options.truncation, cache: null });
  const cache = options.cache ?? defaultImpedanceCache;
  let memo = networkMemos.get(cache);
  if (!memo) networkMemos.set(cache, (memo = new Map()));
  const key = JSON.stringify({ ...model, scenarios: null, truncation: options.truncation ?? null });
  let net = memo.get(key);
  if (net) {
    memo.delete(key);
  } else {
    net = assemblyNetwork(model, { truncation: options.truncation, cache });
    if (memo.size >= NETWORK_MEMO_SIZE) memo.delete(memo.keys().next().value!);
  }
  memo.set(key, net);
  return net;
}

const rows = (flat: Float64Array, n: number, pick: number[]): number[][] => pick.map((j) => pick.map((i) => flat[j * n + i]));

/** Solve one scenario (by id; the first when absent) of a model. */
export function solveAssembly(model: Model, scenarioId?: string, options: AssemblyOptions = {}): AssemblyResult {
  const { scenario, index } = findScenario(model, scenarioId);
  const net = memoNetwork(model, options);
  const powers = nodePowers(model, net, scenario, index);
  const state = solveNetwork(net, powers);
  const nn = net.nodes.length;
  const size = options.mapSize ?? ASSEMBLY_MAP_SIZE;
  if (!(Number.isInteger(size) && size >= 8 && size <= 1024 && (size & (size - 1)) === 0)) {
    throw new EngineInputError('mapSize', 'The map size must be a power of two from 8 to 1024 cells.');
  }
  const maps = planeMaps(net, state, lidOrigin(model), size);
  const spots = hotSpots(net, state, scenario, maps, options.cache === null ? new ImpedanceCache(4) : (options.cache ?? defaultImpedanceCache));
  const totals = partPowers(net, powers);
  // contributions[i][j]: rise of part i's junction caused by all of part j's nodes.
  const contributions = net.geometry.map((_, i) =>
    net.columns.map((col, j) => {
      let sum = 0;
      for (let k = 0; k < col.nodes.length; k++) sum += net.R[net.junctionNode[i] * nn + net.junctionNode[j] + k] * powers[net.junctionNode[j] + k];
      return sum;
    }),
  );
  const parts: PartResult[] = net.geometry.map((g, p) => {
    const first = net.junctionNode[p];
    const rise = contributions[p].reduce((a, b) => a + b, 0);
    const tiers = net.columns[p].nodes.slice(1).map((node, k) => ({ tier: node.tier, power: powers[first + 1 + k], temperature: state.T[first + 1 + k] }));
    // DRAM limits apply to the dies' temperatures (base die mean and tiers); logic limits to the hot spot.
    const hottest = g.part.memory ? Math.max(state.T[first], ...tiers.map((t) => t.temperature)) : spots[p].value;
    return {
      id: g.part.id,
      name: g.part.name,
      kind: g.part.kind,
      power: totals[p],
      junction: state.T[first],
      peak: spots[p].value,
      peakAt: { x: spots[p].x, y: spots[p].y },
      tiers,
      heatUp: state.qUp[p],
      heatDown: state.qDown[p],
      selfResistance: net.R[first * nn + first],
      couplingShare: rise > 0 ? (rise - contributions[p][p]) / rise : 0,
      fluidOffset: net.offsets[first],
      limit: g.part.limits.junction,
      extendedLimit: g.part.limits.extended ?? null,
      margin: g.part.limits.junction - hottest,
    };
  });
  const total = totals.reduce((a, b) => a + b, 0);
  const toTop = state.qUp.reduce((a, b) => a + b, 0);
  const toBottom = state.qDown.reduce((a, b) => a + b, 0);
  const toMap = (m: typeof maps.interposer): MapResult => ({ nx: m.nx, ny: m.ny, x0: m.x0, y0: m.y0, dx: m.dx, dy: m.dy, values: Array.from(m.values) });
  const junctions = net.junctionNode;
  return {
    scenario: { id: scenario.id, name: scenario.name },
    parts,
    influence: { partIds: model.parts.map((p) => p.id), matrix: rows(net.R, nn, junctions) },
    contributions,
    tierInfluence: {
      nodes: net.nodes.map((n) => ({ partId: model.parts[n.partIndex].id, tier: n.tier })),
      matrix: rows(net.R, nn, net.nodes.map((_, i) => i)),
    },
    energyBalance: { power: total, toTop, toBottom, relativeError: total > 0 ? Math.abs(toTop + toBottom - total) / total : Math.abs(toTop + toBottom) },
    maps: { interposer: toMap(maps.interposer), lid: maps.lid ? toMap(maps.lid) : null },
    truncation: { lid: net.lid ? net.lid.modes.truncation : null, interposer: net.interposer.modes.truncation },
    idealisations: [...IDEALISATIONS],
    warnings: [...overlapWarnings(net.geometry, model.settings.minGap), ...truncationWarnings(net)],
  };
}
