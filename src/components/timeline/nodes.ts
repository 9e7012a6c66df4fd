/**
 * The thermal nodes of a model as the engine orders them (assembly/columns.ts): part by part, a part's
 * die first (memory: its base die), then DRAM tiers 1 … N from the bottom up. Labels, limits, powers.
 */
import type { Model, PartKind, Scenario, Segment } from '@shared/schemas/model';

/** One node of the assembly network, named for the UI. */
export interface TimelineNode {
  index: number;
  partIndex: number;
  partId: string;
  partName: string;
  kind: PartKind;
  /** 0 = die / base die; 1 … N = DRAM tiers. */
  tier: number;
  label: string;
  /** Junction limit (°C; for DRAM the normal-range limit). */
  limit: number;
  /** DRAM extended-range limit (°C) or null. */
  extended: number | null;
}

/** All nodes of a model in engine order. */
export function timelineNodes(model: Model): TimelineNode[] {
  const out: TimelineNode[] = [];
  model.parts.forEach((p, partIndex) => {
    const tiers = p.memory?.tiers ?? 0;
    for (let tier = 0; tier <= tiers; tier++) {
      const label = !p.memory ? p.name : tier === 0 ? `${p.name} · base die` : `${p.name} · tier ${tier}`;
      out.push({ index: out.length, partIndex, partId: p.id, partName: p.name, kind: p.kind, tier, label, limit: p.limits.junction, extended: p.limits.extended ?? null });
    }
  });
  return out;
}

/** Node powers (W) of a scenario: a part's `power` on its die node, memory `tiers` on the tier nodes. */
export function scenarioNodePowers(model: Model, scenario: Scenario | undefined): number[] {
  return timelineNodes(model).map((n) => {
    const load = scenario?.loads[n.partId];
    if (!load) return 0;
    return n.tier === 0 ? load.power : (load.tiers?.[n.tier - 1] ?? 0);
  });
}

/**
 * The heat sources of the impedance, in the engine's order (transient/impedanceSources.ts, 'parts'):
 * per part its die node, then for a memory stack one source spreading evenly over its DRAM tiers.
 */
export interface TimelineSource {
  partId: string;
  kind: 'junction' | 'tiers';
  /** Row of its own node (die node; first tier for the tiers source). */
  node: number;
  /** The engine's label ("cpu-w", "mem-1/tiers"). */
  key: string;
}

/** Sources of a model in engine order. */
export function timelineSources(model: Model): TimelineSource[] {
  const out: TimelineSource[] = [];
  timelineNodes(model).forEach((n) => {
    if (n.tier === 0) out.push({ partId: n.partId, kind: 'junction', node: n.index, key: n.partId });
    if (n.tier === 1) out.push({ partId: n.partId, kind: 'tiers', node: n.index, key: `${n.partId}/tiers` });
  });
  return out;
}

/** Node powers → source powers: die nodes as they are, tiers summed per stack. */
export function toSourcePowers(model: Model, nodePowers: readonly number[]): number[] {
  const nodes = timelineNodes(model);
  return timelineSources(model).map((s) =>
    s.kind === 'junction' ? nodePowers[s.node] : nodes.reduce((sum, n, j) => (n.partId === s.partId && n.tier > 0 ? sum + nodePowers[j] : sum), 0),
  );
}

/** Segments per source: a part's profile drives its die; tiers keep the scenario power. */
export function sourceSegments(model: Model, scenario: Scenario): (Segment[] | undefined)[] {
  const parts = scenario.profile?.parts ?? {};
  return timelineSources(model).map((s) => (s.kind === 'junction' ? parts[s.partId] : undefined));
}

/** A key that changes only when the thermal network changes (stack-up and geometry, not loads). */
export function networkKey(model: Model): string {
  return JSON.stringify([model.stack, model.parts.map(({ electrical: _e, name: _n, limits: _l, ...rest }) => rest)]);
}

/** The die node of each part, by part id. */
export function dieNodeOf(nodes: readonly TimelineNode[]): Record<string, number> {
  return Object.fromEntries(nodes.filter((n) => n.tier === 0).map((n) => [n.partId, n.index]));
}
