/** Dense LU factorisation with partial pivoting (Golub & Van Loan, Matrix Computations, alg. 3.4.1). */

/** LU factors of a square matrix, reusable for many right-hand sides. */
export interface LuFactors {
  size: number;
  lu: Float64Array;
  pivot: Int32Array;
}

/** Factor a row-major n × n matrix (copied, not changed). Throws if it is singular. */
export function luFactor(matrix: Float64Array, size: number): LuFactors {
  const lu = Float64Array.from(matrix);
  const pivot = new Int32Array(size);
  let scale = 0;
  for (let i = 0; i < lu.length; i++) scale = Math.max(scale, Math.abs(lu[i]));
  for (let k = 0; k < size; k++) {
    let p = k;
    let best = Math.abs(lu[k * size + k]);
    for (let i = k + 1; i < size; i++) {
      const v = Math.abs(lu[i * size + k]);
      if (v > best) {
        best = v;
        p = i;
      }
    }
    if (!(best > scale * 1e-14)) throw new Error(`luFactor: singular matrix at column ${k}`);
    pivot[k] = p;
    if (p !== k) {
      for (let j = 0; j < size; j++) {
        const t = lu[k * size + j];
        lu[k * size + j] = lu[p * size + j];
        lu[p * size + j] = t;
      }
    }
    const d = lu[k * size + k];
    for (let i = k + 1; i < size; i++) {
      const f = (lu[i * size + k] /= d);
      if (f === 0) continue;
      for (let j = k + 1; j < size; j++) lu[i * size + j] -= f * lu[k * size + j];
    }
  }
  return { size, lu, pivot };
}

/** Solve A·x = b with the factors (b is not changed). */
export function luSolve(f: LuFactors, b: ArrayLike<number>): Float64Array {
  const { size, lu, pivot } = f;
  const x = Float64Array.from(b);
  for (let k = 0; k < size; k++) {
    const p = pivot[k];
    if (p !== k) {
      const t = x[k];
      x[k] = x[p];
      x[p] = t;
    }
  }
  for (let i = 0; i < size; i++) {
    let s = x[i];
    for (let j = 0; j < i; j++) s -= lu[i * size + j] * x[j];
    x[i] = s;
  }
  for (let i = size - 1; i >= 0; i--) {
    let s = x[i];
    for (let j = i + 1; j < size; j++) s -= lu[i * size + j] * x[j];
    x[i] = s / lu[i * size + i];
  }
  return x;
}
