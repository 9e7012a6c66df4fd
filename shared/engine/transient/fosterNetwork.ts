/**
 * A Foster network for a whole impedance matrix on one shared τ grid (physics.md §3):
 * Z_ji(t) ≈ Σ_k R[j][i][k]·(1 − e^{−t/τ_k}). Self terms are fitted non-negative, transfer
 * terms signed; by reciprocity only j ≥ i is fitted and mirrored.
 */
import { fitFoster, logSpacedTaus, type FosterFitSettings } from './fosterFit';

/** Sampled step responses: Z[k][j][i] = rise of node j at times[k] per watt stepped on in node i (K/W). */
export interface ImpedanceSeries {
  times: number[];
  Z: number[][][];
  /** Steady influence matrix R[j][i] (K/W) = Z(t → ∞). */
  steady: number[][];
  labels?: string[];
}

/** Foster network of N nodes: R[j][i][k] (K/W) on time constants tau[k] (s). */
export interface FosterNetwork {
  tau: number[];
  R: number[][][];
  labels: string[];
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

/** Fit every entry of an impedance matrix with Foster terms on one shared τ grid. */
export function fitFosterNetwork(series: ImpedanceSeries, settings: Partial<FosterNetworkSettings> = {}): FosterNetworkFit {
  const o = { ...FOSTER_NETWORK_DEFAULTS, ...settings };
  const { times, Z, steady } = series;
  const n = steady.length;
  const tau = logSpacedTaus(o.tauMin ?? times[0] / 2, o.tauMax ?? times[times.length - 1], o.perDecade);
  const R = steady.map(() => steady.map(() => [] as number[]));
  const maxAbsError = steady.map(() => new Array<number>(n).fill(0));
  const relError = steady.map(() => new Array<number>(n).fill(0));
  let worst = { node: 0, source: 0, relError: 0 };
  let converged = true;
  for (let j = 0; j < n; j++) {
    for (let i = 0; i <= j; i++) {
      const values = times.map((_, k) => (j === i ? Z[k][j][i] : 0.5 * (Z[k][j][i] + Z[k][i][j])));
      const sign = j === i ? 'nonnegative' : 'signed';
      const f = fitFoster(times, values, tau, 0.5 * (steady[j][i] + steady[i][j]), { ...o.fit, sign });
      converged &&= f.converged;
      R[j][i] = f.R;
      R[i][j] = f.R;
      maxAbsError[j][i] = maxAbsError[i][j] = f.maxAbsError;
      relError[j][i] = relError[i][j] = f.relError;
      if (f.relError > worst.relError) worst = { node: j, source: i, relError: f.relError };
    }
  }
  const labels = series.labels ?? steady.map((_, j) => `node-${j}`);
  return { network: { tau, R, labels }, maxAbsError, relError, worst, converged };
}

/** Step response matrix of a network at time t: Z[j][i] (K/W). */
export function networkStep(network: FosterNetwork, t: number): number[][] {
  const e = network.tau.map((tk) => -Math.expm1(-t / tk));
  return network.R.map((row) => row.map((terms) => terms.reduce((s, r, k) => s + r * e[k], 0)));
}
