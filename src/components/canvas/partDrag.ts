/** d3-drag on the canvas parts layer: drags the grabbed part (and the rest of the selection) on the snap grid. */
import { drag, pointer, select, type ZoomTransform } from 'd3';
import type { Model } from '@shared/schemas/model';
import { snapTo, type Position } from './edits';
import { toModel } from './viewport';

/** What the drag needs to read from the canvas and tell it. */
export interface PartDragHooks {
  svg: () => SVGSVGElement | undefined;
  transform: () => ZoomTransform;
  model: () => Model;
  selection: () => string[];
  readonly: () => boolean;
  select: (ids: string[]) => void;
  start: () => void;
  move: (positions: Record<string, Position>) => void;
  end: (moved: boolean) => void;
}

const partIdOf = (target: EventTarget | null) =>
  (target as Element | null)?.closest?.('[data-part-id]')?.getAttribute('data-part-id') ?? null;

/** Attach the drag behaviour to `layer` (the <g> holding the parts); returns a detach function. */
export function attachPartDrag(layer: SVGGElement, hooks: PartDragHooks): () => void {
  let ids: string[] = [];
  let anchor = '';
  let start: Record<string, Position> = {};
  let from = { x: 0, y: 0 };
  let moved = false;

  const here = (e: { sourceEvent: Event }) => {
    const [px, py] = pointer(e.sourceEvent, hooks.svg());
    return toModel(hooks.transform(), hooks.model().stack.interposer.height * 1000, px, py);
  };

  const behaviour = drag<SVGGElement, unknown>()
    .filter((e: MouseEvent) => !hooks.readonly() && !e.button && !e.ctrlKey && partIdOf(e.target) !== null)
    .subject((e) => ({ id: partIdOf(e.sourceEvent.target) }))
    .on('start', (e) => {
      anchor = e.subject.id as string;
      const sel = hooks.selection();
      ids = sel.includes(anchor) ? sel : e.sourceEvent.shiftKey ? [...sel, anchor] : [anchor];
      if (ids !== sel) hooks.select(ids);
      start = Object.fromEntries(hooks.model().parts.filter((p) => ids.includes(p.id)).map((p) => [p.id, { x: p.x, y: p.y }]));
      from = here(e);
      moved = false;
    })
    .on('drag', (e) => {
      const at = here(e);
      const snap = hooks.model().settings.snap;
      const a = start[anchor];
      const dx = snapTo(a.x + at.x - from.x, snap) - a.x;
      const dy = snapTo(a.y + at.y - from.y, snap) - a.y;
      if (!moved && dx === 0 && dy === 0) return;
      if (!moved) hooks.start();
      moved = true;
      hooks.move(Object.fromEntries(Object.entries(start).map(([id, p]) => [id, { x: snapTo(p.x + dx, 1e-9), y: snapTo(p.y + dy, 1e-9) }])));
    })
    .on('end', () => hooks.end(moved));

  const sel = select(layer);
  sel.call(behaviour);
  return () => sel.on('.drag', null);
}
