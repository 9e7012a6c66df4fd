/** Where to drop a part added with "+": the free position nearest the interposer centre on a 0.5 mm grid. */
import type { Model } from '@shared/schemas/model';
import type { PartTemplate } from '@shared/schemas/library';
import { checkLayout } from '@shared/layout/rules';
import type { Position } from './edits';

const STEP = 0.0005; // 0.5 mm search grid

/** Free centre for `body` (no rule broken); the interposer centre when none is free. */
export function freeSpot(model: Model, body: PartTemplate['part']): Position {
  const { width: W, height: H } = model.stack.interposer;
  const centre = { x: W / 2, y: H / 2 };
  const candidates: Position[] = [];
  for (let x = STEP; x < W; x += STEP) for (let y = STEP; y < H; y += STEP) candidates.push({ x, y });
  candidates.sort((a, b) => Math.hypot(a.x - centre.x, a.y - centre.y) - Math.hypot(b.x - centre.x, b.y - centre.y));
  const probe = { ...body, id: '__probe__', x: 0, y: 0 };
  for (const c of candidates) {
    const trial = { ...model, parts: [...model.parts, { ...probe, ...c }] };
    if (!checkLayout(trial).some((v) => v.partIds.includes('__probe__'))) return c;
  }
  return centre;
}
