/**
 * Non-negative least squares min ‖A x − b‖, x ≥ 0, by the active-set algorithm of Lawson &
 * Hanson (Solving Least Squares Problems, Prentice-Hall 1974, ch. 23, Algorithm NNLS).
 * Both loops are bounded; `converged` says whether the optimality test was met.
 */
import { leastSquares } from './leastSquares';

/** Result of nnls: solution, outer iterations used, and whether the KKT test passed. */
export interface NnlsResult {
  x: number[];
  iterations: number;
  converged: boolean;
}

function residualGradient(A: readonly (readonly number[])[], b: readonly number[], x: readonly number[]): number[] {
  const n = x.length;
  const w = new Array<number>(n).fill(0);
  for (let i = 0; i < A.length; i++) {
    let r = b[i];
    for (let j = 0; j < n; j++) r -= A[i][j] * x[j];
    for (let j = 0; j < n; j++) w[j] += A[i][j] * r;
  }
  return w;
}

/** Lawson–Hanson NNLS; maxIterations bounds the outer loop (default 3n). */
export function nnls(A: readonly (readonly number[])[], b: readonly number[], maxIterations?: number): NnlsResult {
  const n = A.length > 0 ? A[0].length : 0;
  const limit = maxIterations ?? 3 * n + 10;
  const x = new Array<number>(n).fill(0);
  const passive = new Array<boolean>(n).fill(false);
  let aScale = 0;
  let bScale = 0;
  for (let i = 0; i < A.length; i++) for (let j = 0; j < n; j++) aScale = Math.max(aScale, Math.abs(A[i][j]));
  for (const v of b) bScale = Math.max(bScale, Math.abs(v));
  // optimality tolerance on the gradient: a few units of round-off of Aᵀ(b − Ax)
  const tol = 10 * Number.EPSILON * Math.max(A.length, 1) * aScale * bScale;
  // a column whose own coefficient comes out ≤ 0 right after entering is blocked until x changes
  // (Lawson & Hanson's guard against round-off cycling)
  const blocked = new Array<boolean>(n).fill(false);
  for (let it = 1; it <= limit; it++) {
    const w = residualGradient(A, b, x);
    let t = -1;
    for (let j = 0; j < n; j++) if (!passive[j] && !blocked[j] && w[j] > tol && (t < 0 || w[j] > w[t])) t = j;
    if (t < 0) return { x, iterations: it - 1, converged: true };
    passive[t] = true;
    for (let inner = 0; inner <= n; inner++) {
      const cols = passive.flatMap((p, j) => (p ? [j] : []));
      const zP = leastSquares(A.map((row) => cols.map((j) => row[j])), b);
      const z = new Array<number>(n).fill(0);
      cols.forEach((j, q) => (z[j] = zP[q]));
      if (inner === 0 && !(z[t] > 0)) {
        passive[t] = false;
        blocked[t] = true;
        break;
      }
      if (cols.every((j) => z[j] > 0)) {
        for (let j = 0; j < n; j++) x[j] = z[j];
        blocked.fill(false);
        break;
      }
      let alpha = 1;
      for (const j of cols) if (z[j] <= 0) alpha = Math.min(alpha, x[j] / (x[j] - z[j]));
      for (let j = 0; j < n; j++) x[j] += alpha * (z[j] - x[j]);
      for (const j of cols) if (x[j] <= 0) {
        x[j] = 0;
        passive[j] = false;
      }
    }
  }
  return { x, iterations: limit, converged: false };
}
