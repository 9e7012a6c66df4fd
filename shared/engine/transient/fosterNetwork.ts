/**
 * A Foster network for a whole impedance matrix on one shared τ grid (physics.md §3):
 * Z_ji(t) ≈ Σ_k R[j][i][k]·(1 − e^{−t/τ_k}). Self terms are fitted non-negative, transfer
 * terms signed; by reciprocity only j ≥ i is fitted and mirrored.
 */
import { fitFoster, logSpacedTaus, signedFosterDesign, type FosterFitSettings } from './fosterFit';

/** Sampled step responses: Z[k][j][i] = rise of node j at times[k] per watt stepped on in source i (K/W). */
export interface ImpedanceSeries {
  times: number[];
  Z: number[][][];
  /** Steady influence matrix R[j][i] (K/W) = Z(t → ∞). */
  steady: number[][];
  /** Names of the rows (nodes). */
  labels?: string[];
  /** Names of the columns (sources); default the row names. */
  sourceLabels?: string[];
  /** Row of each source's own node (its self-impedance); default i. */
  sourceNodes?: number[];
}

/** Foster network: R[j][i][k] (K/W) from source i to node j on time constants tau[k] (s). */
export interface FosterNetwork {
  tau: number[];
  R: number[][][];
  /** Row (node) names. */
  labels: string[];
  /** Column (source) names; default the row names. */
  sourceLabels?: string[];
  /** Row whose temperature each source's own power law reads; default i. */
  sourceNodes?: number[];
}

/** Settings of fitFosterNetwork (defaults in FOSTER_NETWORK_DEFAULTS). */
export interface FosterNetworkSettings {
  /** Time constants per decade of the shared grid. */
  perDecade: number;
  /** τ grid range; defaults to [first time / 2, last time]. */
  tauMin?: number;
  tauMax?: number;
  fit?: Partial<Omit<FosterFitSettings, 'sign'>>;
}

/** Default network fit settings. */
export const FOSTER_NETWORK_DEFAULTS: FosterNetworkSettings = { perDecade: 4 };

/** A fitted network with the fit error of each entry. */
export interface FosterNetworkFit {
  network: FosterNetwork;
  /** maxAbsError[j][i] (K/W) and relError[j][i] (relative to |R_steady|). */
  maxAbsError: number[][];
  relError: number[][];
  /** Entry with the largest relative error. */
  worst: { node: number; source: number; relError: number };
  converged: boolean;
}

/**
 * Fit every entry of an impedance matrix with Foster terms on one shared τ grid. A square matrix
 * whose sources are its own nodes is symmetric (reciprocity): only j ≥ i is fitted and mirrored.
 */
export function fitFosterNetwork(series: ImpedanceSeries, settings: Partial<FosterNetworkSettings> = {}): FosterNetworkFit {
  const o = { ...FOSTER_NETWORK_DEFAULTS, ...settings };
  const { times, Z, steady } = series;
  const rows = steady.length;
  const cols = rows > 0 ? steady[0].length : 0;
  const own = (i: number) => series.sourceNodes?.[i] ?? i;
  const symmetric = rows === cols && steady.every((_, i) => own(i) === i);
  const tau = logSpacedTaus(o.tauMin ?? times[0] / 2, o.tauMax ?? times[times.length - 1], o.perDecade);
  const R = steady.map(() => new Array<number[]>(cols));
  const maxAbsError = steady.map(() => new Array<number>(cols).fill(0));
  const relError = steady.map(() => new Array<number>(cols).fill(0));
  let worst = { node: 0, source: 0, relError: 0 };
  let converged = true;
  const design = signedFosterDesign(times, tau, o.fit);
  for (let j = 0; j < rows; j++) {
    for (let i = 0; i < (symmetric ? j + 1 : cols); i++) {
      const mirror = symmetric && i !== j;
      const values = times.map((_, k) => (mirror ? 0.5 * (Z[k][j][i] + Z[k][i][j]) : Z[k][j][i]));
      const sign = own(i) === j ? 'nonnegative' : 'signed';
      const f = fitFoster(times, values, tau, mirror ? 0.5 * (steady[j][i] + steady[i][j]) : steady[j][i], { ...o.fit, sign }, design);
      converged &&= f.converged;
      R[j][i] = f.R;
      maxAbsError[j][i] = f.maxAbsError;
      relError[j][i] = f.relError;
      if (mirror) {
        R[i][j] = f.R;
        maxAbsError[i][j] = f.maxAbsError;
        relError[i][j] = f.relError;
      }
      if (f.relError > worst.relError) worst = { node: j, source: i, relError: f.relError };
    }
  }
  const labels = series.labels ?? steady.map((_, j) => `node-${j}`);
  const network: FosterNetwork = { tau, R, labels };
  if (series.sourceLabels) network.sourceLabels = series.sourceLabels;
  if (series.sourceNodes) network.sourceNodes = series.sourceNodes;
  return { network, maxAbsError, relError, worst, converged };
}

/** Step response matrix of a network at time t: Z[j][i] (K/W). */
export function networkStep(network: FosterNetwork, t: number): number[][] {
  const e = network.tau.map((tk) => -Math.expm1(-t / tk));
  return network.R.map((row) => row.map((terms) => terms.reduce((s, r, k) => s + r * e[k], 0)));
}

/** The same network restricted to some rows (nodes); sources keep their columns, sourceNodes are re-indexed (−1 if dropped). */
export function selectRows(network: FosterNetwork, rows: readonly number[]): FosterNetwork {
  const where = new Map(rows.map((j, q) => [j, q]));
  const sources = network.R[0]?.length ?? 0;
  return {
    tau: network.tau,
    R: rows.map((j) => network.R[j]),
    labels: rows.map((j) => network.labels[j]),
    sourceLabels: network.sourceLabels ?? network.labels.slice(0, sources),
    sourceNodes: Array.from({ length: sources }, (_, i) => where.get(network.sourceNodes?.[i] ?? i) ?? -1),
  };
}
