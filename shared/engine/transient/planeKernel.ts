/**
 * Fast Laplace-domain influence matrices of one flux channel at many s (physics.md §1, §3).
 * The modal impedance Z_mn(s) depends on the mode only through β_mn, smoothly in ln β, so the
 * influence sum R_ji(s) = Σ_mn w_mn f^(i) f^(j) Z(β_mn, s) is projected once onto a log-spaced
 * β grid with 4-point Lagrange interpolation of β·Z (Abramowitz & Stegun 25.2.13):
 * R_ji(s) ≈ Σ_q G_ji,q · β_q Z(β_q, s). Per s only the grid impedances are evaluated; the
 * projection is a fixed linear map, so R(s) stays smooth in s (as Stehfest needs). The (0,0)
 * mode is kept exact, and the Richardson finish of influence.ts is reproduced mode by mode.
 */
import { compileStack, parallelImpedance, stackImpedance } from '../impedance';
import { richardson } from '../influence';
import type { ChannelModes } from '../channel';
import type { Channel } from '../types';

/** Grid points of the β grid per decade (default). */
export const KERNEL_POINTS_PER_DECADE = 48;

/** A projected channel: G[q·pairs + p] for pair p = (i ≤ j) and β-grid point q (q = 0: the β = 0 mode). */
export interface PlaneKernel {
  channel: Channel;
  count: number;
  pairs: number;
  /** β grid (1/m); beta[0] = 0 carries the uniform mode. */
  beta: Float64Array;
  G: Float64Array;
}

/** Lagrange weights of the 4 points u_{q−1} … u_{q+2} at fraction t ∈ [0, 1) past u_q. */
function lagrange4(t: number, out: Float64Array): void {
  out[0] = (-t * (t - 1) * (t - 2)) / 6;
  out[1] = ((t + 1) * (t - 1) * (t - 2)) / 2;
  out[2] = (-(t + 1) * t * (t - 2)) / 2;
  out[3] = ((t + 1) * t * (t - 1)) / 6;
}

/** Project the modal sum of a channel (its truncation, spectra and Richardson finish) onto a β grid. */
export function buildPlaneKernel(modes: Pick<ChannelModes, 'channel' | 'spectra'>, perDecade = KERNEL_POINTS_PER_DECADE): PlaneKernel {
  const { channel, spectra } = modes;
  const { fx, fy, m, n, count } = spectra;
  const { hm, hn, factor } = richardson(m, n);
  const pairs = (count * (count + 1)) / 2;
  const bMin = Math.min(Math.PI / channel.lx, Math.PI / channel.ly);
  const bMax = Math.hypot(((m - 1) * Math.PI) / channel.lx, ((n - 1) * Math.PI) / channel.ly);
  const h = Math.LN10 / perDecade;
  const inner = Math.max(2, Math.ceil(Math.log(Math.max(bMax, bMin) / bMin) / h) + 1);
  // grid: index 0 = β 0; index q ≥ 1 holds bMin·e^{(q−2)h}, so every mode has its 4-point stencil
  const Q = inner + 4;
  const beta = new Float64Array(Q);
  for (let q = 1; q < Q; q++) beta[q] = bMin * Math.exp((q - 2) * h);
  const G = new Float64Array(Q * pairs);
  const pi = new Int32Array(pairs);
  const pj = new Int32Array(pairs);
  for (let j = 0, p = 0; j < count; j++) for (let i = 0; i <= j; i++, p++) ((pi[p] = i), (pj[p] = j));
  const fyy = new Float64Array(n * pairs);
  for (let b = 0; b < n; b++) for (let p = 0; p < pairs; p++) fyy[b * pairs + p] = fy[pi[p] * n + b] * fy[pj[p] * n + b];
  const fxx = new Float64Array(pairs);
  const v = new Float64Array(pairs);
  const w = new Float64Array(4);
  const area = channel.lx * channel.ly;
  for (let a = 0; a < m; a++) {
    for (let p = 0; p < pairs; p++) fxx[p] = fx[pi[p] * m + a] * fx[pj[p] * m + a];
    const la = (a * Math.PI) / channel.lx;
    for (let b = 0; b < n; b++) {
      const mult = (a === 0 ? 1 : 2) * (b === 0 ? 1 : 2) * (a < hm && b < hn ? 1 : 1 + factor) / area;
      const yOff = b * pairs;
      if (a === 0 && b === 0) {
        for (let p = 0; p < pairs; p++) G[p] += mult * fxx[p] * fyy[yOff + p];
        continue;
      }
      const lb = (b * Math.PI) / channel.ly;
      const bb = Math.sqrt(la * la + lb * lb);
      const u = Math.log(bb / bMin) / h + 2;
      const q = Math.min(Math.max(Math.floor(u), 2), Q - 3);
      lagrange4(u - q, w);
      const c = mult / bb;
      for (let p = 0; p < pairs; p++) v[p] = c * fxx[p] * fyy[yOff + p];
      const o0 = (q - 1) * pairs;
      const w0 = w[0], w1 = w[1], w2 = w[2], w3 = w[3];
      for (let p = 0; p < pairs; p++) {
        const vp = v[p];
        G[o0 + p] += w0 * vp;
        G[o0 + pairs + p] += w1 * vp;
        G[o0 + 2 * pairs + p] += w2 * vp;
        G[o0 + 3 * pairs + p] += w3 * vp;
      }
    }
  }
  return { channel, count, pairs, beta, G };
}

/** Influence matrix (K/W, row-major count × count) of the projected channel at Laplace variable s ≥ 0. */
export function planeMatrixAt(kernel: PlaneKernel, s: number, out: Float64Array = new Float64Array(kernel.count * kernel.count)): Float64Array {
  const { channel, count, pairs, beta, G } = kernel;
  const up = compileStack(channel.above, 'above', s);
  const down = compileStack(channel.below, 'below', s);
  const acc = new Float64Array(pairs);
  for (let q = 0; q < beta.length; q++) {
    const b = beta[q];
    const z = parallelImpedance(stackImpedance(up, b * b), stackImpedance(down, b * b));
    const v = q === 0 ? z : b * z;
    if (!Number.isFinite(v)) continue;
    const off = q * pairs;
    for (let p = 0; p < pairs; p++) acc[p] += G[off + p] * v;
  }
  for (let j = 0, p = 0; j < count; j++) {
    for (let i = 0; i <= j; i++, p++) {
      out[j * count + i] = acc[p];
      out[i * count + j] = acc[p];
    }
  }
  return out;
}
