/** How broken placement rules are marked on the canvas: severity per part and the overlap areas. */
import type { Model } from '@shared/schemas/model';
import { partRect, type RuleViolation } from '@shared/layout/rules';

/** Severity of a rule: overlap, outside and too-large stop the solve; a tight gap is a warning. */
export const ruleSeverity = (rule: RuleViolation['rule']): 'error' | 'warn' => (rule === 'gap' ? 'warn' : 'error');

/** The worst severity per part id. */
export function partMarks(violations: RuleViolation[]): Record<string, 'error' | 'warn'> {
  const out: Record<string, 'error' | 'warn'> = {};
  for (const v of violations) {
    const s = ruleSeverity(v.rule);
    for (const id of v.partIds) if (out[id] !== 'error') out[id] = s;
  }
  return out;
}

/** Overlapping areas (model m, centre + size) of every overlap violation. */
export function overlapAreas(model: Pick<Model, 'parts'>, violations: RuleViolation[]) {
  const byId = new Map(model.parts.map((p) => [p.id, partRect(p)]));
  return violations.flatMap((v) => {
    const [a, b] = v.partIds.map((id) => byId.get(id));
    if (v.rule !== 'overlap' || !a || !b) return [];
    const x0 = Math.max(a.x0, b.x0);
    const x1 = Math.min(a.x1, b.x1);
    const y0 = Math.max(a.y0, b.y0);
    const y1 = Math.min(a.y1, b.y1);
    return [{ key: v.partIds.join('|'), x: (x0 + x1) / 2, y: (y0 + y1) / 2, w: x1 - x0, h: y1 - y0 }];
  });
}
