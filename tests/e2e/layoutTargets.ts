/** Where the layout browser test moves a memory stack: a rule-free spot beside a compute chiplet, found on the saved model. */
import { checkLayout, partRect } from '@shared/layout/rules';
import type { Model, Part } from '@shared/schemas/model';

/** A memory stack, a compute chiplet beside which it can sit without breaking a rule, and that centre (m). */
export interface BesideMove { memory: Part; compute: Part; x: number; y: number }

const STEP = 0.0005; // 0.5 mm search step
const GAP = 0.0006; // 0.6 mm: above the 0.2 mm minimum gap (common practice) with room for pointer rounding

/** First memory/compute pair with a free spot along one side of the compute at least 1 mm from where the memory is. */
export function besideMove(model: Model): BesideMove | null {
  for (const compute of model.parts.filter((p) => p.kind === 'compute')) {
    for (const memory of model.parts.filter((p) => p.kind === 'memory')) {
      const c = partRect(compute);
      const m = partRect(memory);
      const spots: { x: number; y: number }[] = [];
      for (let y = c.y0 + m.h / 2; y <= c.y1 - m.h / 2 + 1e-9; y += STEP) spots.push({ x: c.x1 + GAP + m.w / 2, y }, { x: c.x0 - GAP - m.w / 2, y });
      for (let x = c.x0 + m.w / 2; x <= c.x1 - m.w / 2 + 1e-9; x += STEP) spots.push({ x, y: c.y1 + GAP + m.h / 2 }, { x, y: c.y0 - GAP - m.h / 2 });
      for (const s of spots) {
        if (Math.hypot(s.x - memory.x, s.y - memory.y) < 0.001) continue;
        const trial = { ...model, parts: model.parts.map((p) => (p.id === memory.id ? { ...p, ...s } : p)) };
        if (checkLayout(trial).length === 0) return { memory, compute, ...s };
      }
    }
  }
  return null;
}
