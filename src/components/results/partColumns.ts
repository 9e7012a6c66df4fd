/** Columns of the per-part figures table (memory tiers are child rows of their stack). */
import { h } from 'vue';
import type { DataTableColumns } from 'naive-ui';
import type { AssemblyResult } from '@shared/engine';
import { marginScale, textOn } from './colour';
import { kelvin } from './format';

/** One row: a part, or one DRAM tier of a stack (then only power, temperature, limit and margin). */
export interface FigureRow {
  key: string;
  name: string;
  power: number;
  mean: number;
  peak: number | null;
  limit: string;
  margin: number;
  self: number | null;
  share: number | null;
  up: number | null;
  down: number | null;
  /** Memory stacks: the base die's hot spot is shown, but the DRAM limit is checked on the mean temperatures. */
  peakInfo: boolean;
  children?: FigureRow[];
}

/** Rows of the table from a result. */
export function figureRows(result: AssemblyResult): FigureRow[] {
  return result.parts.map((p) => ({
    key: p.id,
    name: p.name,
    power: p.power,
    mean: p.junction,
    peak: p.peak,
    limit: p.extendedLimit === null ? p.limit.toFixed(0) : `${p.limit.toFixed(0)} (ext. ${p.extendedLimit.toFixed(0)})`,
    margin: p.margin,
    self: p.selfResistance,
    share: p.couplingShare,
    up: p.heatUp,
    down: p.heatDown,
    peakInfo: p.kind === 'memory',
    children: p.tiers.length
      ? p.tiers.map((t) => ({ key: `${p.id}#${t.tier}`, name: `Tier ${t.tier}`, power: t.power, mean: t.temperature, peak: null, limit: p.limit.toFixed(0), margin: p.limit - t.temperature, self: null, share: null, up: null, down: null, peakInfo: false }))
      : undefined,
  }));
}

const num = (v: number | null, d: number) => (v === null || !Number.isFinite(v) ? '' : v.toFixed(d));
const right = { align: 'right' as const, titleAlign: 'right' as const };

/** The margin as a pill coloured by the diverging margin map. */
function marginPill(m: number) {
  const bg = marginScale(m);
  return h('span', { class: 'hl-margin', style: { background: bg, color: textOn(bg) }, 'data-over': m < 0 ? 'true' : undefined }, kelvin(m, true));
}

/** Column definitions; units in the titles (°C temperatures, K margins, K/W resistances). */
export function figureColumns(): DataTableColumns<FigureRow> {
  return [
    { title: 'Part', key: 'name', fixed: 'left', minWidth: 170 },
    { title: 'Power (W)', key: 'power', ...right, render: (r) => num(r.power, r.power < 10 ? 2 : 1), sorter: (a, b) => a.power - b.power },
    { title: 'Mean Tj (°C)', key: 'mean', ...right, render: (r) => num(r.mean, 1), sorter: (a, b) => a.mean - b.mean },
    {
      title: 'Hot spot (°C)', key: 'peak', ...right, sorter: (a, b) => (a.peak ?? a.mean) - (b.peak ?? b.mean),
      render: (r) => (r.peakInfo ? h('span', { class: 'hl-muted', title: 'Base-die hot spot; the DRAM limit is checked on the die and tier means' }, num(r.peak, 1)) : num(r.peak, 1)),
    },
    { title: 'Limit (°C)', key: 'limit', ...right },
    { title: 'Margin (K)', key: 'margin', ...right, render: (r) => marginPill(r.margin), sorter: (a, b) => a.margin - b.margin, defaultSortOrder: false },
    { title: 'Self R (K/W)', key: 'self', ...right, render: (r) => num(r.self, 3), sorter: (a, b) => (a.self ?? 0) - (b.self ?? 0) },
    { title: 'Coupling share', key: 'share', ...right, render: (r) => (r.share === null ? '' : `${(r.share * 100).toFixed(0)} %`), sorter: (a, b) => (a.share ?? 0) - (b.share ?? 0) },
    { title: 'To lid (W)', key: 'up', ...right, render: (r) => num(r.up, 2) },
    { title: 'To interposer (W)', key: 'down', ...right, render: (r) => num(r.down, 2) },
  ];
}
