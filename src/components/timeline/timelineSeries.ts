/**
 * What the temperature-time chart draws: each powered part's die, each memory stack's hottest tier (or
 * all tiers), coloured by kind from perceptual maps (plasma for logic, viridis for memory), and the
 * limits of the parts shown (logic junction limit; DRAM normal and extended range).
 */
import { interpolatePlasma, interpolateViridis } from 'd3';
import type { SimulationResult } from '@shared/engine/transient';
import type { ChartLimit, ChartSeries } from './chartGeometry';
import type { TimelineNode } from './nodes';

/** Colour of the k-th of `count` lines of a kind; the map's ends that vanish on the background are skipped. */
export function seriesColor(kind: 'logic' | 'memory', k: number, count: number, dark = false): string {
  const f = count <= 1 ? 0.5 : k / (count - 1);
  if (kind === 'logic') return interpolatePlasma(dark ? 0.4 + 0.55 * f : 0.1 + 0.62 * f);
  return interpolateViridis(dark ? 0.35 + 0.6 * f : 0.2 + 0.58 * f);
}

/** Nodes to draw: dies of parts that carry power, plus the hottest tier of each stack (or every tier). */
export function shownNodes(nodes: readonly TimelineNode[], sim: SimulationResult, powered: ReadonlySet<string>, allTiers: boolean): TimelineNode[] {
  const out: TimelineNode[] = [];
  for (const n of nodes) {
    if (n.tier === 0 && (powered.has(n.partId) || n.kind === 'memory')) out.push(n);
    if (n.tier > 0 && allTiers) out.push(n);
  }
  if (allTiers) return out;
  const stacks = new Set(nodes.filter((n) => n.tier > 0).map((n) => n.partId));
  for (const id of stacks) {
    const tiers = nodes.filter((n) => n.partId === id && n.tier > 0);
    const hottest = tiers.reduce((a, b) => (sim.peaks[b.index].temperature > sim.peaks[a.index].temperature ? b : a));
    out.splice(out.findIndex((n) => n.partId === id) + 1, 0, hottest);
  }
  return out;
}

/** Chart lines of the shown nodes. */
export function timelineSeries(shown: readonly TimelineNode[], sim: SimulationResult, hottestLabel = true, dark = false): ChartSeries[] {
  const logic = shown.filter((n) => n.kind !== 'memory');
  const stacks = [...new Set(shown.filter((n) => n.kind === 'memory').map((n) => n.partId))];
  return shown.map((n) => {
    const memory = n.kind === 'memory';
    const color = memory ? seriesColor('memory', stacks.indexOf(n.partId), stacks.length, dark) : seriesColor('logic', logic.indexOf(n), logic.length, dark);
    const label = memory && n.tier > 0 && hottestLabel ? `${n.label} (hottest tier)` : n.label;
    return { key: `n${n.index}`, label, values: sim.temperatures[n.index], color, dashed: memory && n.tier > 0 };
  });
}

/** Limit lines for the shown nodes. */
export function timelineLimits(shown: readonly TimelineNode[]): ChartLimit[] {
  const out = new Map<string, ChartLimit>();
  for (const n of shown) {
    if (n.kind === 'memory') {
      out.set(`m${n.limit}`, { value: n.limit, label: `${n.limit} °C DRAM normal`, tone: 'hard' });
      if (n.extended !== null) out.set(`e${n.extended}`, { value: n.extended, label: `${n.extended} °C DRAM extended`, tone: 'soft' });
    } else out.set(`l${n.limit}`, { value: n.limit, label: `${n.limit} °C junction limit`, tone: 'hard' });
  }
  return [...out.values()];
}
