/**
 * Inverse cosine transform on cell-centred grids via one complex FFT per line (Makhoul, IEEE Trans.
 * ASSP 28, 1980): x_p = Σ_k c_k cos(π k (2p+1)/(2P)), p = 0 … P−1, with fft.js (radix-4, P a power of 2).
 */
import FFT from 'fft.js';

/** Reusable inverse-DCT workspace for one line length P (a power of two ≥ 2). */
export class CosineLine {
  readonly size: number;
  private fft: FFT;
  private spec: Float64Array;
  private out: Float64Array;
  private cosT: Float64Array;
  private sinT: Float64Array;

  constructor(size: number) {
    if (!(size >= 2 && (size & (size - 1)) === 0)) throw new Error(`CosineLine: size ${size} is not a power of two ≥ 2`);
    this.size = size;
    this.fft = new FFT(size);
    this.spec = new Float64Array(2 * size);
    this.out = new Float64Array(2 * size);
    this.cosT = new Float64Array(size);
    this.sinT = new Float64Array(size);
    for (let k = 0; k < size; k++) {
      this.cosT[k] = Math.cos((Math.PI * k) / (2 * size));
      this.sinT[k] = Math.sin((Math.PI * k) / (2 * size));
    }
  }

  /** Evaluate x_p = Σ_k c[k0 + k·step] cos(πk(2p+1)/(2P)) into out[o0 + p·ostep]. */
  evaluate(c: Float64Array, k0: number, step: number, out: Float64Array, o0: number, ostep: number): void {
    const size = this.size;
    const spec = this.spec;
    // DCT-II coefficients X_0 = P·c_0, X_k = (P/2)·c_k; V_k = e^{iπk/2P}(X_k − i X_{P−k}).
    for (let k = 0; k < size; k++) {
      const xk = c[k0 + k * step] * (k === 0 ? size : size / 2);
      const xr = k === 0 ? 0 : c[k0 + (size - k) * step] * (size / 2);
      const cs = this.cosT[k];
      const sn = this.sinT[k];
      spec[2 * k] = cs * xk + sn * xr;
      spec[2 * k + 1] = sn * xk - cs * xr;
    }
    this.fft.inverseTransform(this.out, spec);
    const v = this.out;
    const half = size / 2;
    for (let p = 0; p < half; p++) {
      out[o0 + 2 * p * ostep] = v[2 * p];
      out[o0 + (2 * p + 1) * ostep] = v[2 * (size - 1 - p)];
    }
  }
}

/**
 * Fold modes k ≥ P onto P bins so a P-point cell-centred grid still sums every mode exactly:
 * mode k = 2P·q + r contributes (−1)^q·c_r for r < P, nothing for r = P, −(−1)^q·c_{2P−r} for r > P.
 */
export function foldedIndex(k: number, size: number): { bin: number; sign: number } {
  const period = 2 * size;
  const q = Math.floor(k / period);
  const r = k - q * period;
  const sign = q % 2 === 0 ? 1 : -1;
  if (r < size) return { bin: r, sign };
  if (r === size) return { bin: -1, sign: 0 };
  return { bin: period - r, sign: -sign };
}
