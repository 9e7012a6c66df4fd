/**
 * Test reference: principal branch W0 of the Lambert W function for z ≥ −1/e, by Halley's
 * iteration (Corless, Gonnet, Hare, Jeffrey & Knuth, "On the Lambert W function",
 * Adv. Comput. Math. 5, 1996, eq. 5.9), started near the branch point from their series
 * W = −1 + p − p²/3 + 11p³/72, p = √(2(e·z + 1)) (eq. 4.22), elsewhere from log(1 + z).
 */
export function lambertW0(z: number): number {
  if (z < -1 / Math.E - 1e-15) throw new Error(`W0 is real only for z ≥ −1/e, got ${z}`);
  if (z <= -1 / Math.E) return -1;
  let w: number;
  if (z < -0.25) {
    const p = Math.sqrt(2 * (Math.E * z + 1));
    w = -1 + p - (p * p) / 3 + (11 / 72) * p * p * p;
  } else w = Math.log1p(z);
  for (let i = 0; i < 100; i++) {
    const ew = Math.exp(w);
    const f = w * ew - z;
    const dw = f / (ew * (w + 1) - ((w + 2) * f) / (2 * w + 2));
    w -= dw;
    if (Math.abs(dw) <= 1e-16 * (1 + Math.abs(w))) return w;
  }
  return w;
}
