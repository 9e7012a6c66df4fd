import { describe, expect, it } from 'vitest';
import { EngineInputError } from '@shared/engine/errors';
import { analyseCoupling, evaluatePower, POWER_LAW_DEFAULTS } from '@shared/engine/electrothermal';
import { expectClose } from '../../../helpers/float';

// Copper α20 = 0.00393 /K (international annealed copper standard; physics.md §5).
const ALPHA_CU = 0.00393;

describe('Joule heating of a copper path', () => {
  it('uses the annealed-copper coefficient by default', () => {
    expectClose(POWER_LAW_DEFAULTS.alpha, ALPHA_CU, 0, 0, 'alpha default');
    const p = evaluatePower({ dynamic: 0, current: 10, pathResistance20: 0.01 }, 120);
    // R(T) = R20(1 + α(T − 20)): 0.01·(1 + 0.00393·100) = 0.01393 Ω (definition of α20)
    expectClose(p.joule, 100 * 0.01393, 1e-12, 0, 'I²R at 120 °C');
  });

  it('matches the closed form of the linear case', () => {
    // T = T0 + Rθ·I²·R20·(1 + α(T − 20)) is linear in T (algebra):
    // T = (T0 + Rθ I² R20 (1 − 20α)) / (1 − Rθ I² R20 α)
    const [T0, Rth, I, R20] = [45, 0.8, 200, 0.002];
    const g = Rth * I * I * R20;
    const expected = (T0 + g * (1 - 20 * ALPHA_CU)) / (1 - g * ALPHA_CU);
    const r = analyseCoupling({ R: [[Rth]], baseTemperatures: [T0], laws: [{ dynamic: 0, current: I, pathResistance20: R20 }] }, { margins: false });
    expect(r.status).toBe('stable');
    expectClose(r.temperatures[0], expected, 1e-12, 0, 'junction temperature');
    expectClose(r.loopGain, g * ALPHA_CU, 1e-9, 0, 'loop gain Rθ·I²·R20·α');
    expect(r.iterations).toBeLessThanOrEqual(2);
  });

  it('runs away when Rθ·I²·R20·α ≥ 1 and gives the current-scale margin 1/√(loop gain)', () => {
    // critical scale s*: Rθ (s I)² R20 α = 1 (same closed form)
    const [Rth, I, R20] = [2, 400, 0.0025];
    const g = Rth * I * I * R20 * ALPHA_CU;
    // the fixed point goes to infinity at s*: lift the temperature cap so the margin is the tangency itself
    const r = analyseCoupling({ R: [[Rth]], baseTemperatures: [25], laws: [{ dynamic: 0, current: I, pathResistance20: R20 }] }, { newton: { temperatureCap: 1e15 } });
    expect(g).toBeGreaterThan(1);
    expect(r.status).toBe('runaway');
    expectClose(r.margins!.powerScale.value!, 1 / Math.sqrt(g), 1e-5, 0, 'power scale margin');
    expect(r.margins!.ambient.value).toBeNull();
  });
});

describe('input checks', () => {
  const R = [[0.5]];
  it('warns (not errors) on κ above 0.2 /K and on a negative current', () => {
    const r = analyseCoupling({ R, baseTemperatures: [25], laws: [{ dynamic: 1, kappa: 0.25, leakageAtRef: 0.01, current: -3, pathResistance20: 0.001 }] }, { margins: false });
    expect(r.warnings.some((w) => w.includes('κ = 0.25'))).toBe(true);
    expect(r.warnings.some((w) => w.includes('current is negative'))).toBe(true);
  });
  it('throws a typed error with a field path on truly bad input', () => {
    const call = () => analyseCoupling({ R: [[0.5, 0.1]], baseTemperatures: [25], laws: [{ dynamic: Number.NaN }] });
    expect(call).toThrow(EngineInputError);
    try {
      call();
    } catch (e) {
      const paths = (e as EngineInputError).issues.map((i) => i.path);
      expect(paths).toContain('R[0]');
      expect(paths).toContain('laws[0].dynamic');
    }
  });
});
