/** Set-up of the compare screen: which variants (route query), which scenarios they share, a common drawing extent. */
import type { Model } from '@shared/schemas/model';

/** At most this many variants side by side. */
export const MAX_COMPARED = 4;

/** Variant ids from the `v` query ("3,5,8" or repeated), unique, at most MAX_COMPARED + 1 (so "too many" can be told). */
export function parseIds(v: unknown): number[] {
  const raw = (Array.isArray(v) ? v : [v]).flatMap((x) => (typeof x === 'string' ? x.split(',') : []));
  const ids = raw.map((s) => Number(s.trim())).filter((n) => Number.isInteger(n) && n > 0);
  return [...new Set(ids)].slice(0, MAX_COMPARED + 1);
}

/** Scenarios present in every model (by id), labelled with the first model's names. */
export function sharedScenarios(models: Model[]): { label: string; value: string }[] {
  if (!models.length) return [];
  return models[0].scenarios
    .filter((s) => models.every((m) => m.scenarios.some((t) => t.id === s.id)))
    .map((s) => ({ label: s.name, value: s.id }));
}

/** View size (mm) that holds every model's lid and interposer, plus a 2 mm border (the substrate edge may be cut off). */
export function commonExtent(models: Model[]): { w: number; h: number } {
  let w = 10;
  let h = 10;
  for (const m of models) {
    const s = m.stack;
    w = Math.max(w, (s.lid.width + 2 * Math.abs(s.lid.offsetX)) * 1000, s.interposer.width * 1000);
    h = Math.max(h, (s.lid.height + 2 * Math.abs(s.lid.offsetY)) * 1000, s.interposer.height * 1000);
  }
  return { w: w + 4, h: h + 4 };
}
