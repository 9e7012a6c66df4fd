/**
 * The compact thermal model of a variant, as the netlist writer needs it: network nodes (part
 * junctions and DRAM tiers), the steady node-level influence matrix R (K/W), the fluid offsets (°C,
 * node temperatures at zero power), one scenario's node powers (W) and the temperatures the engine
 * found for them (°C). T = offset + R·P (physics.md §2).
 */
import type { AssemblyResult } from '../engine/assembly/result';
import type { FosterNetwork } from '../engine/transient';
import { EngineInputError } from '../engine/errors';
import { nodeLabel } from './resultCsv';

/** One network node of the compact model. */
export interface CompactNode {
  /** "cpu-w" for a junction, "mem-1/tier 3" for a DRAM tier. */
  label: string;
  partId: string;
  partName: string;
  tier: number;
  /** Limit of the node (°C). */
  limit: number;
}

/** Everything the netlist needs; `foster` (same node order) when a transient fit exists. */
export interface CompactModel {
  scenario: { id: string; name: string };
  nodes: CompactNode[];
  R: number[][];
  offsets: number[];
  powers: number[];
  temperatures: number[];
  foster?: FosterNetwork;
}

/** Build the compact model from one scenario's assembly result (offsets = T − R·P). */
export function compactModel(result: AssemblyResult, foster?: FosterNetwork): CompactModel {
  const parts = new Map(result.parts.map((p) => [p.id, p]));
  const nodes = result.tierInfluence.nodes.map((n) => {
    const p = parts.get(n.partId)!;
    return { label: nodeLabel(n), partId: n.partId, partName: p.name, tier: n.tier, limit: p.limit };
  });
  const powers = nodes.map((n) => {
    const p = parts.get(n.partId)!;
    return n.tier === 0 ? p.power - p.tiers.reduce((s, t) => s + t.power, 0) : p.tiers.find((t) => t.tier === n.tier)!.power;
  });
  const temperatures = nodes.map((n) => {
    const p = parts.get(n.partId)!;
    return n.tier === 0 ? p.junction : p.tiers.find((t) => t.tier === n.tier)!.temperature;
  });
  const R = result.tierInfluence.matrix.map((row) => row.slice());
  const offsets = temperatures.map((t, i) => t - R[i].reduce((s, r, j) => s + r * powers[j], 0));
  if (foster && foster.R.length !== nodes.length) {
    throw new EngineInputError('foster', `The Foster network has ${foster.R.length} nodes; the compact model has ${nodes.length}.`);
  }
  return { scenario: result.scenario, nodes, R, offsets, powers, temperatures, foster };
}
