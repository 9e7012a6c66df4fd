/**
 * Dense linear least squares min ‖A x − b‖ by Householder QR (Golub & Van Loan, Matrix
 * Computations, 4th ed., §5.3), optionally Tikhonov-regularised: min ‖A x − b‖² + λ²‖x‖².
 * The factorisation can be kept and reused for many right-hand sides.
 */

/** Householder QR of an m×n matrix (columns stored as vectors), ready for qrSolve. */
export interface QrFactors {
  m: number;
  n: number;
  /** Householder vectors in the lower part, R above the diagonal, column by column. */
  cols: Float64Array[];
  vv: Float64Array;
  diag: Float64Array;
  /** Rows appended for the regularisation (their right-hand side is 0). */
  extraRows: number;
}

/** Factor A (given by rows), with λ·I rows appended when lambda > 0. */
export function qrFactor(A: readonly (readonly number[])[], lambda = 0): QrFactors {
  const n = A.length > 0 ? A[0].length : 0;
  const extraRows = lambda > 0 ? n : 0;
  const m = A.length + extraRows;
  const cols = Array.from({ length: n }, (_, j) => {
    const c = new Float64Array(m);
    for (let i = 0; i < A.length; i++) c[i] = A[i][j];
    if (extraRows) c[A.length + j] = lambda;
    return c;
  });
  let scale = 0;
  for (const col of cols) for (const v of col) scale = Math.max(scale, Math.abs(v));
  const tiny = scale * 1e-13;
  const diag = new Float64Array(n);
  const vv = new Float64Array(n);
  for (let k = 0; k < Math.min(n, m); k++) {
    const v = cols[k];
    let norm = 0;
    for (let i = k; i < m; i++) norm += v[i] * v[i];
    norm = Math.sqrt(norm);
    if (norm <= tiny) continue;
    const alpha = v[k] > 0 ? -norm : norm;
    v[k] -= alpha;
    let s = 0;
    for (let i = k; i < m; i++) s += v[i] * v[i];
    vv[k] = s;
    diag[k] = alpha;
    for (let j = k + 1; j < n; j++) reflect(v, vv[k], k, m, cols[j]);
  }
  return { m, n, cols, vv, diag, extraRows };
}

function reflect(v: Float64Array, vv: number, k: number, m: number, c: Float64Array): void {
  let d = 0;
  for (let i = k; i < m; i++) d += v[i] * c[i];
  const f = (2 * d) / vv;
  for (let i = k; i < m; i++) c[i] -= f * v[i];
}

/** Least-squares solution for right-hand side b (length = rows of A, without the λ rows). */
export function qrSolve(f: QrFactors, b: readonly number[]): number[] {
  const { m, n, cols, vv, diag } = f;
  const y = new Float64Array(m);
  for (let i = 0; i < b.length; i++) y[i] = b[i];
  for (let k = 0; k < Math.min(n, m); k++) if (diag[k] !== 0) reflect(cols[k], vv[k], k, m, y);
  const x = new Array<number>(n).fill(0);
  for (let k = Math.min(n, m) - 1; k >= 0; k--) {
    if (diag[k] === 0) continue;
    let s = y[k];
    for (let j = k + 1; j < n; j++) s -= cols[j][k] * x[j];
    x[k] = s / diag[k];
  }
  return x;
}

/** Solve min ‖A x − b‖ (+ λ²‖x‖²) for an m×n matrix A given by rows; rank-deficient columns get 0. */
export function leastSquares(A: readonly (readonly number[])[], b: readonly number[], lambda = 0): number[] {
  return qrSolve(qrFactor(A, lambda), b);
}
