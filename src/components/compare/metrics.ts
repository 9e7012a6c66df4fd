/** Rows of the compare table: one figure per variant from its solve, which way is better, best cells, differences to a baseline. */
import type { AssemblyResult } from '@shared/engine';
import { degC, kelvin, percent, watts } from '@/components/results/format';

/** Which direction is better for a row; null = not ranked (a design choice, not a merit). */
export type Better = 'lower' | 'higher' | null;

/** One cell: the number ranked and compared (null = not available), its text, and what it refers to. */
export interface MetricCell {
  value: number | null;
  text: string;
  detail?: string;
}

/** One row of the compare table. */
export interface MetricRow {
  key: string;
  label: string;
  /** Unit of the difference column, e.g. "K". */
  unit: 'K' | 'W' | 's' | '' | '%';
  better: Better;
  cells: MetricCell[];
  /** Short hint shown under the label (e.g. why a row is not ranked). */
  hint?: string;
}

/** Optional per-variant time a part may run at boost before a limit (s; null = never reaches it). */
export interface TimeToLimit {
  time: number | null;
  part: string;
}

/** Time-to-limit of one variant: a figure, 'pending' while the transient runs, or an error text. */
export type TimeState = TimeToLimit | 'pending' | { error: string };

const none: MetricCell = { value: null, text: '—' };
const argMax = <T>(xs: T[], f: (x: T) => number): T | undefined => xs.reduce<T | undefined>((b, x) => (b === undefined || f(x) > f(b) ? x : b), undefined);

function hottestPart(r: AssemblyResult): MetricCell {
  const p = argMax(r.parts, (q) => q.peak);
  return p ? { value: p.peak, text: degC(p.peak), detail: p.name } : none;
}

function hottestTier(r: AssemblyResult): MetricCell {
  const tiers = r.parts.flatMap((p) => p.tiers.map((t) => ({ name: p.name, ...t })));
  const t = argMax(tiers, (x) => x.temperature);
  return t ? { value: t.temperature, text: degC(t.temperature), detail: `${t.name}, tier ${t.tier}` } : none;
}

function smallestMargin(r: AssemblyResult): MetricCell {
  const p = argMax(r.parts, (q) => -q.margin);
  return p ? { value: p.margin, text: kelvin(p.margin, true), detail: p.name } : none;
}

function overLimit(r: AssemblyResult): MetricCell {
  const n = r.parts.filter((p) => p.margin < 0).length;
  return { value: n, text: String(n), detail: n ? r.parts.filter((p) => p.margin < 0).map((p) => p.name).join(', ') : undefined };
}

function largestCoupling(r: AssemblyResult): MetricCell {
  let best: { v: number; i: number; j: number } | null = null;
  r.contributions.forEach((row, i) => row.forEach((v, j) => {
    if (i !== j && (!best || v > best.v)) best = { v, i, j };
  }));
  const b = best as { v: number; i: number; j: number } | null;
  return b ? { value: b.v, text: kelvin(b.v), detail: `${r.parts[b.j].name} → ${r.parts[b.i].name}` } : none;
}

function timeCell(t: TimeState | null | undefined): MetricCell {
  if (!t) return none;
  if (t === 'pending') return { value: null, text: 'computing…' };
  if ('error' in t) return { value: null, text: '—', detail: t.error };
  if (t.time === null) return { value: Infinity, text: 'no limit reached', detail: t.part || 'steady state stays within every limit' };
  return { value: t.time, text: t.time < 1 ? `${(t.time * 1000).toFixed(0)} ms` : `${t.time.toFixed(2)} s`, detail: t.part };
}

/** Build the rows for results in column order (null = not solved yet); `times` from the transient when available, `timeHint` says how. */
export function compareMetrics(results: (AssemblyResult | null)[], times?: (TimeState | null)[], timeHint?: string): MetricRow[] {
  const col = (f: (r: AssemblyResult) => MetricCell) => results.map((r) => (r ? f(r) : none));
  const rows: MetricRow[] = [
    { key: 'hottest', label: 'Hottest part', unit: 'K', better: 'lower', cells: col(hottestPart) },
    { key: 'tier', label: 'Hottest DRAM tier', unit: 'K', better: 'lower', cells: col(hottestTier) },
    { key: 'margin', label: 'Smallest margin to limit', unit: 'K', better: 'higher', cells: col(smallestMargin) },
    { key: 'over', label: 'Parts over their limit', unit: '', better: 'lower', cells: col(overLimit) },
    { key: 'coupling', label: 'Largest coupling term', unit: 'K', better: 'lower', cells: col(largestCoupling), hint: 'rise one part causes in another' },
    {
      key: 'time', label: 'Time to limit at boost', unit: 's', better: 'higher', cells: results.map((_, i) => timeCell(times?.[i])),
      hint: times ? (timeHint ?? 'transient, all parts at the scenario powers') : 'needs the transient (not available here yet)',
    },
    { key: 'power', label: 'Total power', unit: 'W', better: 'lower', cells: col((r) => ({ value: r.energyBalance.power, text: watts(r.energyBalance.power) })) },
    {
      key: 'split', label: 'Heat to lid / to board', unit: '%', better: null, hint: 'not ranked: a design choice',
      cells: col((r) => {
        const f = r.energyBalance.power > 0 ? r.energyBalance.toTop / r.energyBalance.power : 0;
        return { value: f * 100, text: `${percent(f, 1)} / ${percent(1 - f, 1)}` };
      }),
    },
  ];
  return rows;
}

/** Columns holding the best value of a row; none when the row is not ranked, has < 2 values, or all values tie. */
export function bestColumns(row: MetricRow, tolerance = 1e-6): number[] {
  if (!row.better) return [];
  const vals = row.cells.map((c, i) => ({ v: c.value, i })).filter((x): x is { v: number; i: number } => x.v !== null && !Number.isNaN(x.v));
  if (vals.length < 2) return [];
  const sign = row.better === 'lower' ? 1 : -1;
  const best = Math.min(...vals.map((x) => sign * x.v));
  const close = (a: number, b: number) => a === b || (Number.isFinite(a) && Number.isFinite(b) && Math.abs(a - b) <= tolerance * Math.max(1, Math.abs(b)));
  const winners = vals.filter((x) => close(sign * x.v, best)).map((x) => x.i);
  return winners.length === vals.length ? [] : winners;
}

/** Difference of one cell to the baseline's, with whether it is better, worse or the same. */
export function deltaTo(row: MetricRow, col: number, baseline: number): { text: string; tone: 'better' | 'worse' | 'same' } | null {
  const a = row.cells[col]?.value;
  const b = row.cells[baseline]?.value;
  if (col === baseline || a == null || b == null || !Number.isFinite(a) || !Number.isFinite(b)) return null;
  const d = a - b;
  const digits = row.unit === '' ? 0 : 1;
  if (Math.abs(d) < 0.5 * 10 ** -digits) return { text: '±0', tone: 'same' };
  const scaled = row.unit === 's' && Math.abs(d) < 1 ? `${(d * 1000).toFixed(0)} ms` : `${d.toFixed(digits)}${row.unit ? ` ${row.unit === '%' ? 'pt' : row.unit}` : ''}`;
  const text = `${d > 0 ? '+' : ''}${scaled}`;
  if (!row.better) return { text, tone: 'same' };
  const better = row.better === 'lower' ? d < 0 : d > 0;
  return { text, tone: better ? 'better' : 'worse' };
}
