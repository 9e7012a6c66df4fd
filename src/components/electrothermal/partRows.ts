/** Per-part rows of an electro-thermal result: power parts summed over a part's nodes, temperatures at its hottest node. */
import { interpolateCividis } from 'd3';
import type { Model } from '@shared/schemas/model';
import type { CouplingResult } from '@shared/engine/electrothermal';
import { timelineNodes } from '@/components/timeline/nodes';

/** One part's figures (W, °C, K). */
export interface CouplingRow {
  partId: string;
  name: string;
  dynamic: number;
  leakage: number;
  joule: number;
  total: number;
  /** Hottest node of the part (die, or a DRAM tier) and its label. */
  node: string;
  withFeedback: number;
  fixedPower: number;
  rise: number;
  limit: number;
  /** DRAM extended-range limit (°C) or null. */
  extended: number | null;
}

/** Where a row stands against its limits. */
export function limitState(r: CouplingRow): 'ok' | 'extended' | 'over' {
  if (r.withFeedback <= r.limit) return 'ok';
  return r.extended !== null && r.withFeedback <= r.extended ? 'extended' : 'over';
}

/** Plain-words list of the parts above a limit, e.g. "Compute chiplet South 119.7 °C > 105 °C". */
export function overLimitList(rows: readonly CouplingRow[]): string[] {
  return rows.flatMap((r) => {
    const s = limitState(r);
    if (s === 'ok') return [];
    const t = `${r.name} ${r.withFeedback.toFixed(1)} °C > ${r.limit} °C`;
    return [s === 'extended' ? `${t} (DRAM extended range, ≤ ${r.extended} °C)` : t];
  });
}

/** Rows for every part with power or feedback. */
export function couplingRows(model: Model, result: CouplingResult): CouplingRow[] {
  const nodes = timelineNodes(model);
  return model.parts
    .map((part) => {
      const own = nodes.filter((n) => n.partId === part.id);
      const sum = (k: 'dynamic' | 'leakage' | 'joule' | 'total') => own.reduce((s, n) => s + result.powers[n.index][k], 0);
      const hot = own.reduce((a, b) => (result.temperatures[b.index] > result.temperatures[a.index] ? b : a));
      return {
        partId: part.id,
        name: part.name,
        dynamic: sum('dynamic'),
        leakage: sum('leakage'),
        joule: sum('joule'),
        total: sum('total'),
        node: hot.tier === 0 ? (part.memory ? 'base die' : 'die') : `tier ${hot.tier}`,
        withFeedback: result.temperatures[hot.index],
        fixedPower: result.fixedPowerTemperatures[hot.index],
        rise: result.feedbackRise[hot.index],
        limit: part.limits.junction,
        extended: part.limits.extended ?? null,
      };
    })
    .filter((r) => r.total > 0);
}

/** Colours of the three power parts (sampled from d3's cividis, a perceptual map readable on light and dark). */
export const SPLIT_COLORS = { dynamic: interpolateCividis(0.15), leakage: interpolateCividis(0.62), joule: interpolateCividis(0.98) } as const;
