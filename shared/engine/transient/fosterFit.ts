/**
 * Foster fit of one step response (physics.md §3): Z(t) ≈ Σ_k R_k (1 − e^{−t/τ_k}) on a
 * given log-spaced τ grid. Self-impedances: R_k ≥ 0 by NNLS (Lawson & Hanson 1974) on rows
 * weighted for relative accuracy; transfer impedances: signed, lightly Tikhonov-regularised least
 * squares on unweighted rows (one factorisation serves every transfer entry). Σ R_k = steady R is imposed
 * by a weighted extra row (the weighting method, Lawson & Hanson 1974, ch. 22), then made
 * exact: non-negative terms are rescaled, signed ones absorb the rest in the slowest term.
 */
import { qrFactor, qrSolve, type QrFactors } from './leastSquares';
import { nnls } from './nnls';

/** Fit settings (defaults in FOSTER_FIT_DEFAULTS). */
export interface FosterFitSettings {
  /** Non-negative terms (self-impedance) or signed terms (transfer impedance). */
  sign: 'nonnegative' | 'signed';
  /** Rows are weighted by 1/max(|Z(t)|, floor·|R_steady|): a relative fit with an absolute floor. */
  floor: number;
  /** Weight of the Σ R_k = R_steady row relative to a data row. */
  steadyWeight: number;
  /** Tikhonov parameter λ of signed fits (rows are 1 − e^{−t/τ}, of order 1). */
  regularisation: number;
}

/** Default Foster fit settings. */
export const FOSTER_FIT_DEFAULTS: FosterFitSettings = { sign: 'nonnegative', floor: 1e-3, steadyWeight: 1e3, regularisation: 1e-6 };

/** One fitted response: term resistances (K/W) on the shared τ grid and the fit error. */
export interface FosterFit {
  R: number[];
  /** Largest |fit − data| over the samples, K/W. */
  maxAbsError: number;
  /** maxAbsError / |R_steady| (or / max |Z| when R_steady = 0). */
  relError: number;
  /** False when the NNLS iteration bound was hit. */
  converged: boolean;
}

/** Log-spaced time constants from tMin to tMax (s), `perDecade` per decade, both ends included. */
export function logSpacedTaus(tMin: number, tMax: number, perDecade = 4): number[] {
  const decades = Math.log10(tMax / tMin);
  const count = Math.max(2, Math.ceil(decades * perDecade) + 1);
  return Array.from({ length: count }, (_, k) => tMin * 10 ** ((decades * k) / (count - 1)));
}

/** Step response of Foster terms at time t. */
export function fosterStep(R: readonly number[], tau: readonly number[], t: number): number {
  let z = 0;
  for (let k = 0; k < R.length; k++) z += R[k] * -Math.expm1(-t / tau[k]);
  return z;
}

/** The step basis 1 − e^{−t_i/τ_k} on given times and τ grid with the factorised signed design, shared by many entries. */
export interface FosterDesign {
  basis: number[][];
  qr: QrFactors;
}

/** Build the shared design of fits on given times and τ grid. */
export function signedFosterDesign(times: readonly number[], tau: readonly number[], settings: Partial<FosterFitSettings> = {}): FosterDesign {
  const o = { ...FOSTER_FIT_DEFAULTS, ...settings };
  const basis = times.map((t) => tau.map((tk) => -Math.expm1(-t / tk)));
  return { basis, qr: qrFactor([...basis, tau.map(() => o.steadyWeight)], o.regularisation) };
}

/** Fit Σ R_k(1 − e^{−t/τ_k}) to samples Z(times) with Σ R_k = steady; `design` reuses a signed factorisation. */
export function fitFoster(
  times: readonly number[],
  values: readonly number[],
  tau: readonly number[],
  steady: number,
  settings: Partial<FosterFitSettings> = {},
  design?: FosterDesign,
): FosterFit {
  const o = { ...FOSTER_FIT_DEFAULTS, ...settings };
  const d = design ?? signedFosterDesign(times, tau, o);
  const scale = Math.abs(steady) > 0 ? Math.abs(steady) : Math.max(1e-300, ...values.map(Math.abs));
  let R: number[];
  let converged = true;
  if (o.sign === 'nonnegative') {
    const A: number[][] = [];
    const b: number[] = [];
    times.forEach((_, i) => {
      const w = 1 / Math.max(Math.abs(values[i]), o.floor * scale);
      A.push(d.basis[i].map((e) => e * w));
      b.push(values[i] * w);
    });
    const ws = o.steadyWeight / scale;
    A.push(tau.map(() => ws));
    b.push(steady * ws);
    const r = nnls(A, b);
    R = r.x;
    converged = r.converged;
  } else R = qrSolve(d.qr, [...values, steady * o.steadyWeight]);
  const sum = R.reduce((a, r) => a + r, 0);
  if (o.sign === 'nonnegative' && sum > 0) R = R.map((r) => (r * steady) / sum);
  else if (o.sign === 'signed') R[R.length - 1] += steady - sum;
  let maxAbsError = 0;
  d.basis.forEach((row, i) => {
    let z = 0;
    for (let k = 0; k < R.length; k++) z += R[k] * row[k];
    maxAbsError = Math.max(maxAbsError, Math.abs(z - values[i]));
  });
  return { R, maxAbsError, relError: maxAbsError / scale, converged };
}
