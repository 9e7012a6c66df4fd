/**
 * The electro-thermal problem of one scenario (physics.md §4) from a model and its steady network:
 * every node keeps its scenario power as dynamic power; a part's leakage law and supply path act on
 * its die node (memory: the base die), with the scenario's supply current.
 */
import type { Model, Scenario } from '@shared/schemas/model';
import type { AssemblyNetwork } from '@shared/engine/assembly/network';
import type { CoupledProblem, NodePowerLaw } from '@shared/engine/electrothermal';
import { scenarioNodePowers, timelineNodes } from '@/components/timeline/nodes';

/** Power laws of every node for a scenario (dynamic = the scenario's node power). */
export function nodePowerLaws(model: Model, scenario: Scenario | undefined): NodePowerLaw[] {
  const powers = scenarioNodePowers(model, scenario);
  return timelineNodes(model).map((n, i) => {
    const part = model.parts[n.partIndex];
    if (n.tier !== 0 || !part.electrical) return { dynamic: powers[i] };
    return { ...part.electrical, dynamic: powers[i], current: scenario?.loads[n.partId]?.current ?? 0 };
  });
}

/** True when any part has leakage or a supply path, i.e. feedback can change anything. */
export function hasFeedback(model: Model): boolean {
  return model.parts.some((p) => (p.electrical?.leakageAtRef ?? 0) > 0 || (p.electrical?.pathResistance20 ?? 0) > 0);
}

/** The coupled problem over all nodes, with the network's influence matrix and fluid offsets. */
export function coupledProblem(model: Model, scenario: Scenario | undefined, net: Pick<AssemblyNetwork, 'R' | 'offsets'>): CoupledProblem {
  const nodes = timelineNodes(model);
  const n = nodes.length;
  const R = nodes.map((_, j) => Array.from(net.R.subarray(j * n, (j + 1) * n)));
  return { R, baseTemperatures: Array.from(net.offsets), laws: nodePowerLaws(model, scenario), labels: nodes.map((x) => x.label) };
}
