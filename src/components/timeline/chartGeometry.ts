/** Scales, ticks and paths of the Timeline's line charts (d3-scale / d3-shape), kept free of the DOM. */
import { bisector, extent, line, scaleLinear, scaleLog } from 'd3';
import { logTickLabel, tickLabel, timeUnit } from './timeScale';

/** One line: values per x sample; `dashed` for memory tiers or fitted curves. */
export interface ChartSeries {
  key: string;
  label: string;
  values: readonly number[];
  color: string;
  dashed?: boolean;
  /** Drawn thin and left out of the hover read-out (e.g. a Foster fit over its data). */
  companion?: boolean;
}

/** A horizontal reference line (a temperature limit). */
export interface ChartLimit {
  value: number;
  label: string;
  tone: 'hard' | 'soft';
}

/** Plot box inside the SVG. */
export const MARGIN = { top: 12, right: 150, bottom: 34, left: 52 } as const;

/** Everything the template needs to draw one chart. */
export function chartGeometry(
  xs: readonly number[], series: readonly ChartSeries[], limits: readonly ChartLimit[], width: number, height: number, log: boolean, yFloor?: number,
) {
  const w = Math.max(60, width - MARGIN.left - MARGIN.right);
  const h = Math.max(40, height - MARGIN.top - MARGIN.bottom);
  const positive = log ? xs.filter((x) => x > 0) : xs;
  const [x0, x1] = extent(positive) as [number, number];
  const all = series.flatMap((s) => s.values.filter(Number.isFinite)).concat(limits.map((l) => l.value));
  let [y0, y1] = (extent(all) as [number, number]) ?? [0, 1];
  if (!(y1 > y0)) y1 = (y0 ?? 0) + 1;
  const pad = 0.05 * (y1 - y0);
  // a floor (e.g. 0 K/W) is the axis start unless the data clearly go below it
  const low = yFloor !== undefined && y0 >= yFloor - pad ? yFloor : y0 - pad;
  const y = scaleLinear().domain([low, y1 + pad]).range([h, 0]).nice();
  const unit = timeUnit((x1 ?? 1) - (log ? 0 : (x0 ?? 0)));
  const x = log ? scaleLog().domain([x0 ?? 1e-6, x1 ?? 1]).range([0, w]) : scaleLinear().domain([x0 ?? 0, x1 ?? 1]).range([0, w]);
  const xTicks = log
    ? (x.ticks() as number[]).filter((t) => Math.abs(Math.log10(t) - Math.round(Math.log10(t))) < 1e-9).map((t) => ({ at: x(t), label: logTickLabel(t) }))
    : scaleLinear().domain([(x0 ?? 0) / unit.scale, (x1 ?? 1) / unit.scale]).ticks(8).map((t) => ({ at: x(t * unit.scale), label: tickLabel(t * unit.scale, unit.scale) }));
  const yTicks = y.ticks(Math.max(3, Math.min(6, Math.round(h / 45)))).map((t) => ({ at: y(t), label: String(t) }));
  const path = line<number>()
    .defined((v, i) => Number.isFinite(v) && (!log || xs[i] > 0))
    .x((_, i) => x(xs[i]))
    .y((v) => y(v));
  const lines = series.map((s) => ({ ...s, d: path(s.values as number[]) ?? '' }));
  const limitLines = limits.filter((l) => l.value >= y.domain()[0] && l.value <= y.domain()[1]).map((l) => ({ ...l, at: y(l.value) }));
  return { w, h, x, y, xTicks, yTicks, lines, limitLines, xUnit: log ? '' : unit.unit };
}

/** Index of the sample nearest to x (in data units). */
export function nearestIndex(xs: readonly number[], value: number): number {
  const i = bisector((d: number) => d).center(xs as number[], value);
  return Math.max(0, Math.min(xs.length - 1, i));
}
