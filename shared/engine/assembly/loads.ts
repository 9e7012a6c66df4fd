/** Scenario loads → node powers (W) of the network, with checks that name the field at fault. */
import type { Model, PartLoad, Scenario } from '../../schemas/model';
import { EngineInputError } from '../errors';
import type { AssemblyNetwork } from './network';

/** Find a scenario by id (the first one when id is absent). */
export function findScenario(model: Model, id?: string): { scenario: Scenario; index: number } {
  const index = id === undefined ? 0 : model.scenarios.findIndex((s) => s.id === id);
  if (index < 0) {
    const known = model.scenarios.map((s) => s.id).join(', ');
    throw new EngineInputError('scenario', `There is no scenario "${id}" in this model (it has: ${known}).`);
  }
  return { scenario: model.scenarios[index], index };
}

/** The load of a part in a scenario (zero when absent). */
export function loadOf(scenario: Scenario, partId: string): PartLoad {
  return scenario.loads[partId] ?? { power: 0 };
}

/** Node powers (W) of a scenario: a part's `power` at its junction, memory `tiers` at tier nodes 1 … N. */
export function nodePowers(model: Model, net: AssemblyNetwork, scenario: Scenario, scenarioIndex = 0): Float64Array {
  const out = new Float64Array(net.nodes.length);
  const ids = new Set(model.parts.map((p) => p.id));
  for (const id of Object.keys(scenario.loads)) {
    if (!ids.has(id)) throw new EngineInputError(`scenarios[${scenarioIndex}].loads.${id}`, `Scenario "${scenario.name}" gives power to "${id}", which is not a part of this model.`);
  }
  model.parts.forEach((part, p) => {
    const load = loadOf(scenario, part.id);
    const at = `scenarios[${scenarioIndex}].loads.${part.id}`;
    const first = net.junctionNode[p];
    out[first] = load.power;
    const tiers = load.tiers ?? [];
    const count = part.memory?.tiers ?? 0;
    if (tiers.length > count) {
      throw new EngineInputError(`${at}.tiers`, `Part "${part.name}" has ${count} DRAM tier(s) but the scenario gives ${tiers.length} tier powers.`);
    }
    tiers.forEach((w, k) => (out[first + 1 + k] = w));
    if (load.map && load.map.weights.length !== load.map.nx * load.map.ny) {
      throw new EngineInputError(`${at}.map`, `The power map of "${part.name}" needs nx·ny = ${load.map.nx * load.map.ny} weights, not ${load.map.weights.length}.`);
    }
    if (load.map && !load.map.weights.some((w) => w > 0)) {
      throw new EngineInputError(`${at}.map`, `The power map of "${part.name}" has no positive weight.`);
    }
  });
  return out;
}

/** Total power (W) of each part: junction plus tiers. */
export function partPowers(net: AssemblyNetwork, powers: Float64Array): number[] {
  return net.columns.map((c, p) => {
    let sum = 0;
    for (let k = 0; k < c.nodes.length; k++) sum += powers[net.junctionNode[p] + k];
    return sum;
  });
}
