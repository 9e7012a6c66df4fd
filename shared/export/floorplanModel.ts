/**
 * A floorplan applied to a base model: parts matched by id or name keep their layers, limits and
 * electrical data and take the floorplan's position and size; new parts copy the layers of a base part
 * of the same kind (else FLOORPLAN_DEFAULTS). The floorplan's powers become a new first scenario; the
 * base scenarios keep their loads for the parts that remain.
 */
import { modelSchema, type Model, type Part, type Scenario } from '../schemas/model';
import { FLOORPLAN_DEFAULTS } from './floorplanDefaults';
import { idFromName, type FloorplanPart } from './floorplanCsv';

/** Name of the scenario that holds the floorplan's powers. */
export const FLOORPLAN_SCENARIO_NAME = 'From floorplan CSV';

function uniqueId(base: string, taken: Set<string>): string {
  let id = base;
  for (let k = 2; taken.has(id); k++) id = `${base}-${k}`;
  return id;
}

function bodyFor(row: FloorplanPart, match: Part | undefined, base: Model): Omit<Part, 'id' | 'name' | 'kind' | 'x' | 'y' | 'width' | 'height' | 'rotation'> {
  const donor = match && match.kind === row.kind ? match : base.parts.find((p) => p.kind === row.kind);
  if (!donor) return structuredClone(FLOORPLAN_DEFAULTS[row.kind]);
  const { die, tim1, bumps, memory, limits, electrical } = structuredClone(donor);
  return { die, tim1, bumps, limits, ...(memory ? { memory } : {}), ...(donor === match && electrical ? { electrical } : {}) };
}

/** The base model with its parts replaced by the floorplan's (valid against modelSchema). */
export function floorplanToModel(base: Model, plan: FloorplanPart[]): Model {
  const byId = new Map(base.parts.map((p) => [p.id, p]));
  const byName = new Map(base.parts.map((p) => [p.name.toLowerCase(), p]));
  const taken = new Set<string>();
  const used = new Set<string>();
  const parts: Part[] = plan.map((row) => {
    const candidate = byId.get(row.id) ?? byName.get(row.name.toLowerCase());
    const match = candidate && !used.has(candidate.id) ? candidate : undefined;
    if (match) used.add(match.id);
    const id = match ? match.id : idFromName(row.name, new Set([...taken, ...byId.keys()]));
    taken.add(id);
    const rotation = match?.kind === row.kind ? match.rotation : 0;
    return { id, name: row.name, kind: row.kind, x: row.x, y: row.y, width: row.width, height: row.height, rotation, ...bodyFor(row, match, base) };
  });
  const tierCount = new Map(parts.map((p) => [p.id, p.memory?.tiers ?? 0]));
  const keep = new Set(parts.map((p) => p.id));
  const kept = base.scenarios.map((s): Scenario => {
    const loads = Object.fromEntries(
      Object.entries(s.loads)
        .filter(([id]) => keep.has(id))
        .map(([id, load]) => [id, load.tiers ? { ...load, tiers: load.tiers.slice(0, tierCount.get(id)) } : load]),
    );
    if (!s.profile) return { ...s, loads };
    const profileParts = Object.fromEntries(Object.entries(s.profile.parts).filter(([id]) => keep.has(id)));
    return { ...s, loads, profile: { ...s.profile, parts: profileParts } };
  });
  const scenarioId = uniqueId('floorplan', new Set(base.scenarios.map((s) => s.id)));
  const fromPlan: Scenario = { id: scenarioId, name: FLOORPLAN_SCENARIO_NAME, loads: Object.fromEntries(parts.map((p, i) => [p.id, { power: plan[i].power }])) };
  return modelSchema.parse({ ...structuredClone(base), parts, scenarios: [fromPlan, ...kept].slice(0, 20) });
}
