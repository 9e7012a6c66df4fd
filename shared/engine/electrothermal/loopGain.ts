/**
 * Loop gain of the electro-thermal feedback: the spectral radius of R·diag(dP/dT).
 * With R symmetric (reciprocity, physics.md §1) and dP/dT ≥ 0, R·D is similar to the symmetric
 * S = D^½·R·D^½, so its eigenvalues are real and the dominant one is found by power iteration
 * with the Rayleigh quotient (Golub & Van Loan, Matrix Computations, §8.2).
 */
import { isPositiveDefinite } from './denseLinear';

/** Bound on power-iteration sweeps. */
export const LOOP_GAIN_MAX_ITERATIONS = 2000;

/** Dominant eigenpair of the feedback loop. */
export interface LoopGain {
  /** Spectral radius of R·diag(dP/dT) (dimensionless; ≥ 1 means no stable operating point). */
  gain: number;
  /** Share of each node in the dominant mode (squared components of the S eigenvector, sum 1). */
  participation: number[];
  /** Index of the node with the largest participation: the node that drives the feedback. */
  driver: number;
  iterations: number;
  converged: boolean;
}

/** S = D^½·sym(R)·D^½ for slopes d = dP/dT (W/K). */
export function symmetricLoopMatrix(R: readonly (readonly number[])[], slopes: readonly number[]): number[][] {
  const h = slopes.map((d) => Math.sqrt(Math.max(d, 0)));
  return R.map((row, i) => row.map((_, j) => h[i] * 0.5 * (R[i][j] + R[j][i]) * h[j]));
}

/** True when the loop gain is below 1 (I − S positive definite): the operating point is stable. */
export function isLoopStable(R: readonly (readonly number[])[], slopes: readonly number[]): boolean {
  const S = symmetricLoopMatrix(R, slopes);
  return isPositiveDefinite(S.map((row, i) => row.map((v, j) => (i === j ? 1 - v : -v))));
}

/** Spectral radius and dominant mode of R·diag(slopes). */
export function loopGain(R: readonly (readonly number[])[], slopes: readonly number[]): LoopGain {
  const n = slopes.length;
  const S = symmetricLoopMatrix(R, slopes);
  let x = new Float64Array(n).fill(1 / Math.sqrt(Math.max(n, 1)));
  let lambda = 0;
  let iterations = 0;
  let converged = false;
  for (; iterations < LOOP_GAIN_MAX_ITERATIONS && n > 0; ) {
    iterations++;
    const y = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      let s = 0;
      for (let j = 0; j < n; j++) s += S[i][j] * x[j];
      y[i] = s;
    }
    let rq = 0;
    let norm = 0;
    for (let i = 0; i < n; i++) {
      rq += x[i] * y[i];
      norm += y[i] * y[i];
    }
    norm = Math.sqrt(norm);
    if (norm === 0) {
      lambda = 0;
      converged = true;
      break;
    }
    const change = Math.abs(rq - lambda);
    lambda = rq;
    x = y.map((v) => v / norm);
    if (change <= 1e-13 * Math.abs(rq)) {
      converged = true;
      break;
    }
  }
  const participation = Array.from(x, (v) => v * v);
  let driver = 0;
  for (let i = 1; i < n; i++) if (participation[i] > participation[driver]) driver = i;
  return { gain: Math.abs(lambda), participation, driver, iterations, converged };
}
