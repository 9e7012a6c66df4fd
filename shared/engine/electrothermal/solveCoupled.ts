/**
 * Newton solve of the electro-thermal fixed point T = T0 + R·P(T) (physics.md §4), with
 * Jacobian I − R·diag(dP/dT). Started from T0 it climbs monotonically to the lowest (stable)
 * fixed point when R ≥ 0 and each P is convex and increasing (Ortega & Rheinboldt, Iterative
 * Solution of Nonlinear Equations, 1970, §13.3); an iterate whose loop gain reaches 1 therefore
 * proves that no stable point exists.
 */
import { luSolve } from './denseLinear';
import { isLoopStable } from './loopGain';
import { evaluatePower, type NodePowerLaw, type PowerSplit } from './powerLaw';

/** The coupled problem: influence matrix (K/W), base temperatures (°C) and one power law per node. */
export interface CoupledProblem {
  /** Symmetric influence matrix R[j][i]: rise of node j (K) per watt in node i. */
  R: readonly (readonly number[])[];
  /** Temperature of each node with no power (fluid temperatures carried through), °C. */
  baseTemperatures: readonly number[];
  laws: readonly NodePowerLaw[];
  /** Names of the nodes for messages (default node-0, node-1, …). */
  labels?: readonly string[];
}

/** Newton settings (defaults in COUPLED_DEFAULTS). */
export interface CoupledSettings {
  /** Power scale factor: multiplies dynamic power and currents. */
  scale: number;
  /** Uniform rise of every base temperature (ambient change), K. */
  ambientShift: number;
  maxIterations: number;
  /** Convergence on max |T − T0 − R·P(T)|, K. */
  tolerance: number;
  /** An iterate above this temperature (°C) counts as runaway. */
  temperatureCap: number;
}

/** Default Newton settings. */
export const COUPLED_DEFAULTS: CoupledSettings = {
  scale: 1,
  ambientShift: 0,
  maxIterations: 100,
  tolerance: 1e-9,
  temperatureCap: 1000,
};

/** Outcome of one Newton solve. */
export interface CoupledSolve {
  status: 'stable' | 'runaway' | 'not-converged';
  /** Why a runaway was declared. */
  reason?: 'loop-gain' | 'temperature-cap' | 'singular';
  /** Final (or last) temperatures, °C. */
  temperatures: number[];
  powers: PowerSplit[];
  iterations: number;
  /** Max |T − T0 − R·P(T)| at the returned temperatures, K. */
  residual: number;
}

function residualOf(p: CoupledProblem, T: readonly number[], P: readonly PowerSplit[], shift: number): number[] {
  return T.map((t, j) => {
    let s = 0;
    for (let i = 0; i < P.length; i++) s += p.R[j][i] * P[i].total;
    return t - p.baseTemperatures[j] - shift - s;
  });
}

/** Solve T = T0 + R·P(T) by Newton from T0 (+ ambient shift); bounded, never loops forever. */
export function solveCoupled(problem: CoupledProblem, settings: Partial<CoupledSettings> = {}): CoupledSolve {
  const o = { ...COUPLED_DEFAULTS, ...settings };
  let T = problem.baseTemperatures.map((t) => t + o.ambientShift);
  const powersAt = (temps: readonly number[]) => problem.laws.map((law, i) => evaluatePower(law, temps[i], o.scale));
  const done = (status: CoupledSolve['status'], iterations: number, reason?: CoupledSolve['reason']): CoupledSolve => {
    const powers = powersAt(T);
    const F = residualOf(problem, T, powers, o.ambientShift);
    return { status, reason, temperatures: T, powers, iterations, residual: Math.max(0, ...F.map(Math.abs)) };
  };
  for (let it = 0; it < o.maxIterations; it++) {
    const P = powersAt(T);
    const slopes = P.map((p) => p.slope);
    if (!isLoopStable(problem.R, slopes)) return done('runaway', it, 'loop-gain');
    const F = residualOf(problem, T, P, o.ambientShift);
    if (Math.max(0, ...F.map(Math.abs)) <= o.tolerance) return done('stable', it);
    const J = problem.R.map((row, j) => row.map((r, i) => (i === j ? 1 : 0) - r * slopes[i]));
    const step = luSolve(J, F.map((f) => -f));
    if (!step) return done('runaway', it + 1, 'singular');
    T = T.map((t, j) => t + step[j]);
    if (T.some((t) => !(t <= o.temperatureCap))) return done('runaway', it + 1, 'temperature-cap');
  }
  const last = done('not-converged', o.maxIterations);
  return last.residual <= o.tolerance ? { ...last, status: 'stable' } : last;
}

