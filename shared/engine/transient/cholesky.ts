/** Cholesky factorisation and solves of a symmetric positive-definite matrix (Golub & Van Loan, alg. 4.2.1). */

/** Factor a row-major n×n SPD matrix in place into its lower factor L (upper part left as is); false if not positive definite. */
export function choleskyInPlace(a: Float64Array, n: number): boolean {
  for (let j = 0; j < n; j++) {
    const rj = j * n;
    let d = a[rj + j];
    for (let k = 0; k < j; k++) d -= a[rj + k] * a[rj + k];
    if (!(d > 0)) return false;
    const l = Math.sqrt(d);
    a[rj + j] = l;
    for (let i = j + 1; i < n; i++) {
      const ri = i * n;
      let s = a[ri + j];
      for (let k = 0; k < j; k++) s -= a[ri + k] * a[rj + k];
      a[ri + j] = s / l;
    }
  }
  return true;
}

/** Solve L·Lᵀ·x = b with a factor from choleskyInPlace, writing x into `out`. */
export function choleskySolve(L: Float64Array, n: number, b: ArrayLike<number>, out: Float64Array): Float64Array {
  for (let i = 0; i < n; i++) {
    const ri = i * n;
    let s = b[i];
    for (let k = 0; k < i; k++) s -= L[ri + k] * out[k];
    out[i] = s / L[ri + i];
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = out[i];
    for (let k = i + 1; k < n; k++) s -= L[k * n + i] * out[k];
    out[i] = s / L[i * n + i];
  }
  return out;
}
