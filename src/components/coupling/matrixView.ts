/**
 * The coupling matrix as table rows: rows "temperature of" (parts, and memory tiers under their
 * stack), columns "heated by" (parts). Three views of the same influence coefficients
 * (physics.md §2): R_ij in K/W; R_ij as % of the row's own R_ii; and R_ij·P_j in K for the scenario.
 */
import type { AssemblyResult } from '@shared/engine';

/** Which number the cells show. */
export type MatrixMode = 'resistance' | 'percent' | 'kelvin';

/** One table row: a part's junction, or one memory tier of a stack. */
export interface MatrixRow {
  key: string;
  partId: string;
  /** 0 = the part's junction (memory: base die), 1 … N = DRAM tier. */
  tier: number;
  label: string;
  values: number[];
  /** Index of the row's own part among the columns (its "self" cell). */
  own: number;
  /** Sum of the row in kelvin mode (rise above the fluid), else null. */
  total: number | null;
}

/** Sort key: a column index, the row label, or the kelvin total. */
export type MatrixSort = { by: number | 'label' | 'total'; descending: boolean };

/** Unit label of a mode, for captions and legends. */
export const modeUnit: Record<MatrixMode, string> = { resistance: 'K/W', percent: '% of self', kelvin: 'K' };

/** What the cells mean, one sentence per mode (shown under the table). */
export const modeCaption: Record<MatrixMode, string> = {
  resistance: 'Cells: rise of the row part per watt in the column part (influence coefficient R_ij, K/W).',
  percent: "Cells: R_ij as % of the row part's own R_ii — what a watt in the column part does to the row part, against a watt of its own.",
  kelvin: "Cells: kelvin the column part's power adds to the row part in this scenario (R_ij·P_j); Rise: their sum, above the fluid.",
};

/** Cell text for a mode: K/W to 3 decimals, % and K to 1. */
export function formatCell(v: number, mode: MatrixMode): string {
  if (!Number.isFinite(v)) return '—';
  return mode === 'resistance' ? v.toFixed(3) : v.toFixed(1);
}

/** Powers of every node in tierInfluence order: base die = part power − its tiers, then its tiers. */
function nodePowers(result: AssemblyResult): number[] {
  const byId = new Map(result.parts.map((p) => [p.id, p]));
  return result.tierInfluence.nodes.map((n) => {
    const part = byId.get(n.partId);
    if (!part) return 0;
    if (n.tier > 0) return part.tiers.find((t) => t.tier === n.tier)?.power ?? 0;
    return part.power - part.tiers.reduce((s, t) => s + t.power, 0);
  });
}

function percentOf(values: number[], own: number): number[] {
  const self = values[own];
  return values.map((v) => (self > 0 ? (100 * v) / self : NaN));
}

/** Rows of the matrix in result order; tiers of stacks listed in `expanded` follow their stack. */
export function matrixRows(result: AssemblyResult, mode: MatrixMode, expanded: ReadonlySet<string> = new Set()): MatrixRow[] {
  const ids = result.influence.partIds;
  const nodes = result.tierInfluence.nodes;
  const junction = ids.map((id) => nodes.findIndex((n) => n.partId === id && n.tier === 0));
  const powers = mode === 'kelvin' ? nodePowers(result) : [];
  const rows: MatrixRow[] = [];
  const finish = (values: number[], own: number) => (mode === 'percent' ? percentOf(values, own) : values);
  result.parts.forEach((part, i) => {
    const partValues = mode === 'kelvin' ? result.contributions[i] : result.influence.matrix[i];
    const values = finish(partValues, i);
    rows.push({ key: part.id, partId: part.id, tier: 0, label: part.name, values, own: i, total: mode === 'kelvin' ? sum(values) : null });
    if (!expanded.has(part.id)) return;
    for (const t of part.tiers) {
      const node = nodes.findIndex((n) => n.partId === part.id && n.tier === t.tier);
      if (node < 0) continue;
      const r = result.tierInfluence.matrix[node];
      const raw = ids.map((id, j) =>
        mode === 'kelvin' ? nodes.reduce((s, n, k) => (n.partId === id ? s + r[k] * powers[k] : s), 0) : r[junction[j]],
      );
      const tierValues = finish(raw, i);
      rows.push({ key: `${part.id}#${t.tier}`, partId: part.id, tier: t.tier, label: `Tier ${t.tier}`, values: tierValues, own: i, total: mode === 'kelvin' ? sum(tierValues) : null });
    }
  });
  return rows;
}

const sum = (v: number[]) => v.reduce((a, b) => a + b, 0);

function sortValue(row: MatrixRow, by: MatrixSort['by']): number | string {
  if (by === 'label') return row.label;
  if (by === 'total') return row.total ?? 0;
  return row.values[by] ?? 0;
}

/** Sort part rows by a key; tier rows stay under their stack in tier order. */
export function sortRows(rows: MatrixRow[], sort: MatrixSort | null): MatrixRow[] {
  if (!sort) return rows;
  const parts = rows.filter((r) => r.tier === 0);
  const sign = sort.descending ? -1 : 1;
  const sorted = [...parts].sort((a, b) => {
    const va = sortValue(a, sort.by);
    const vb = sortValue(b, sort.by);
    const c = typeof va === 'string' ? va.localeCompare(vb as string) : (va as number) - (vb as number);
    return sign * c;
  });
  return sorted.flatMap((p) => [p, ...rows.filter((r) => r.partId === p.partId && r.tier > 0)]);
}

/** Largest off-diagonal cell (the colour scale's top; self cells are outlined, not scaled). */
export function offDiagonalMax(rows: MatrixRow[]): number {
  let max = 0;
  for (const r of rows) r.values.forEach((v, j) => { if (j !== r.own && Number.isFinite(v)) max = Math.max(max, v); });
  return max;
}
