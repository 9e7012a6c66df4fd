import { describe, expect, it } from 'vitest';
import { analyseCoupling, solveCoupled } from '@shared/engine/electrothermal';
import { expectClose } from '../../../helpers/float';
import { lambertW0 } from './lambertW';

// One node: T = T0 + R·(P_dyn + P_L·e^{κ(T − T_ref)}) is u = a + b·e^{κu} with a = T0 + R·P_dyn,
// b = R·P_L·e^{−κ T_ref}; closed form u = a − W0(−κ b e^{κa})/κ, none if κ b e^{κa} > 1/e
// (Corless et al., Adv. Comput. Math. 5, 1996; physics.md §4).
const node = (T0: number, R: number, dynamic: number, leak: number, kappa: number, tRef = 85) => ({
  R: [[R]],
  baseTemperatures: [T0],
  laws: [{ dynamic, leakageAtRef: leak, kappa, referenceTemperature: tRef }],
  labels: ['compute-0'],
});
const closedForm = (T0: number, R: number, dyn: number, leak: number, kappa: number, tRef = 85) => {
  const a = T0 + R * dyn;
  const b = R * leak * Math.exp(-kappa * tRef);
  const z = -kappa * b * Math.exp(kappa * a);
  return { z, u: a - lambertW0(z) / kappa, gain: -lambertW0(z) };
};

describe('single-node leakage feedback against Lambert W', () => {
  for (const [T0, R, dyn, leak, kappa] of [
    [40, 0.5, 60, 10, 0.03],
    [25, 0.3, 150, 30, 0.045],
    [60, 1.2, 20, 5, 0.02],
  ]) {
    it(`T0=${T0} R=${R} P=${dyn} leak=${leak} κ=${kappa}`, () => {
      const ref = closedForm(T0, R, dyn, leak, kappa);
      const r = analyseCoupling(node(T0, R, dyn, leak, kappa), { margins: false });
      expect(r.status).toBe('stable');
      expectClose(r.temperatures[0], ref.u, 1e-11, 0, 'junction temperature');
      // loop gain at the root equals κ b e^{κu} = −W0(z) (same closed form)
      expectClose(r.loopGain, ref.gain, 1e-9, 0, 'loop gain');
      expect(r.residual).toBeLessThan(1e-9);
      expectClose(r.powers[0].leakage, leak * Math.exp(kappa * (ref.u - 85)), 1e-10, 0, 'leakage');
      expectClose(r.feedbackRise[0], ref.u - (T0 + R * (dyn + leak)), 1e-10, 1e-12, 'feedback rise');
    });
  }

  it('reports runaway when κ b e^{κa} > 1/e', () => {
    const z = -0.03 * (1 * 40 * Math.exp(-0.03 * 85)) * Math.exp(0.03 * (40 + 60));
    expect(-z).toBeGreaterThan(1 / Math.E);
    const r = analyseCoupling(node(40, 1, 60, 40, 0.03), { margins: false });
    expect(r.status).toBe('runaway');
    expect(r.loopGain).toBeGreaterThanOrEqual(1);
    expect(r.driver.label).toBe('compute-0');
    expect(r.summary).toMatch(/Thermal runaway/);
    expect(r.iterations).toBeLessThanOrEqual(100);
  });

  it('finds the power-scale and ambient margins at the tangency κ b e^{κa} = 1/e', () => {
    // Critical a*: κ b e^{κ a*} = 1/e → a* = (ln(1/(e κ b)))/κ (same closed form)
    const [T0, R, dyn, leak, kappa] = [40, 1, 60, 40, 0.03];
    const b = R * leak * Math.exp(-kappa * 85);
    const aStar = Math.log(1 / (Math.E * kappa * b)) / kappa;
    const r = analyseCoupling(node(T0, R, dyn, leak, kappa), { ambient: T0 });
    expectClose(r.margins!.powerScale.value!, (aStar - T0) / (R * dyn), 1e-5, 0, 'power scale margin');
    expectClose(r.margins!.ambient.value!, aStar - R * dyn, 0, 2e-3, 'ambient margin');
    expect(r.summary).toMatch(/A stable point exists up to/);
  });

  it('never loops forever: capped iterations report not-converged', () => {
    const s = solveCoupled(node(40, 0.5, 60, 10, 0.03), { maxIterations: 1 });
    expect(s.status).toBe('not-converged');
    expect(s.iterations).toBe(1);
  });
});
