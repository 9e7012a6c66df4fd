/**
 * Modified nodal analysis for the tests (Ho, Ruehli & Brennan, "The modified nodal approach to network
 * analysis", IEEE Trans. Circuits Syst. 22, 1975): unknowns are node voltages and the currents of V, E
 * and H branches. DC: capacitors open. Transient: backward Euler, a capacitor becomes C/h in parallel
 * with a source C/h·v(t − h). Dense Gaussian elimination with partial pivoting.
 */
import type { Element } from './spiceReader';

/** Node voltages (by lower-case node name) and branch currents (by element name). */
export interface Solution {
  v: Map<string, number>;
  i: Map<string, number>;
}

function solveDense(a: Float64Array, b: Float64Array, n: number): Float64Array {
  for (let c = 0; c < n; c++) {
    let p = c;
    for (let r = c + 1; r < n; r++) if (Math.abs(a[r * n + c]) > Math.abs(a[p * n + c])) p = r;
    if (a[p * n + c] === 0) throw new Error(`singular circuit matrix (column ${c})`);
    if (p !== c) {
      for (let k = 0; k < n; k++) [a[c * n + k], a[p * n + k]] = [a[p * n + k], a[c * n + k]];
      [b[c], b[p]] = [b[p], b[c]];
    }
    for (let r = c + 1; r < n; r++) {
      const f = a[r * n + c] / a[c * n + c];
      if (f === 0) continue;
      for (let k = c; k < n; k++) a[r * n + k] -= f * a[c * n + k];
      b[r] -= f * b[c];
    }
  }
  const x = new Float64Array(n);
  for (let r = n - 1; r >= 0; r--) {
    let s = b[r];
    for (let k = r + 1; k < n; k++) s -= a[r * n + k] * x[k];
    x[r] = s / a[r * n + r];
  }
  return x;
}

/** Solve the circuit: DC when `step` is absent, else one backward-Euler step of `h` seconds from `previous`. */
export function solveMna(elements: Element[], step?: { h: number; previous: Solution }): Solution {
  const nodes = new Map<string, number>();
  const node = (name: string): number => {
    if (name === '0' || name === 'gnd') return -1;
    if (!nodes.has(name)) nodes.set(name, nodes.size);
    return nodes.get(name)!;
  };
  elements.forEach((e) => e.nodes.forEach(node));
  const branches = new Map<string, number>();
  for (const e of elements) if (e.kind === 'V' || e.kind === 'E' || e.kind === 'H' || (e.kind === 'R' && e.value === 0)) branches.set(e.name, nodes.size + branches.size);
  const n = nodes.size + branches.size;
  const a = new Float64Array(n * n);
  const b = new Float64Array(n);
  const add = (r: number, c: number, v: number) => void (r >= 0 && c >= 0 && (a[r * n + c] += v));
  const rhs = (r: number, v: number) => void (r >= 0 && (b[r] += v));
  const conductance = (p: number, q: number, g: number) => (add(p, p, g), add(q, q, g), add(p, q, -g), add(q, p, -g));
  const branchOf = (name: string) => {
    const k = branches.get(name);
    if (k === undefined) throw new Error(`unknown controlling source ${name}`);
    return k;
  };
  for (const e of elements) {
    const [p, q, cp, cq] = e.nodes.map(node);
    const k = branches.get(e.name) ?? -1;
    if (k >= 0) (add(p, k, 1), add(q, k, -1), add(k, p, 1), add(k, q, -1));
    if (e.kind === 'R' && e.value !== 0) conductance(p, q, 1 / e.value);
    else if (e.kind === 'C' && step) {
      const g = e.value / step.h;
      const before = (step.previous.v.get(e.nodes[0]) ?? 0) - (step.previous.v.get(e.nodes[1]) ?? 0);
      conductance(p, q, g);
      (rhs(p, g * before), rhs(q, -g * before));
    } else if (e.kind === 'I') (rhs(p, -e.value), rhs(q, e.value));
    else if (e.kind === 'V') b[k] += e.value;
    else if (e.kind === 'E') (add(k, cp, -e.value), add(k, cq, e.value));
    else if (e.kind === 'H') add(k, branchOf(e.control!), -e.value);
    else if (e.kind === 'F') (add(p, branchOf(e.control!), e.value), add(q, branchOf(e.control!), -e.value));
    else if (e.kind === 'G') (add(p, cp, e.value), add(p, cq, -e.value), add(q, cp, -e.value), add(q, cq, e.value));
  }
  const x = solveDense(a, b, n);
  return { v: new Map([...nodes].map(([name, j]) => [name, x[j]])), i: new Map([...branches].map(([name, j]) => [name, x[j]])) };
}
