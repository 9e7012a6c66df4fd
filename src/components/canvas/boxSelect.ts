/** Shift-drag on the canvas background: a selection box; parts whose footprint meets it are selected. */
import { drag, pointer, select, type ZoomTransform } from 'd3';
import type { Model } from '@shared/schemas/model';
import { partRect } from '@shared/layout/rules';
import { toModel } from './viewport';

/** Screen rectangle of the box while it is drawn (px in the svg). */
export interface ScreenBox { x: number; y: number; width: number; height: number }

/** What the box selection reads and reports. */
export interface BoxSelectHooks {
  transform: () => ZoomTransform;
  model: () => Model;
  selection: () => string[];
  box: (b: ScreenBox | null) => void;
  select: (ids: string[]) => void;
}

/** Ids of parts meeting the model-space rectangle spanned by two screen points (added to `base`). */
export function partsInBox(model: Model, t: ZoomTransform, a: [number, number], b: [number, number], base: string[] = []): string[] {
  const Hmm = model.stack.interposer.height * 1000;
  const p = toModel(t, Hmm, a[0], a[1]);
  const q = toModel(t, Hmm, b[0], b[1]);
  const [x0, x1] = [Math.min(p.x, q.x), Math.max(p.x, q.x)];
  const [y0, y1] = [Math.min(p.y, q.y), Math.max(p.y, q.y)];
  const hit = model.parts.filter((part) => { const r = partRect(part); return r.x0 < x1 && r.x1 > x0 && r.y0 < y1 && r.y1 > y0; }).map((x) => x.id);
  return [...new Set([...base, ...hit])];
}

/** Attach shift-drag box selection to the svg; returns a detach function. */
export function attachBoxSelect(svg: SVGSVGElement, h: BoxSelectHooks): () => void {
  let from: [number, number] = [0, 0];
  let base: string[] = [];
  const behaviour = drag<SVGSVGElement, unknown>()
    .filter((e: MouseEvent) => e.shiftKey && !e.button && !(e.target as Element).closest('[data-part-id]'))
    .on('start', (e) => { from = pointer(e.sourceEvent, svg); base = [...h.selection()]; })
    .on('drag', (e) => {
      const to = pointer(e.sourceEvent, svg);
      h.box({ x: Math.min(from[0], to[0]), y: Math.min(from[1], to[1]), width: Math.abs(to[0] - from[0]), height: Math.abs(to[1] - from[1]) });
      h.select(partsInBox(h.model(), h.transform(), from, to, base));
    })
    .on('end', () => h.box(null));
  const sel = select(svg);
  sel.call(behaviour);
  return () => sel.on('.drag', null);
}
