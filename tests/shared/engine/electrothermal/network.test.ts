import { describe, expect, it } from 'vitest';
import { analyseCoupling, evaluatePower, isLoopStable, loopGain, solveCoupled, type CoupledProblem } from '@shared/engine/electrothermal';
import { expectClose } from '../../../helpers/float';

// Invented three-part influence matrix (K/W), symmetric and positive as reciprocity requires.
const R = [
  [0.25, 0.06, 0.03],
  [0.06, 0.3, 0.05],
  [0.03, 0.05, 0.5],
];
const problem: CoupledProblem = {
  R,
  baseTemperatures: [35, 35, 36],
  labels: ['compute-0', 'compute-1', 'memory-0'],
  laws: [
    // κ 0.02–0.05 /K is common practice for leakage (physics.md §5, no single source)
    { dynamic: 150, leakageAtRef: 20, kappa: 0.035, current: 180, pathResistance20: 0.0005 },
    { dynamic: 90, leakageAtRef: 12, kappa: 0.03 },
    { dynamic: 12, leakageAtRef: 1, kappa: 0.02 },
  ],
};

function fixedPoint(p: CoupledProblem, scale = 1): { T: number[]; iterations: number } {
  let T = [...p.baseTemperatures];
  for (let k = 1; k <= 100000; k++) {
    const P = p.laws.map((law, i) => evaluatePower(law, T[i], scale).total);
    const next = p.baseTemperatures.map((t0, j) => t0 + p.R[j].reduce((s, r, i) => s + r * P[i], 0));
    const change = Math.max(...next.map((t, j) => Math.abs(t - T[j])));
    T = next;
    if (change < 1e-12) return { T, iterations: k };
  }
  throw new Error('plain iteration did not converge');
}

describe('coupled network', () => {
  it('Newton agrees with plain fixed-point iteration where both converge (and needs fewer steps)', () => {
    const newton = analyseCoupling(problem, { margins: false });
    const plain = fixedPoint(problem);
    expect(newton.status).toBe('stable');
    newton.temperatures.forEach((t, j) => expectClose(t, plain.T[j], 1e-10, 0, `T[${j}]`));
    expect(newton.iterations).toBeLessThan(plain.iterations);
    newton.powers.forEach((p) => expectClose(p.total, p.dynamic + p.leakage + p.joule, 1e-14, 0, 'power split sums'));
    // fixed power takes leakage at its 85 °C reference: a part running cooler gets a negative rise
    newton.feedbackRise.forEach((r, j) => expectClose(r, newton.temperatures[j] - newton.fixedPowerTemperatures[j], 1e-12, 1e-12, 'rise'));
    expect(newton.temperatures[0]).toBeGreaterThan(85);
    expect(newton.feedbackRise[0]).toBeGreaterThan(0);
  });

  it('names the hottest-feedback part as the driver and keeps margins consistent', () => {
    const r = analyseCoupling(problem, { ambient: 35 });
    expect(r.driver.label).toBe('compute-0');
    const s = r.margins!.powerScale.value!;
    expect(s).toBeGreaterThan(1);
    expect(solveCoupled(problem, { scale: s * (1 - 1e-4) }).status).toBe('stable');
    expect(solveCoupled(problem, { scale: s * (1 + 1e-3) }).status).toBe('runaway');
    const amb = r.margins!.ambient.value!;
    expect(solveCoupled(problem, { ambientShift: amb - 35 - 0.01 }).status).toBe('stable');
    expect(solveCoupled(problem, { ambientShift: amb - 35 + 0.01 }).status).toBe('runaway');
  });

  it('loop gain: power iteration equals the 1×1 closed form and agrees with the stability test', () => {
    expectClose(loopGain([[2]], [0.3]).gain, 0.6, 1e-12, 0, '1×1 loop gain');
    const g = loopGain(R, [1, 2, 0.5]);
    expect(g.converged).toBe(true);
    expect(isLoopStable(R, [1, 2, 0.5])).toBe(g.gain < 1);
    const big = [4, 8, 2];
    expect(isLoopStable(R, big)).toBe(loopGain(R, big).gain < 1);
  });
});
