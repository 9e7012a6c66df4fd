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
  /** Remarks for the netlist header (e.g. the Foster fit error). */
  notes?: string[];
}

/**
 * Make a Foster network's sums equal the steady matrix R exactly (its DC then reproduces the steady
 * result): self terms are scaled, transfer terms take the difference in their slowest term — as the fit
 * itself does (fosterFit.ts). Returns the network and the largest relative change of a sum.
 */
export function anchorFoster(foster: FosterNetwork, R: number[][]): { network: FosterNetwork; change: number } {
  let change = 0;
  const out = foster.R.map((row, j) =>
    row.map((terms, i) => {
      const sum = terms.reduce((a, r) => a + r, 0);
      const target = R[j][i];
      if (Math.abs(target) > 0) change = Math.max(change, Math.abs(sum - target) / Math.abs(target));
      if (i === j && sum > 0) return terms.map((r) => (r * target) / sum);
      const next = terms.slice();
      next[next.length - 1] += target - sum;
      return next;
    }),
  );
  return { network: { ...foster, R: out }, change };
}

/** Build the compact model from one scenario's assembly result (offsets = T − R·P). */
export function compactModel(result: AssemblyResult, foster?: FosterNetwork, notes: string[] = []): CompactModel {
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
  if (foster && (foster.R.length !== nodes.length || foster.R.some((row) => row.length !== nodes.length))) {
    throw new EngineInputError('foster', `The Foster network must be square over the ${nodes.length} nodes (one source per node).`);
  }
  if (!foster) return { scenario: result.scenario, nodes, R, offsets, powers, temperatures, notes };
  const anchored = anchorFoster(foster, R);
  const note = `Foster sums set to the steady matrix (largest change ${(100 * anchored.change).toPrecision(2)} %), so DC equals the steady result.`;
  return { scenario: result.scenario, nodes, R, offsets, powers, temperatures, foster: anchored.network, notes: [...notes, note] };
}
