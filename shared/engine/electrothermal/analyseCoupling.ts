/**
 * Electro-thermal analysis of one operating point (physics.md §4): the coupled solve, the
 * rise the feedback adds over fixed power, the loop gain and the part driving it, the
 * stability margins, and a plain-language summary.
 */
import { ambientMargin, powerScaleMargin, type Margin, type MarginSettings } from './margins';
import { loopGain } from './loopGain';
import { nominalPower } from './powerLaw';
import { COUPLED_DEFAULTS, solveCoupled, type CoupledProblem, type CoupledSettings } from './solveCoupled';
import { validateCoupledProblem } from './validateCoupling';

/** Options of analyseCoupling. */
export interface CouplingOptions {
  newton?: Partial<Omit<CoupledSettings, 'scale' | 'ambientShift'>>;
  /** Compute the margins (default true), optionally with search settings. */
  margins?: boolean | Partial<MarginSettings>;
  /** Ambient (°C) the base temperatures belong to; default the lowest base temperature. */
  ambient?: number;
}

/** Power of one node at the solution, W. */
export interface PowerParts {
  dynamic: number;
  leakage: number;
  joule: number;
  total: number;
}

/** Result of analyseCoupling. Temperatures in °C, rises in K, powers in W. */
export interface CouplingResult {
  status: 'stable' | 'runaway' | 'not-converged';
  reason?: 'loop-gain' | 'temperature-cap' | 'singular';
  iterations: number;
  residual: number;
  /** Solution (stable) or last Newton iterate (runaway / not converged). */
  temperatures: number[];
  /** Temperatures with fixed nominal power: leakage at its reference, copper at 20 °C. */
  fixedPowerTemperatures: number[];
  /** temperatures − fixedPowerTemperatures. */
  feedbackRise: number[];
  powers: PowerParts[];
  /** Spectral radius of R·diag(dP/dT) at the returned temperatures. */
  loopGain: number;
  /** Node with the largest share of the dominant feedback mode. */
  driver: { index: number; label: string; participation: number };
  margins?: { powerScale: Margin; ambient: Margin };
  warnings: string[];
  summary: string;
}

const fmt = (v: number, digits = 3) => Number(v.toPrecision(digits)).toString();

function describe(r: Omit<CouplingResult, 'summary'>, labels: readonly string[], cap: number): string {
  const hottest = r.temperatures.reduce((b, t, i) => (t > r.temperatures[b] ? i : b), 0);
  const head =
    r.status === 'stable'
      ? `Stable operating point: ${labels[hottest]} is hottest at ${fmt(r.temperatures[hottest], 4)} °C; ` +
        `feedback adds ${fmt(r.feedbackRise[hottest])} K there (loop gain ${fmt(r.loopGain)}).`
      : r.status === 'runaway'
        ? r.reason === 'temperature-cap'
          ? `Thermal runaway: temperatures climb past ${cap} °C without settling; ${r.driver.label} drives the feedback (loop gain ${fmt(r.loopGain)}).`
          : `Thermal runaway: no stable operating point exists; ${r.driver.label} drives the feedback (loop gain ${fmt(r.loopGain)} ≥ 1).`
        : `The coupled solve did not converge in ${r.iterations} iterations (residual ${fmt(r.residual)} K).`;
  if (!r.margins) return head;
  const { powerScale: p, ambient: a } = r.margins;
  const scale = p.value === null ? 'not even at zero dynamic power' : `up to ${fmt(p.value)}× power${p.beyondSearch ? ' or more' : ''}`;
  const amb = a.value === null ? 'at no ambient in the searched range' : `up to ${fmt(a.value, 4)} °C ambient${a.beyondSearch ? ' or more' : ''}`;
  return `${head} A stable point exists ${scale}, and ${amb}.`;
}

/** Solve the coupled problem and explain it; a runaway is a result, not an error. */
export function analyseCoupling(problem: CoupledProblem, options: CouplingOptions = {}): CouplingResult {
  const warnings = validateCoupledProblem(problem);
  const n = problem.laws.length;
  const labels = problem.labels ?? problem.laws.map((_, i) => `node-${i}`);
  const solve = solveCoupled(problem, options.newton);
  const fixedP = problem.laws.map((law) => nominalPower(law));
  const fixedPowerTemperatures = problem.baseTemperatures.map((t0, j) => t0 + problem.R[j].reduce((s, r, i) => s + r * fixedP[i], 0));
  const gain = loopGain(problem.R, solve.powers.map((p) => p.slope));
  const ambient = options.ambient ?? Math.min(...problem.baseTemperatures);
  const marginSettings = typeof options.margins === 'object' ? options.margins : {};
  const margins =
    options.margins === false || n === 0
      ? undefined
      : {
          powerScale: powerScaleMargin(problem, options.newton, marginSettings),
          ambient: ambientMargin(problem, ambient, options.newton, marginSettings),
        };
  const result: Omit<CouplingResult, 'summary'> = {
    status: solve.status,
    reason: solve.reason,
    iterations: solve.iterations,
    residual: solve.residual,
    temperatures: solve.temperatures,
    fixedPowerTemperatures,
    feedbackRise: solve.temperatures.map((t, j) => t - fixedPowerTemperatures[j]),
    powers: solve.powers.map(({ dynamic, leakage, joule, total }) => ({ dynamic, leakage, joule, total })),
    loopGain: gain.gain,
    driver: { index: gain.driver, label: labels[gain.driver] ?? `node-${gain.driver}`, participation: gain.participation[gain.driver] ?? 0 },
    margins,
    warnings,
  };
  return { ...result, summary: describe(result, labels, options.newton?.temperatureCap ?? COUPLED_DEFAULTS.temperatureCap) };
}
