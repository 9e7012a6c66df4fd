/**
 * Modal input impedance of a layered stack (physics.md §1, §3): a chain of 2×2 transfer
 * matrices in tanh form, evaluated from the far face inward. Sources: Muzychka, Culham &
 * Yovanovich, J. Electronic Packaging 125 (2003); Bagnall, Muzychka & Moore, IEEE CPMT 4
 * (2014); Laplace form: Maillet et al., "Thermal Quadrupoles" (2000).
 */
import { EngineInputError } from './errors';
import type { Channel, ChannelStack } from './types';

const OP_RESISTANCE = 0;
const OP_LAYER = 1;
const STRIDE = 5;

/** A stack compiled for fast per-mode evaluation at one Laplace variable s. */
export interface CompiledStack {
  /** Impedance at the far face: 1/h, or Infinity when adiabatic. */
  farZ: number;
  /** Records [op, t, kxy/kz, s·ρc/kz, kz] (op 0: add resistance t) from the far face inward. */
  ops: Float64Array;
}

/** Compile one stack; `side` fixes where each layer's +z contact resistance lies. */
export function compileStack(stack: ChannelStack, side: 'above' | 'below', s = 0, path = side): CompiledStack {
  const records: number[] = [];
  const n = stack.layers.length;
  for (let step = 0; step < n; step++) {
    const i = n - 1 - step;
    const layer = stack.layers[i];
    const r = layer.contactResistance ?? 0;
    let b = 0;
    if (s > 0) {
      if (!(layer.rho && layer.cp)) {
        throw new EngineInputError(`${path}.layers[${i}]`, 'This layer needs a density and a specific heat for a transient solve.');
      }
      b = (s * layer.rho * layer.cp) / layer.kz;
    }
    const layerOp = [OP_LAYER, layer.thickness, layer.kxy / layer.kz, b, layer.kz];
    // Above the source plane a layer's +z face is its far face; below, it faces the source plane.
    if (side === 'above' && r > 0) records.push(OP_RESISTANCE, r, 0, 0, 0);
    records.push(...layerOp);
    if (side === 'below' && r > 0) records.push(OP_RESISTANCE, r, 0, 0, 0);
  }
  return { farZ: stack.h > 0 ? 1 / stack.h : Infinity, ops: Float64Array.from(records) };
}

/** Input impedance Z = θ/q (m²K/W) of a compiled stack for a mode with β² = λ² + δ². */
export function stackImpedance(stack: CompiledStack, beta2: number): number {
  const ops = stack.ops;
  let z = stack.farZ;
  for (let k = 0; k < ops.length; k += STRIDE) {
    const t = ops[k + 1];
    if (ops[k] === OP_RESISTANCE) {
      z += t;
      continue;
    }
    const g2 = beta2 * ops[k + 2] + ops[k + 3];
    const kz = ops[k + 4];
    if (g2 === 0) {
      z += t / kz;
      continue;
    }
    const g = Math.sqrt(g2);
    const kk = kz * g;
    const th = Math.tanh(g * t);
    z = z === Infinity ? 1 / (kk * th) : (z + th / kk) / (1 + kk * z * th);
  }
  return z;
}

/** Impedance of the source plane: the two stacks in parallel. */
export function parallelImpedance(zUp: number, zDown: number): number {
  return 1 / (1 / zUp + 1 / zDown);
}

/** Cosine eigenvalues mπ/L for m = 0 … count−1. */
export function eigenvalues(length: number, count: number): Float64Array {
  const out = new Float64Array(count);
  for (let m = 0; m < count; m++) out[m] = (m * Math.PI) / length;
  return out;
}

/**
 * Weighted modal table W[m·N + n] = ε_m ε_n Z_mn / (Lx Ly) with ε_0 = 1, ε_k = 2 — the kernel of
 * every influence sum (physics.md §1). A floating plane (both faces adiabatic, s = 0) gets W_00 = 0.
 */
export function weightedImpedanceTable(channel: Channel, m: number, n: number, s = 0): Float64Array {
  const up = compileStack(channel.above, 'above', s);
  const down = compileStack(channel.below, 'below', s);
  const lam = eigenvalues(channel.lx, m);
  const del = eigenvalues(channel.ly, n);
  const del2 = new Float64Array(n);
  for (let j = 0; j < n; j++) del2[j] = del[j] * del[j];
  const table = new Float64Array(m * n);
  const area = channel.lx * channel.ly;
  for (let i = 0; i < m; i++) {
    const l2 = lam[i] * lam[i];
    const ei = i === 0 ? 1 : 2;
    const row = i * n;
    for (let j = 0; j < n; j++) {
      const b2 = l2 + del2[j];
      const z = parallelImpedance(stackImpedance(up, b2), stackImpedance(down, b2));
      // z = ∞ only for the (0,0) mode of a floating plane (both faces adiabatic, s = 0): dropped.
      table[row + j] = z === Infinity ? 0 : (ei * (j === 0 ? 1 : 2) * z) / area;
    }
  }
  return table;
}

/** (0,0)-mode impedances of each side (m²K/W): the 1-D series resistance per area, Infinity if adiabatic. */
export function uniformModeImpedances(channel: Channel, s = 0): { up: number; down: number; total: number } {
  const up = stackImpedance(compileStack(channel.above, 'above', s), 0);
  const down = stackImpedance(compileStack(channel.below, 'below', s), 0);
  return { up, down, total: parallelImpedance(up, down) };
}
