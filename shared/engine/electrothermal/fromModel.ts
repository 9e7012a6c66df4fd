/**
 * The electro-thermal problem of one scenario of a model (physics.md §2, §4): the assembly's node
 * influence matrix and fluid offsets, each part's dynamic power, leakage law and copper path at its
 * junction node (for a memory stack: its base die), the tier powers fixed.
 */
import type { Model } from '../../schemas/model';
import { assemblyNetwork, type AssemblyNetwork } from '../assembly/network';
import { findScenario, loadOf } from '../assembly/loads';
import { analyseCoupling, type CouplingOptions, type CouplingResult } from './analyseCoupling';
import type { NodePowerLaw } from './powerLaw';
import type { CoupledProblem } from './solveCoupled';

/** Coupled problem of a scenario (by id; the first when absent) on a model's steady network. */
export function coupledProblemFromModel(model: Model, scenarioId?: string, net: AssemblyNetwork = assemblyNetwork(model)): CoupledProblem {
  const { scenario } = findScenario(model, scenarioId);
  const n = net.nodes.length;
  const laws: NodePowerLaw[] = net.nodes.map(() => ({ dynamic: 0 }));
  const labels = net.nodes.map((node) => {
    const id = model.parts[node.partIndex].id;
    return node.tier === 0 ? id : `${id}/tier-${node.tier}`;
  });
  model.parts.forEach((part, p) => {
    const load = loadOf(scenario, part.id);
    const first = net.junctionNode[p];
    const e = part.electrical;
    laws[first] = {
      dynamic: load.power,
      leakageAtRef: e?.leakageAtRef,
      referenceTemperature: e?.referenceTemperature,
      kappa: e?.kappa,
      current: load.current,
      pathResistance20: e?.pathResistance20,
      alpha: e?.alpha,
    };
    (load.tiers ?? []).forEach((w, k) => (laws[first + 1 + k] = { dynamic: w }));
  });
  return {
    R: Array.from({ length: n }, (_, j) => Array.from(net.R.subarray(j * n, (j + 1) * n))),
    baseTemperatures: Array.from(net.offsets),
    laws,
    labels,
  };
}

/** Electro-thermal analysis of a scenario; the ambient of the margins is the top fluid temperature. */
export function analyseModelCoupling(model: Model, scenarioId?: string, options: CouplingOptions = {}, net?: AssemblyNetwork): CouplingResult {
  const problem = coupledProblemFromModel(model, scenarioId, net);
  return analyseCoupling(problem, { ambient: model.stack.cooling.top.fluidTemperature, ...options });
}
