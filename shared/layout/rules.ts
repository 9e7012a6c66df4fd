/** Placement rules checked live on the canvas and before any solve: overlap, outside, gap, too large. */
import type { Model, Part } from '../schemas/model';

/** One broken rule, tied to the part(s) involved. */
export interface RuleViolation {
  rule: 'overlap' | 'outside' | 'gap' | 'too-large';
  partIds: string[];
  message: string;
}

/** Axis-aligned footprint (m) of a part after rotation. */
export function partRect(p: Pick<Part, 'x' | 'y' | 'width' | 'height' | 'rotation'>) {
  const swap = p.rotation === 90 || p.rotation === 270;
  const w = swap ? p.height : p.width;
  const h = swap ? p.width : p.height;
  return { x0: p.x - w / 2, x1: p.x + w / 2, y0: p.y - h / 2, y1: p.y + h / 2, w, h };
}

const EPS = 1e-9; // 1 nm: touching edges are not an overlap
const mm = (m: number) => `${(m * 1000).toFixed(2)} mm`;

/** Gap between two rectangles (0 when they touch or overlap), and whether they overlap. */
function separation(a: ReturnType<typeof partRect>, b: ReturnType<typeof partRect>) {
  const dx = Math.max(a.x0 - b.x1, b.x0 - a.x1);
  const dy = Math.max(a.y0 - b.y1, b.y0 - a.y1);
  return { overlap: dx < -EPS && dy < -EPS, gap: Math.max(dx, dy, 0) };
}

/** Every rule the model's placement breaks (empty when it may be solved). */
export function checkLayout(model: Pick<Model, 'parts' | 'stack' | 'settings'>): RuleViolation[] {
  const out: RuleViolation[] = [];
  const W = model.stack.interposer.width;
  const H = model.stack.interposer.height;
  const minGap = model.settings?.minGap ?? 0.0002;
  const rects = model.parts.map(partRect);
  model.parts.forEach((p, i) => {
    const r = rects[i];
    if (r.w > W + EPS || r.h > H + EPS) {
      out.push({ rule: 'too-large', partIds: [p.id], message: `${p.name} (${mm(r.w)} × ${mm(r.h)}) is larger than the interposer (${mm(W)} × ${mm(H)}).` });
    } else if (r.x0 < -EPS || r.y0 < -EPS || r.x1 > W + EPS || r.y1 > H + EPS) {
      out.push({ rule: 'outside', partIds: [p.id], message: `${p.name} reaches outside the interposer.` });
    }
  });
  for (let i = 0; i < rects.length; i++) {
    for (let j = i + 1; j < rects.length; j++) {
      const a = model.parts[i];
      const b = model.parts[j];
      const s = separation(rects[i], rects[j]);
      if (s.overlap) out.push({ rule: 'overlap', partIds: [a.id, b.id], message: `${a.name} overlaps ${b.name}.` });
      else if (s.gap < minGap - EPS) {
        out.push({ rule: 'gap', partIds: [a.id, b.id], message: `${a.name} and ${b.name} are ${mm(s.gap)} apart; the minimum gap is ${mm(minGap)}.` });
      }
    }
  }
  return out;
}
