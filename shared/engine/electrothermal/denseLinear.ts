/**
 * Small dense linear algebra for the coupled solve: LU with partial pivoting and a
 * Cholesky-based positive-definiteness test (Golub & Van Loan, Matrix Computations, §3.4, §4.2).
 */

/** Solve A·x = b by Gaussian elimination with partial pivoting; null if A is singular. */
export function luSolve(A: readonly (readonly number[])[], b: readonly number[]): number[] | null {
  const n = b.length;
  const a = A.map((row) => Float64Array.from(row));
  const x = Float64Array.from(b);
  let scale = 0;
  for (const row of a) for (const v of row) scale = Math.max(scale, Math.abs(v));
  const tiny = scale * 1e-14;
  for (let k = 0; k < n; k++) {
    let p = k;
    for (let i = k + 1; i < n; i++) if (Math.abs(a[i][k]) > Math.abs(a[p][k])) p = i;
    if (!(Math.abs(a[p][k]) > tiny)) return null;
    if (p !== k) {
      [a[p], a[k]] = [a[k], a[p]];
      [x[p], x[k]] = [x[k], x[p]];
    }
    const rk = a[k];
    for (let i = k + 1; i < n; i++) {
      const ri = a[i];
      const f = ri[k] / rk[k];
      if (f === 0) continue;
      for (let j = k; j < n; j++) ri[j] -= f * rk[j];
      x[i] -= f * x[k];
    }
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = x[i];
    for (let j = i + 1; j < n; j++) s -= a[i][j] * x[j];
    x[i] = s / a[i][i];
  }
  return Array.from(x);
}

/** True when the symmetric matrix S is positive definite (its Cholesky factorisation exists). */
export function isPositiveDefinite(S: readonly (readonly number[])[]): boolean {
  const n = S.length;
  const L = Array.from({ length: n }, () => new Float64Array(n));
  for (let j = 0; j < n; j++) {
    let d = S[j][j];
    for (let k = 0; k < j; k++) d -= L[j][k] * L[j][k];
    if (!(d > 0)) return false;
    const ljj = Math.sqrt(d);
    L[j][j] = ljj;
    for (let i = j + 1; i < n; i++) {
      let s = 0.5 * (S[i][j] + S[j][i]);
      for (let k = 0; k < j; k++) s -= L[i][k] * L[j][k];
      L[i][j] = s / ljj;
    }
  }
  return true;
}
