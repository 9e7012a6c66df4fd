/**
 * The compact model behind the netlist export: the steady result of a scenario and, when the model
 * has heat capacities, the node-level Foster network fitted to the assembly impedance (physics.md §3).
 */
import type { AssemblyResult } from '@shared/engine/assembly/result';
import { EngineInputError } from '@shared/engine/errors';
import { assemblyImpedance, fitFosterNetwork, type FosterNetwork } from '@shared/engine/transient';
import type { Model } from '@shared/schemas/model';
import { compactModel, type CompactModel } from '@shared/export';

/** Which network the netlist holds: Foster when possible (auto), always steady, or Foster or a 400. */
export type NetlistKind = 'auto' | 'steady' | 'foster';

function fosterOf(model: Model, result: AssemblyResult): { network: FosterNetwork; note: string } {
  const imp = assemblyImpedance(model, { sources: 'nodes' });
  const expected = result.tierInfluence.nodes.map((n) => (n.tier === 0 ? n.partId : `${n.partId}/tier-${n.tier}`));
  if (imp.labels.join('|') !== expected.join('|')) throw new Error('The impedance nodes are ordered differently from the steady network.');
  const fit = fitFosterNetwork({ times: imp.times, Z: imp.Z, steady: imp.steady, labels: imp.labels });
  const worst = `${imp.labels[fit.worst.node]} <- ${imp.labels[fit.worst.source]}`;
  const note =
    `Foster fit of the impedance (Stehfest inversion, ${imp.times.length} times up to ${imp.settleTime.toPrecision(3)} s): ` +
    `largest error ${(100 * fit.worst.relError).toPrecision(2)} % of the entry's steady value (${worst})` +
    (fit.converged ? '.' : '; the non-negative fit hit its iteration bound for some entry.');
  return { network: fit.network, note };
}

/** Build the compact model; `kind` = auto falls back to the steady matrix when the transient cannot be computed. */
export function netlistModel(model: Model, result: AssemblyResult, kind: NetlistKind): CompactModel {
  if (kind === 'steady') return compactModel(result, undefined, ['Steady matrix requested: DC / operating point only.']);
  try {
    const { network, note } = fosterOf(model, result);
    return compactModel(result, network, [note]);
  } catch (e) {
    if (kind === 'foster' || !(e instanceof EngineInputError)) throw e;
    return compactModel(result, undefined, [`No transient network: ${e.message}`]);
  }
}
