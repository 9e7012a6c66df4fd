/**
 * Dense linear least squares min ‖A x − b‖ by Householder QR (Golub & Van Loan, Matrix
 * Computations, 4th ed., §5.3), optionally Tikhonov-regularised: min ‖A x − b‖² + λ²‖x‖².
 */

/** Solve min ‖A x − b‖ (+ λ²‖x‖²) for an m×n matrix A given by rows; rank-deficient columns get 0. */
export function leastSquares(A: readonly (readonly number[])[], b: readonly number[], lambda = 0): number[] {
  const n = A.length > 0 ? A[0].length : 0;
  const rows = A.map((r) => Float64Array.from(r));
  const rhs = Array.from(b);
  if (lambda > 0) {
    for (let j = 0; j < n; j++) {
      const r = new Float64Array(n);
      r[j] = lambda;
      rows.push(r);
      rhs.push(0);
    }
  }
  const m = rows.length;
  // column-major copy for cache-friendly Householder sweeps
  const Q = Array.from({ length: n }, (_, j) => Float64Array.from(rows, (r) => r[j]));
  const y = Float64Array.from(rhs);
  const diag = new Float64Array(n);
  let scale = 0;
  for (const col of Q) for (const v of col) scale = Math.max(scale, Math.abs(v));
  const tiny = scale * 1e-13;
  for (let k = 0; k < Math.min(n, m); k++) {
    const v = Q[k];
    let norm = 0;
    for (let i = k; i < m; i++) norm += v[i] * v[i];
    norm = Math.sqrt(norm);
    if (norm <= tiny) {
      diag[k] = 0;
      continue;
    }
    const alpha = v[k] > 0 ? -norm : norm;
    v[k] -= alpha;
    let vv = 0;
    for (let i = k; i < m; i++) vv += v[i] * v[i];
    const apply = (c: Float64Array) => {
      let d = 0;
      for (let i = k; i < m; i++) d += v[i] * c[i];
      const f = (2 * d) / vv;
      for (let i = k; i < m; i++) c[i] -= f * v[i];
    };
    for (let j = k + 1; j < n; j++) apply(Q[j]);
    apply(y);
    diag[k] = alpha;
  }
  const x = new Array<number>(n).fill(0);
  for (let k = Math.min(n, m) - 1; k >= 0; k--) {
    if (diag[k] === 0) continue;
    let s = y[k];
    for (let j = k + 1; j < n; j++) s -= Q[j][k] * x[j];
    x[k] = s / diag[k];
  }
  return x;
}
