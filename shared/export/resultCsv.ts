/**
 * Result CSVs: the influence matrix (K/W), a scenario's contribution matrix (K) and the temperature
 * table. Units sit in the header row; rows and columns are named by part id (memory tiers as "id/tier N").
 */
import type { AssemblyResult } from '../engine/assembly/result';
import { toCsv, type Cell } from './csv';

/** Which matrix to write: part-level R, node-level R (every memory tier), or R_ij·P_j of the scenario. */
export type MatrixKind = 'influence' | 'nodes' | 'contribution';

/** The label of a network node: the part id, or "id/tier N" for DRAM tier N. */
export const nodeLabel = (n: { partId: string; tier: number }): string => (n.tier === 0 ? n.partId : `${n.partId}/tier ${n.tier}`);

/** A square matrix as CSV: the corner cell states what an entry means and its unit. */
export function matrixCsv(result: AssemblyResult, kind: MatrixKind = 'influence'): string {
  const corner: Record<MatrixKind, string> = {
    influence: 'R (K/W): rise of row part per W in column part',
    nodes: 'R (K/W): rise of row node per W in column node',
    contribution: `ΔT (K): rise of row part caused by column part, scenario "${result.scenario.name}"`,
  };
  const labels = kind === 'nodes' ? result.tierInfluence.nodes.map(nodeLabel) : result.influence.partIds;
  const m = kind === 'nodes' ? result.tierInfluence.matrix : kind === 'contribution' ? result.contributions : result.influence.matrix;
  return toCsv([[corner[kind], ...labels], ...m.map((row, i) => [labels[i], ...row] as Cell[])]);
}

/** Header row of the temperature table. */
export const TEMPERATURE_COLUMNS = [
  'scenario', 'part id', 'part name', 'kind', 'node', 'power (W)', 'mean temperature (°C)', 'hot spot (°C)', 'limit (°C)',
  'extended limit (°C)', 'margin (K)', 'self resistance (K/W)', 'coupling share (%)', 'heat to lid (W)', 'heat to board (W)',
] as const;

/** Rows of the temperature table for one scenario's result: one per part, then one per DRAM tier. */
export function temperatureRows(result: AssemblyResult): Cell[][] {
  const rows: Cell[][] = [];
  for (const p of result.parts) {
    const junctionPower = p.power - p.tiers.reduce((s, t) => s + t.power, 0);
    rows.push([
      result.scenario.id, p.id, p.name, p.kind, 'junction', junctionPower, p.junction, p.peak, p.limit, p.extendedLimit, p.margin,
      p.selfResistance, 100 * p.couplingShare, p.heatUp, p.heatDown,
    ]);
    for (const t of p.tiers) {
      rows.push([result.scenario.id, p.id, p.name, p.kind, `tier ${t.tier}`, t.power, t.temperature, null, p.limit, p.extendedLimit, null, null, null, null, null]);
    }
  }
  return rows;
}

/** The temperature table of one or more scenario results as CSV. */
export function temperaturesCsv(results: AssemblyResult[]): string {
  return toCsv([[...TEMPERATURE_COLUMNS], ...results.flatMap(temperatureRows)]);
}
