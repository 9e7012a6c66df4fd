/**
 * Fixed-Talbot numerical Laplace inversion on a complex contour (J. Abate & P. P. Valkó,
 * "Multi-precision Laplace transform inversion", Int. J. Numer. Meth. Engng 60, 2004, eq. 2.8):
 * r = 2M/(5t), θ_k = kπ/M, s_k = r·θ_k(cot θ_k + i), σ_k = θ_k + (θ_k cot θ_k − 1) cot θ_k,
 * f(t) ≈ (r/M)·[½ F(r) e^{rt} + Σ_{k=1..M−1} Re(e^{t s_k} F(s_k) (1 + i σ_k))].
 * Needs F at complex s; round-off grows like e^{0.4M}, so M ≈ 16–32 in double precision.
 */

/** A complex number. */
export interface Complex {
  re: number;
  im: number;
}

/** Default number of Talbot nodes. */
export const TALBOT_NODES = 24;

/** Invert a complex-valued transform F at time t > 0 with M contour nodes. */
export function talbotInvert(F: (s: Complex) => Complex, t: number, M: number = TALBOT_NODES): number {
  if (!(t > 0)) throw new RangeError(`Talbot inversion needs t > 0, got ${t}`);
  if (!Number.isInteger(M) || M < 2) throw new RangeError(`Talbot needs an integer M ≥ 2, got ${M}`);
  const r = (2 * M) / (5 * t);
  const f0 = F({ re: r, im: 0 });
  let sum = 0.5 * f0.re * Math.exp(r * t);
  for (let k = 1; k < M; k++) {
    const theta = (k * Math.PI) / M;
    const cot = Math.cos(theta) / Math.sin(theta);
    const s = { re: r * theta * cot, im: r * theta };
    const sigma = theta + (theta * cot - 1) * cot;
    const Fs = F(s);
    const mag = Math.exp(t * s.re);
    const er = mag * Math.cos(t * s.im);
    const ei = mag * Math.sin(t * s.im);
    // e^{ts}·F(s)
    const pr = er * Fs.re - ei * Fs.im;
    const pi = er * Fs.im + ei * Fs.re;
    // Re[(pr + i pi)(1 + iσ)] = pr − pi·σ
    sum += pr - pi * sigma;
  }
  return (r / M) * sum;
}
