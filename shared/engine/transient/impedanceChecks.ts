/**
 * Checks of computed impedance matrices (physics.md §3): the projected kernels reproduce the steady
 * matrix of the assembly, Z(t_end) has settled to it, reciprocity Z_ji = Z_ij among node sources at
 * every time, causality (Z(t_first) ≪ R) and non-decreasing self-impedances.
 */
import type { LaplaceAssembly } from './laplaceAssembly';
import type { ImpedanceSource } from './impedanceSources';

/** Figures of the checks; errors are relative to the largest steady entry. */
export interface ImpedanceChecks {
  /** max |R(kernel, s = 0) − R(assembly)|: the error of the β-projection. */
  steadyError: number;
  /** max |Z(t_last) − R|. */
  settleError: number;
  /** max |Z_ji − Z_ij| over source pairs sitting on single nodes, over all times. */
  reciprocityError: number;
  /** Largest Z_ii(t_first) / R_ii over self entries. */
  firstTimeFraction: number;
  /** Largest drop of a self-impedance between consecutive times (0 when non-decreasing). */
  selfDecrease: number;
}

/** Compute the checks from flat matrices z[k][j·S + i] and the steady R0 of the same sources. */
export function impedanceChecks(lap: LaplaceAssembly, sources: readonly ImpedanceSource[], times: readonly number[], z: readonly Float64Array[], R0: Float64Array): ImpedanceChecks {
  const S = sources.length;
  const n = lap.nodeCount;
  let big = 0;
  for (const v of R0) big = Math.max(big, Math.abs(v));
  let steadyError = 0;
  for (let j = 0; j < n; j++) {
    for (let i = 0; i < S; i++) {
      let ref = 0;
      const w = sources[i].weights;
      for (let q = 0; q < n; q++) if (w[q] !== 0) ref += w[q] * lap.steady.R[j * n + q];
      steadyError = Math.max(steadyError, Math.abs(R0[j * S + i] - ref));
    }
  }
  const last = z[z.length - 1];
  let settleError = 0;
  for (let e = 0; e < R0.length; e++) settleError = Math.max(settleError, Math.abs(last[e] - R0[e]));
  const point = sources.map((s, i) => ({ i, node: s.node })).filter((s) => s.node >= 0);
  let reciprocityError = 0;
  let firstTimeFraction = 0;
  let selfDecrease = 0;
  for (const a of point) {
    for (const b of point) for (const zk of z) reciprocityError = Math.max(reciprocityError, Math.abs(zk[a.node * S + b.i] - zk[b.node * S + a.i]));
    const self = a.node * S + a.i;
    firstTimeFraction = Math.max(firstTimeFraction, z[0][self] / R0[self]);
    for (let k = 1; k < times.length; k++) selfDecrease = Math.max(selfDecrease, (z[k - 1][self] - z[k][self]) / R0[self]);
  }
  const rel = (v: number) => (big > 0 ? v / big : v);
  return { steadyError: rel(steadyError), settleError: rel(settleError), reciprocityError: rel(reciprocityError), firstTimeFraction, selfDecrease };
}
