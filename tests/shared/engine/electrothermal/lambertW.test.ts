import { describe, it } from 'vitest';
import { expectClose } from '../../../helpers/float';
import { lambertW0 } from './lambertW';

describe('lambertW0 (test reference)', () => {
  it('satisfies W·e^W = z across the principal branch', () => {
    for (const z of [-1 / Math.E + 1e-9, -0.3, -0.1, 0, 0.5, 1, 10]) {
      const w = lambertW0(z);
      expectClose(w * Math.exp(w), z, 1e-12, 1e-15, `W(${z})e^W`);
    }
  });
  it('matches known values', () => {
    // Omega constant W(1) = 0.5671432904097838 (Corless et al. 1996, §1)
    expectClose(lambertW0(1), 0.5671432904097838, 1e-14, 0, 'W(1)');
    // W(−1/e) = −1 (branch point; Corless et al. 1996)
    expectClose(lambertW0(-1 / Math.E), -1, 0, 1e-12, 'W(-1/e)');
    // W(e) = 1 by definition (1·e^1 = e)
    expectClose(lambertW0(Math.E), 1, 1e-14, 0, 'W(e)');
  });
});
