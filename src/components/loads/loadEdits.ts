/** Scenario and load edits on a model draft (from the variant store's `edit`). */
import type { Model, Part, PartLoad, PowerMap, Scenario } from '@shared/schemas/model';

/** The load of a part in a scenario, created (zero power, zero tiers) when missing. */
export function loadOf(draft: Model, scenarioId: string, part: Part): PartLoad {
  const s = draft.scenarios.find((x) => x.id === scenarioId);
  if (!s) throw new Error(`no scenario ${scenarioId}`);
  s.loads[part.id] ??= { power: 0 };
  const load = s.loads[part.id];
  if (part.memory) {
    const tiers = load.tiers ?? [];
    load.tiers = Array.from({ length: part.memory.tiers }, (_, i) => tiers[i] ?? 0);
  }
  return load;
}

/** Total power of a part in a scenario, W: base die plus DRAM tiers. */
export function totalPower(load: PartLoad | undefined): number {
  return load ? load.power + (load.tiers ?? []).reduce((a, b) => a + b, 0) : 0;
}

/** A free scenario id derived from a name ("memory bound" → "memory-bound", "memory-bound-2", …). */
export function scenarioId(model: Model, name: string): string {
  const base = name.toLowerCase().replace(/[^a-z0-9_.-]+/g, '-').replace(/^-+|-+$/g, '').slice(0, 32) || 'scenario';
  const taken = new Set(model.scenarios.map((s) => s.id));
  if (!taken.has(base)) return base;
  for (let n = 2; n < 100; n++) if (!taken.has(`${base}-${n}`)) return `${base}-${n}`;
  return `${base}-${taken.size + 1}`;
}

/** Add a scenario copying the loads (not the time profile) of `from`; returns its id. */
export function addScenario(draft: Model, name: string, from?: Scenario): string {
  const id = scenarioId(draft, name);
  const loads = from ? structuredClone(from.loads) : Object.fromEntries(draft.parts.map((p) => [p.id, { power: 0 }]));
  draft.scenarios.push({ id, name, loads });
  return id;
}

/** Rename a scenario (its id, used by results and profiles, stays). */
export function renameScenario(draft: Model, id: string, name: string): void {
  const s = draft.scenarios.find((x) => x.id === id);
  if (s) s.name = name;
}

/** Remove a scenario (never the last); profiles that started from it start from ambient. */
export function removeScenario(draft: Model, id: string): void {
  if (draft.scenarios.length <= 1) return;
  draft.scenarios = draft.scenarios.filter((s) => s.id !== id);
  for (const s of draft.scenarios) if (s.profile?.startFrom === id) s.profile.startFrom = 'ambient';
}

/** Set a part's power map in a scenario (undefined removes it: uniform power). */
export function setPowerMap(draft: Model, scenarioId: string, part: Part, map: PowerMap | undefined): void {
  const load = loadOf(draft, scenarioId, part);
  if (map) load.map = map;
  else delete load.map;
}
