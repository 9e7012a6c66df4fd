/** Cross-checks of a model that its schema cannot express: unique ids, loads and profiles naming real parts, tier and map sizes. */
import type { Model } from '../schemas/model';
import type { ImportIssue } from './modelJson';

function duplicates(ids: string[]): string[] {
  const seen = new Set<string>();
  return [...new Set(ids.filter((id) => (seen.has(id) ? true : (seen.add(id), false))))];
}

/** Every reference problem of a schema-valid model (empty when it is consistent). */
export function checkModelReferences(model: Model): ImportIssue[] {
  const issues: ImportIssue[] = [];
  const parts = new Map(model.parts.map((p) => [p.id, p]));
  for (const id of duplicates(model.parts.map((p) => p.id))) issues.push({ path: 'parts', message: `Two or more parts have the id "${id}".` });
  for (const id of duplicates(model.scenarios.map((s) => s.id))) issues.push({ path: 'scenarios', message: `Two or more scenarios have the id "${id}".` });
  const scenarioIds = new Set(model.scenarios.map((s) => s.id));
  model.scenarios.forEach((s, k) => {
    for (const [id, load] of Object.entries(s.loads)) {
      const at = `scenarios[${k}].loads.${id}`;
      const part = parts.get(id);
      if (!part) {
        issues.push({ path: at, message: `Scenario "${s.name}" gives power to "${id}", which is not a part of this model.` });
        continue;
      }
      const tiers = part.memory?.tiers ?? 0;
      if ((load.tiers?.length ?? 0) > tiers) issues.push({ path: `${at}.tiers`, message: `"${part.name}" has ${tiers} DRAM tier(s) but ${load.tiers!.length} tier powers are given.` });
      if (load.map && load.map.weights.length !== load.map.nx * load.map.ny) {
        issues.push({ path: `${at}.map`, message: `The power map needs nx·ny = ${load.map.nx * load.map.ny} weights, not ${load.map.weights.length}.` });
      }
    }
    for (const id of Object.keys(s.profile?.parts ?? {})) {
      if (!parts.has(id)) issues.push({ path: `scenarios[${k}].profile.parts.${id}`, message: `The time profile names "${id}", which is not a part of this model.` });
    }
    const start = s.profile?.startFrom;
    if (start && start !== 'ambient' && !scenarioIds.has(start)) {
      issues.push({ path: `scenarios[${k}].profile.startFrom`, message: `The profile starts from scenario "${start}", which does not exist.` });
    }
  });
  return issues;
}
