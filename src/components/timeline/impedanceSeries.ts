/** Lines of the impedance chart: sampled Z_ji(t) and their Foster fit, for self responses or from one source. */
import { networkStep } from '@shared/engine/transient';
import type { ChartSeries } from './chartGeometry';
import type { TimelineNode, TimelineSource } from './nodes';
import type { ImpedanceResult } from './protocol';
import { seriesColor } from './timelineSeries';

/** One (node, source) pair to draw. */
export interface ImpedancePair {
  node: number;
  source: number;
  label: string;
  memory: boolean;
}

/** Self pairs: every die source with its own node. */
export function selfPairs(nodes: readonly TimelineNode[], sources: readonly TimelineSource[]): ImpedancePair[] {
  return sources.flatMap((s, i) => (s.kind === 'junction' ? [{ node: s.node, source: i, label: nodes[s.node].partName, memory: nodes[s.node].kind === 'memory' }] : []));
}

/** Transfer pairs: from source i to every die node (its own first). */
export function transferPairs(nodes: readonly TimelineNode[], sources: readonly TimelineSource[], i: number): ImpedancePair[] {
  const from = sources[i];
  const dies = nodes.filter((n) => n.tier === 0);
  const own = dies.filter((n) => n.partId === from.partId);
  return [...own, ...dies.filter((n) => n.partId !== from.partId)].map((n) => ({ node: n.index, source: i, label: n.partId === from.partId ? `${n.partName} (self)` : `→ ${n.partName}`, memory: n.kind === 'memory' }));
}

/** Sampled lines plus thin fitted companions (key `<line>:fit`). */
export function impedanceLines(result: ImpedanceResult, pairs: readonly ImpedancePair[], dark = false): ChartSeries[] {
  const fits = result.times.map((t) => networkStep(result.network, t));
  const logic = pairs.filter((p) => !p.memory);
  const memory = pairs.filter((p) => p.memory);
  return pairs.flatMap((p) => {
    const color = p.memory ? seriesColor('memory', memory.indexOf(p), memory.length, dark) : seriesColor('logic', logic.indexOf(p), logic.length, dark);
    const key = `z${p.node}-${p.source}`;
    return [
      { key, label: p.label, values: result.Z.map((m) => m[p.node][p.source]), color, dashed: p.memory },
      { key: `${key}:fit`, label: `${p.label} (Foster fit)`, values: fits.map((m) => m[p.node][p.source]), color, companion: true },
    ];
  });
}
