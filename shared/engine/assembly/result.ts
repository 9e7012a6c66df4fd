/** Result shapes of solveAssembly (temperatures °C, rises K, powers W, resistances K/W, lengths m). */
import type { PartKind } from '../../schemas/model';
import type { TruncationReport } from '../truncation';

/** A plane map: values[iy·nx + ix] (°C) at cell centres (x0 + (ix+½)dx, y0 + (iy+½)dy), interposer coordinates. */
export interface MapResult {
  nx: number;
  ny: number;
  x0: number;
  y0: number;
  dx: number;
  dy: number;
  values: number[];
}

/** Per-part figures of one scenario. */
export interface PartResult {
  id: string;
  name: string;
  kind: PartKind;
  /** Total power of the part (junction + tiers), W. */
  power: number;
  /** Mean junction temperature (memory: base die), °C. */
  junction: number;
  /** Junction hot spot, °C, and where (m). */
  peak: number;
  peakAt: { x: number; y: number };
  /** Memory tiers 1 … N (empty for other parts): power (W) and mean temperature (°C). */
  tiers: { tier: number; power: number; temperature: number }[];
  /** Heat leaving the part into the lid plane and into the interposer plane, W (negative = heat taken in). */
  heatUp: number;
  heatDown: number;
  /** JEDEC-style self resistance R_ii: junction rise per W at its own junction, K/W. */
  selfResistance: number;
  /** Fraction of the part's junction rise caused by the other parts (0 … 1; can leave that range when rises are negative). */
  couplingShare: number;
  /** Junction temperature at zero power (from the fluids), °C. */
  fluidOffset: number;
  limit: number;
  extendedLimit: number | null;
  /** limit − hottest, K (negative = over): logic parts use the hot spot; memory stacks the base-die mean and the tiers. */
  margin: number;
}

/** Everything solveAssembly returns. */
export interface AssemblyResult {
  scenario: { id: string; name: string };
  parts: PartResult[];
  /** matrix[i][j]: rise of part i's junction per W at part j's junction (K/W), symmetric. */
  influence: { partIds: string[]; matrix: number[][] };
  /** contributions[i][j]: rise of part i's junction caused by part j's power in this scenario (K). */
  contributions: number[][];
  /** Node-level matrix (every memory tier a node), same convention as `influence`. */
  tierInfluence: { nodes: { partId: string; tier: number }[]; matrix: number[][] };
  /** Heat to the lid side and the board side (W); relativeError = |toTop + toBottom − power| / power. */
  energyBalance: { power: number; toTop: number; toBottom: number; relativeError: number };
  maps: { interposer: MapResult; lid: MapResult | null };
  truncation: { lid: TruncationReport | null; interposer: TruncationReport };
  idealisations: string[];
  warnings: string[];
}
