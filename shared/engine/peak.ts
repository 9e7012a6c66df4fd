/**
 * Peak of the total field over each source rectangle (physics.md §1): the best cell centre of the
 * map inside the rectangle, then a local coordinate-wise golden-section refinement with point sums.
 */
import { cosines, type FieldMap } from './field';
import type { RectSource } from './types';

const GOLDEN = (Math.sqrt(5) - 1) / 2;
/** Golden-section steps per line search (bracket shrinks to 0.618^24 ≈ 1e-5 of a cell). */
const LINE_STEPS = 24;
/** Alternating x / y line searches. */
const ROUNDS = 2;

/** Modal field data for point sums: θ (layout [a·n + b]) on an lx × ly footprint. */
export interface ModalField {
  theta: Float64Array;
  m: number;
  n: number;
  lx: number;
  ly: number;
}

function lineMax(f: (v: number) => number, lo: number, hi: number, start: number, startValue: number): { at: number; value: number } {
  let best = { at: start, value: startValue };
  let a = lo;
  let b = hi;
  let c = b - GOLDEN * (b - a);
  let d = a + GOLDEN * (b - a);
  let fc = f(c);
  let fd = f(d);
  for (let k = 0; k < LINE_STEPS; k++) {
    if (fc > best.value) best = { at: c, value: fc };
    if (fd > best.value) best = { at: d, value: fd };
    if (fc >= fd) {
      b = d;
      d = c;
      fd = fc;
      c = b - GOLDEN * (b - a);
      fc = f(c);
    } else {
      a = c;
      c = d;
      fc = fd;
      d = a + GOLDEN * (b - a);
      fd = f(d);
    }
  }
  return best;
}

/** Sum over the first axis with the second axis fixed: G_a = Σ_b θ_ab cos(δ_b y) (or the transpose). */
function partial(field: ModalField, fixedAxis: 'x' | 'y', v: number): Float64Array {
  const { theta, m, n } = field;
  if (fixedAxis === 'y') {
    const cy = cosines(n, Math.PI / field.ly, v);
    const out = new Float64Array(m);
    for (let a = 0; a < m; a++) {
      let s = 0;
      for (let b = 0; b < n; b++) s += theta[a * n + b] * cy[b];
      out[a] = s;
    }
    return out;
  }
  const cx = cosines(m, Math.PI / field.lx, v);
  const out = new Float64Array(n);
  for (let a = 0; a < m; a++) {
    const c = cx[a];
    for (let b = 0; b < n; b++) out[b] += theta[a * n + b] * c;
  }
  return out;
}

function series(coeffs: Float64Array, step: number): (v: number) => number {
  return (v) => {
    const c = cosines(coeffs.length, step, v);
    let s = 0;
    for (let k = 0; k < coeffs.length; k++) s += coeffs[k] * c[k];
    return s;
  };
}

/** Peak value of the field over each rectangle, and where it is (m). */
export function peaksOverRects(field: ModalField, map: FieldMap, rects: readonly RectSource[]): { value: number; x: number; y: number }[] {
  return rects.map((r) => {
    const x0 = r.x - r.width / 2;
    const x1 = r.x + r.width / 2;
    const y0 = r.y - r.height / 2;
    const y1 = r.y + r.height / 2;
    let x = r.x;
    let y = r.y;
    let best = -Infinity;
    const ix0 = Math.max(0, Math.ceil(x0 / map.dx - 0.5));
    const ix1 = Math.min(map.nx - 1, Math.floor(x1 / map.dx - 0.5));
    const iy0 = Math.max(0, Math.ceil(y0 / map.dy - 0.5));
    const iy1 = Math.min(map.ny - 1, Math.floor(y1 / map.dy - 0.5));
    for (let iy = iy0; iy <= iy1; iy++) {
      for (let ix = ix0; ix <= ix1; ix++) {
        const v = map.values[iy * map.nx + ix];
        if (v > best) {
          best = v;
          x = (ix + 0.5) * map.dx;
          y = (iy + 0.5) * map.dy;
        }
      }
    }
    if (best === -Infinity) best = series(partial(field, 'y', y), Math.PI / field.lx)(x);
    for (let round = 0; round < ROUNDS; round++) {
      const fx = series(partial(field, 'y', y), Math.PI / field.lx);
      const bx = lineMax(fx, Math.max(x0, x - map.dx), Math.min(x1, x + map.dx), x, best);
      x = bx.at;
      best = bx.value;
      const fy = series(partial(field, 'x', x), Math.PI / field.ly);
      const by = lineMax(fy, Math.max(y0, y - map.dy), Math.min(y1, y + map.dy), y, best);
      y = by.at;
      best = by.value;
    }
    return { value: best, x, y };
  });
}
