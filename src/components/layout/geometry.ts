/** Footprint geometry of placed parts (model units: m; the screen shows mm). */
import type { Part } from '@shared/schemas/model';
import { partRect } from '@shared/layout/rules';

/** Axis-aligned footprint of a part after rotation: centre and size, m. */
export interface Rect { x: number; y: number; w: number; h: number }

/** The part's footprint with 90°/270° rotation swapping width and height. */
export function footprint(p: Pick<Part, 'x' | 'y' | 'width' | 'height' | 'rotation'>): Rect {
  const r = partRect(p);
  return { x: p.x, y: p.y, w: r.w, h: r.h };
}

/** Metres to millimetres for display. */
export const mm = (m: number) => m * 1000;
/** Millimetres to metres for the model. */
export const toM = (v: number) => v / 1000;

/** Fill colours per part kind (our own palette; data colours come from perceptual maps). */
export const kindColour: Record<Part['kind'], string> = {
  compute: '#c4622d',
  io: '#5b7fb8',
  memory: '#3f8f7a',
  bridge: '#8c8c9a',
  passive: '#b0a27a',
};
