/**
 * Heat-flow arrows: one per (heating part j → heated part i) whose contribution R_ij·P_j (K) reaches
 * a threshold, as a filled polygon in canvas world mm (y down). Opposite arrows of a pair sit side
 * by side (each shifted to its own right), so both directions stay visible.
 */
import type { AssemblyResult } from '@shared/engine';
import type { Part } from '@shared/schemas/model';
import { footprint } from '@/components/layout/geometry';

/** One arrow: who heats whom, by how much, its outline and its label anchor (world mm). */
export interface FlowArrow {
  key: string;
  from: string;
  to: string;
  kelvin: number;
  points: string;
  label: { x: number; y: number };
  width: number;
}

/** Sizes in screen px: shaft width range and head size. */
export const ARROW_PX = { minWidth: 1.5, maxWidth: 12, gap: 1.5 };

/** Arrows of all contributions ≥ threshold (K) between parts that both exist in the model. */
export function flowArrows(parts: Part[], result: AssemblyResult, heightMm: number, scale: number, threshold: number): FlowArrow[] {
  const ids = result.influence.partIds;
  const rect = new Map(parts.map((p) => { const f = footprint(p); return [p.id, { x: f.x * 1000, y: heightMm - f.y * 1000, w: f.w * 1000, h: f.h * 1000 }]; }));
  let max = 0;
  result.contributions.forEach((row, i) => row.forEach((c, j) => { if (i !== j) max = Math.max(max, c); }));
  if (max <= 0) return [];
  const px = 1 / scale;
  const out: FlowArrow[] = [];
  result.contributions.forEach((row, i) => row.forEach((c, j) => {
    if (i === j || !(c >= threshold) || c <= 0) return;
    const a = rect.get(ids[j]);
    const b = rect.get(ids[i]);
    if (!a || !b) return;
    const dx = b.x - a.x;
    const dy = b.y - a.y;
    const len = Math.hypot(dx, dy);
    if (len < 1e-6) return;
    const ux = dx / len;
    const uy = dy / len;
    const exit = (r: { w: number; h: number }) => Math.min(r.w / 2 / Math.max(Math.abs(ux), 1e-9), r.h / 2 / Math.max(Math.abs(uy), 1e-9));
    const s = 0.45 * exit(a);
    const e = len - 0.45 * exit(b);
    if (e - s <= 0) return;
    const w = (ARROW_PX.minWidth + (ARROW_PX.maxWidth - ARROW_PX.minWidth) * (c / max)) * px;
    const head = Math.min(w * 1.6 + 7 * px, (e - s) * 0.6);
    const hw = w / 2 + 3.5 * px + w * 0.35;
    const off = w / 2 + ARROW_PX.gap * px;
    // Right-hand normal in y-down coordinates.
    const nx = -uy;
    const ny = ux;
    const at = (t: number, n: number) => `${(a.x + ux * t + nx * (off + n)).toFixed(3)},${(a.y + uy * t + ny * (off + n)).toFixed(3)}`;
    const points = [at(s, -w / 2), at(e - head, -w / 2), at(e - head, -hw), at(e, 0), at(e - head, hw), at(e - head, w / 2), at(s, w / 2)].join(' ');
    const mid = (s + e - head) / 2;
    out.push({ key: `${ids[j]}>${ids[i]}`, from: ids[j], to: ids[i], kelvin: c, points, width: w, label: { x: a.x + ux * mid + nx * (off + w + 8 * px), y: a.y + uy * mid + ny * (off + w + 8 * px) } });
  }));
  return out.sort((p, q) => p.kelvin - q.kelvin);
}
