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

/** Segments per node: a part's profile drives its die node; other nodes keep the scenario power. */
export function nodeSegments(model: Model, scenario: Scenario): (Segment[] | undefined)[] {
  const parts = scenario.profile?.parts ?? {};
  return timelineNodes(model).map((n) => (n.tier === 0 ? parts[n.partId] : undefined));
}

/** A key that changes only when the thermal network changes (stack-up and geometry, not loads). */
export function networkKey(model: Model): string {
  return JSON.stringify([model.stack, model.parts.map(({ electrical: _e, name: _n, limits: _l, ...rest }) => rest)]);
}

/** The die node of each part, by part id. */
export function dieNodeOf(nodes: readonly TimelineNode[]): Record<string, number> {
  return Object.fromEntries(nodes.filter((n) => n.tier === 0).map((n) => [n.partId, n.index]));
}
