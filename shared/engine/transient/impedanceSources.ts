/**
 * Heat sources of an impedance computation: weight vectors over the network's nodes (sum 1).
 * 'parts': each part's junction, plus each memory stack's tiers heated evenly; 'nodes': every node.
 */
import type { LaplaceAssembly } from './laplaceAssembly';

/** One source: its name, the part it belongs to, its own node (−1 for a spread source) and node weights. */
export interface ImpedanceSource {
  label: string;
  part: number;
  kind: 'junction' | 'tiers' | 'node';
  node: number;
  weights: Float64Array;
}

/** Sources of the chosen kind for a prepared network. */
export function assemblySources(lap: LaplaceAssembly, kind: 'parts' | 'nodes'): ImpedanceSource[] {
  const n = lap.nodeCount;
  const { nodes, junctionNode, columns, geometry } = lap.steady;
  const id = (p: number) => geometry[p].part.id;
  const unit = (j: number) => {
    const w = new Float64Array(n);
    w[j] = 1;
    return w;
  };
  if (kind === 'nodes') {
    return nodes.map((node, j) => ({ label: node.tier === 0 ? id(node.partIndex) : `${id(node.partIndex)}/tier-${node.tier}`, part: node.partIndex, kind: 'node', node: j, weights: unit(j) }));
  }
  const out: ImpedanceSource[] = [];
  columns.forEach((c, p) => {
    out.push({ label: id(p), part: p, kind: 'junction', node: junctionNode[p], weights: unit(junctionNode[p]) });
    if (c.nodes.length > 1) {
      const w = new Float64Array(n);
      for (let k = 1; k < c.nodes.length; k++) w[junctionNode[p] + k] = 1 / (c.nodes.length - 1);
      out.push({ label: `${id(p)}/tiers`, part: p, kind: 'tiers', node: -1, weights: w });
    }
  });
  return out;
}
