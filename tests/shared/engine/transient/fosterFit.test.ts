import { describe, expect, it } from 'vitest';
import { fitFoster, fitFosterNetwork, fosterStep, leastSquares, logSpacedTaus, networkStep, nnls } from '@shared/engine/transient';
import { expectClose } from '../../../helpers/float';

describe('least squares and NNLS', () => {
  it('least squares recovers an exact solution of an overdetermined consistent system', () => {
    const A = [[1, 2], [3, 4], [5, 7]];
    const x = leastSquares(A, A.map((r) => 2 * r[0] - 3 * r[1]));
    expectClose(x[0], 2, 1e-12, 0, 'x0');
    expectClose(x[1], -3, 1e-12, 0, 'x1');
  });
  it('NNLS matches a hand-worked problem with an active bound', () => {
    // min ‖A x − b‖, x ≥ 0 with b = A·(3, −1) = (1, 5, 8): x1 is held at 0 and the one-column
    // problem gives x0 = a0ᵀb/a0ᵀa0 = 56/35 = 1.6; gradient a1ᵀ(b − 1.6 a0) = −0.4 < 0 (worked by hand)
    const A = [[1, 2], [3, 4], [5, 7]];
    const r = nnls(A, [1, 5, 8]);
    expect(r.converged).toBe(true);
    expectClose(r.x[0], 1.6, 1e-12, 0, 'x0');
    expect(r.x[1]).toBe(0);
  });
});

describe('Foster fit', () => {
  it('reproduces a positive Foster network whose time constants lie on the grid', () => {
    // three lumped terms (invented; each is Incropera & DeWitt ch. 5's lumped response)
    const tau = logSpacedTaus(1e-6, 10, 4);
    const trueR = tau.map((_, k) => (k === 5 ? 0.02 : k === 12 ? 0.1 : k === 23 ? 0.3 : 0));
    const times = logSpacedTaus(1e-6, 10, 6);
    const f = fitFoster(times, times.map((t) => fosterStep(trueR, tau, t)), tau, 0.42);
    expect(f.converged).toBe(true);
    expect(f.R.every((r) => r >= 0)).toBe(true);
    expectClose(f.R.reduce((a, b) => a + b, 0), 0.42, 1e-12, 0, 'Σ R_k');
    expect(f.relError).toBeLessThan(1e-6);
  });
  it('fits a continuous positive spectrum to better than 0.1 % of R', () => {
    // 1 − 1/√(1 + t/τ): its complement is completely monotone (Laplace transform of a gamma
    // density; Feller, An Introduction to Probability Theory II, XIII.4), like a diffusion response
    const times = logSpacedTaus(1e-6, 100, 8);
    const Z = times.map((t) => 0.5 * (1 - 1 / Math.sqrt(1 + t / 1e-3)));
    const tau = logSpacedTaus(5e-7, 100, 4);
    // steady value taken at the last sample: the tail beyond 100 s is not representable on this grid
    const f = fitFoster(times, Z, tau, Z[Z.length - 1]);
    expect(f.R.every((r) => r >= 0)).toBe(true);
    expect(f.relError).toBeLessThan(1e-3);
  });
  it('fits a delayed transfer response with signed terms', () => {
    // transfer-like: difference of two lumped responses, zero slope at t = 0 (invented)
    const times = logSpacedTaus(1e-6, 10, 6);
    const Z = times.map((t) => 0.1 * (1 - Math.exp(-t / 0.01)) - 0.1 * 0.5 * (1 - Math.exp(-t / 0.005)) * 2 + 0.1 * (1 - Math.exp(-t / 0.005)));
    const tau = logSpacedTaus(5e-7, 10, 4);
    const f = fitFoster(times, Z, tau, 0.1, { sign: 'signed' });
    expect(f.relError).toBeLessThan(1e-3);
  });
  it('fits a symmetric 2×2 matrix and keeps reciprocity and the steady limit', () => {
    const times = logSpacedTaus(1e-5, 100, 5);
    // time constants 1e-3 and 1 s lie on the 5-per-decade grid from 5e-6
    const self = (t: number) => fosterStep([0.1, 0.4], [1e-3, 1], t);
    const cross = (t: number) => fosterStep([-0.05, 0.15], [1e-3, 1], t);
    const Z = times.map((t) => [[self(t), cross(t)], [cross(t), self(t)]]);
    const fit = fitFosterNetwork({ times, Z, steady: [[0.5, 0.1], [0.1, 0.5]] }, { tauMin: 1e-5, tauMax: 100, perDecade: 5 });
    const Zinf = networkStep(fit.network, 1e6);
    expectClose(Zinf[0][0], 0.5, 1e-6, 0, 'Z00(∞)');
    expectClose(Zinf[0][1], 0.1, 1e-5, 0, 'Z01(∞)');
    expect(fit.network.R[0][1]).toEqual(fit.network.R[1][0]);
    expect(fit.worst.relError).toBeLessThan(2e-3);
  });
});
