/**
 * Stability margins by bisection (physics.md §4): the largest power scale factor and the
 * largest ambient temperature at which a stable electro-thermal operating point still exists.
 * Bracket by bounded doubling, then bisect; every loop is bounded.
 */
import { solveCoupled, type CoupledProblem, type CoupledSettings } from './solveCoupled';

/** Search settings of the margins (defaults in MARGIN_DEFAULTS). */
export interface MarginSettings {
  /** Largest power scale factor searched. */
  maxScale: number;
  /** Ambient range searched, °C (the model schema's temperature range). */
  ambientRange: [number, number];
  /** Bisection stops when the scale bracket is narrower than this, relative. */
  scaleTolerance: number;
  /** Bisection stops when the ambient bracket is narrower than this, K. */
  ambientTolerance: number;
  maxBisections: number;
}

/** Default margin search settings. */
export const MARGIN_DEFAULTS: MarginSettings = { maxScale: 1024, ambientRange: [-60, 400], scaleTolerance: 1e-6, ambientTolerance: 1e-3, maxBisections: 80 };

/** One margin: the largest stable value found, or the search bound if stable all the way. */
export interface Margin {
  /** Largest value with a stable operating point (null if none even at the lowest searched). */
  value: number | null;
  /** True when the operating point stayed stable up to the search bound (value = that bound). */
  beyondSearch: boolean;
  bisections: number;
}

type Stable = (x: number) => boolean;

function bisect(stable: Stable, lo: number, hi: number, width: (lo: number, hi: number) => boolean, s: MarginSettings): Margin {
  let b = 0;
  for (; b < s.maxBisections && !width(lo, hi); b++) {
    const mid = 0.5 * (lo + hi);
    if (stable(mid)) lo = mid;
    else hi = mid;
  }
  return { value: lo, beyondSearch: false, bisections: b };
}

/** Largest power scale factor (dynamic power and currents) with a stable point. */
export function powerScaleMargin(problem: CoupledProblem, base: Partial<CoupledSettings> = {}, settings: Partial<MarginSettings> = {}): Margin {
  const s = { ...MARGIN_DEFAULTS, ...settings };
  const stable: Stable = (scale) => solveCoupled(problem, { ...base, scale }).status === 'stable';
  const narrow = (lo: number, hi: number) => hi - lo <= s.scaleTolerance * Math.max(hi, 1e-12);
  if (!stable(0)) return { value: null, beyondSearch: false, bisections: 0 };
  let lo = 0;
  let hi = 1;
  while (stable(hi)) {
    lo = hi;
    if (hi >= s.maxScale) return { value: hi, beyondSearch: true, bisections: 0 };
    hi = Math.min(2 * hi, s.maxScale);
  }
  return bisect(stable, lo, hi, narrow, s);
}

/** Largest ambient (°C) with a stable point, given the ambient the base temperatures belong to. */
export function ambientMargin(
  problem: CoupledProblem,
  ambient: number,
  base: Partial<CoupledSettings> = {},
  settings: Partial<MarginSettings> = {},
): Margin {
  const s = { ...MARGIN_DEFAULTS, ...settings };
  const [low, high] = s.ambientRange;
  const stable: Stable = (amb) => solveCoupled(problem, { ...base, ambientShift: amb - ambient }).status === 'stable';
  const narrow = (lo: number, hi: number) => hi - lo <= s.ambientTolerance;
  if (!stable(low)) return { value: null, beyondSearch: false, bisections: 0 };
  if (stable(high)) return { value: high, beyondSearch: true, bisections: 0 };
  return bisect(stable, low, high, narrow, s);
}
