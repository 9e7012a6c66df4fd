/**
 * Gaver–Stehfest numerical Laplace inversion on the real axis (H. Stehfest, "Numerical
 * inversion of Laplace transforms", Comm. ACM 13, 1970, Algorithm 368):
 * f(t) ≈ (ln 2 / t) · Σ_{k=1..N} V_k · F(k ln 2 / t). F must be smooth to ~1e-12 in s; N = 14
 * is the usual choice in double precision (the weights reach ~1e8 there).
 */

/** Default number of Stehfest terms (even). */
export const STEHFEST_TERMS = 14;

const factorial = (n: number): number => {
  let f = 1;
  for (let i = 2; i <= n; i++) f *= i;
  return f;
};

const weightCache = new Map<number, Float64Array>();

/** Stehfest weights V_1 … V_N for an even N (Stehfest 1970, with its sign convention). */
export function stehfestWeights(N: number = STEHFEST_TERMS): Float64Array {
  if (!Number.isInteger(N) || N < 2 || N > 30 || N % 2 !== 0) throw new RangeError(`Stehfest needs an even N in 2…30, got ${N}`);
  const cached = weightCache.get(N);
  if (cached) return cached;
  const h = N / 2;
  const V = new Float64Array(N);
  for (let k = 1; k <= N; k++) {
    let sum = 0;
    for (let j = Math.floor((k + 1) / 2); j <= Math.min(k, h); j++) {
      sum += (j ** h * factorial(2 * j)) / (factorial(h - j) * factorial(j) * factorial(j - 1) * factorial(k - j) * factorial(2 * j - k));
    }
    V[k - 1] = (k + h) % 2 === 0 ? sum : -sum;
  }
  weightCache.set(N, V);
  return V;
}

/** The real Laplace variables s_k = k ln 2 / t at which F is sampled for time t. */
export function stehfestAbscissae(t: number, N: number = STEHFEST_TERMS): number[] {
  return Array.from({ length: N }, (_, i) => ((i + 1) * Math.LN2) / t);
}

/** Combine samples F(s_k) (from stehfestAbscissae) into f(t). */
export function stehfestCombine(t: number, samples: ArrayLike<number>, N: number = STEHFEST_TERMS): number {
  const V = stehfestWeights(N);
  let s = 0;
  for (let k = 0; k < N; k++) s += V[k] * samples[k];
  return (Math.LN2 / t) * s;
}

/** Invert a real-axis transform F at time t > 0. */
export function stehfestInvert(F: (s: number) => number, t: number, N: number = STEHFEST_TERMS): number {
  return stehfestCombine(t, stehfestAbscissae(t, N).map(F), N);
}
