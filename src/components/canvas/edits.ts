/** Placement edits on a model draft (from the variant store's `edit`): place, move, nudge, rotate, delete. */
import type { Model, Part, PartKind } from '@shared/schemas/model';
import type { PartTemplate } from '@shared/schemas/library';

/** Position of a part centre, m. */
export interface Position { x: number; y: number }

const idPrefix: Record<PartKind, string> = { compute: 'cpu', io: 'io', memory: 'mem', bridge: 'br', passive: 'pas' };

/** Round a length (m) to the snap grid; the result is cleaned to 1 nm to keep the numbers tidy. */
export function snapTo(v: number, step: number): number {
  const s = step > 0 ? Math.round(v / step) * step : v;
  return Math.round(s * 1e9) / 1e9;
}

/** A free id like "mem3" for a new part of that kind. */
export function nextPartId(model: Model, kind: PartKind): string {
  const taken = new Set(model.parts.map((p) => p.id));
  for (let n = 0; n < 1000; n++) if (!taken.has(`${idPrefix[kind]}${n}`)) return `${idPrefix[kind]}${n}`;
  return `${idPrefix[kind]}-${taken.size}`;
}

/** Add a part from a template at (x, y) snapped; every scenario gets a zero load for it. Returns its id. */
export function placePart(draft: Model, body: PartTemplate['part'], at: Position): string {
  const id = nextPartId(draft, body.kind);
  const same = draft.parts.filter((p) => p.kind === body.kind).length;
  const snap = draft.settings.snap;
  const part: Part = { ...structuredClone(body), id, name: `${body.name} ${same + 1}`, x: snapTo(at.x, snap), y: snapTo(at.y, snap) };
  draft.parts.push(part);
  for (const s of draft.scenarios) {
    s.loads[id] = part.memory ? { power: 0, tiers: Array(part.memory.tiers).fill(0) } : { power: 0 };
  }
  return id;
}

/** A copy of `model` with the given part centres (no undo step: used while dragging). */
export function withPositions(model: Model, positions: Record<string, Position>): Model {
  return { ...model, parts: model.parts.map((p) => (positions[p.id] ? { ...p, ...positions[p.id] } : p)) };
}

/** Move parts by (dx, dy) metres. */
export function nudgeParts(draft: Model, ids: string[], dx: number, dy: number): void {
  for (const p of draft.parts) {
    if (!ids.includes(p.id)) continue;
    p.x = Math.round((p.x + dx) * 1e9) / 1e9;
    p.y = Math.round((p.y + dy) * 1e9) / 1e9;
  }
}

/** Rotate parts by 90° about their own centres. */
export function rotateParts(draft: Model, ids: string[]): void {
  for (const p of draft.parts) if (ids.includes(p.id)) p.rotation = (((p.rotation ?? 0) + 90) % 360) as Part['rotation'];
}

/** Remove parts with their loads and time profiles. */
export function deleteParts(draft: Model, ids: string[]): void {
  draft.parts = draft.parts.filter((p) => !ids.includes(p.id));
  for (const s of draft.scenarios) {
    for (const id of ids) {
      delete s.loads[id];
      if (s.profile) delete s.profile.parts[id];
    }
  }
}
