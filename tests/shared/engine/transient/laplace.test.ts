import { describe, expect, it } from 'vitest';
import { stehfestInvert, stehfestWeights, talbotInvert, type Complex } from '@shared/engine/transient';
import { expectClose } from '../../../helpers/float';

const div = (a: Complex, b: Complex): Complex => {
  const d = b.re * b.re + b.im * b.im;
  return { re: (a.re * b.re + a.im * b.im) / d, im: (a.im * b.re - a.re * b.im) / d };
};
const mul = (a: Complex, b: Complex): Complex => ({ re: a.re * b.re - a.im * b.im, im: a.re * b.im + a.im * b.re });

describe('Stehfest inversion', () => {
  it('weights: Σ V_k = 0 and Σ V_k/k = 1 (inverting F = 1 and F = 1/s; from memory)', () => {
    const V = stehfestWeights(14);
    expectClose(V.reduce((a, b) => a + b, 0), 0, 0, 1e-6, 'sum of weights');
    expectClose(V.reduce((a, b, k) => a + b / (k + 1), 0), 1, 1e-8, 0, 'sum of V_k/k');
    expect(Math.max(...V.map(Math.abs))).toBeGreaterThan(1e6);
  });
  it('inverts 1/(s(s+a)) ↔ (1 − e^{−at})/a (standard transform table)', () => {
    const a = 3;
    for (const t of [0.01, 0.1, 0.5, 1, 3]) {
      expectClose(stehfestInvert((s) => 1 / (s * (s + a)), t), (1 - Math.exp(-a * t)) / a, 1e-4, 1e-7, `t=${t}`);
    }
  });
  it('inverts erfc-type diffusion transform 1/s^{3/2} ↔ 2√(t/π) (standard transform table)', () => {
    for (const t of [1e-6, 1e-3, 1]) expectClose(stehfestInvert((s) => s ** -1.5, t), 2 * Math.sqrt(t / Math.PI), 1e-6, 0, `t=${t}`);
  });
  it('inverts 1/s ↔ 1 to high accuracy', () => {
    expectClose(stehfestInvert((s) => 1 / s, 2.5), 1, 1e-8, 0, 'step');
  });
});

describe('fixed Talbot inversion', () => {
  it('inverts 1/(s(s+a)) ↔ (1 − e^{−at})/a (standard transform table)', () => {
    const a = 3;
    const F = (s: Complex) => div({ re: 1, im: 0 }, mul(s, { re: s.re + a, im: s.im }));
    for (const t of [0.01, 0.1, 1, 3, 10]) expectClose(talbotInvert(F, t), (1 - Math.exp(-a * t)) / a, 1e-9, 1e-12, `t=${t}`);
  });
  it('inverts an oscillating transform 1/(s² + 1) ↔ sin t, where Stehfest fails (standard table)', () => {
    const F = (s: Complex) => div({ re: 1, im: 0 }, { re: s.re * s.re - s.im * s.im + 1, im: 2 * s.re * s.im });
    for (const t of [0.5, 2, 5]) expectClose(talbotInvert(F, t, 32), Math.sin(t), 0, 1e-8, `t=${t}`);
  });
  it('rejects t ≤ 0', () => {
    expect(() => talbotInvert((s) => s, 0)).toThrow(RangeError);
  });
});
