import { describe, expect, it } from 'vitest';
import { lx9Model } from '@shared/demo/lx9';
import { assemblyImpedance, fitFosterNetwork, networkStep, prepareLaplaceAssembly, TransientCancelledError } from '@shared/engine/transient';
import { expectClose } from '../../../helpers/float';

describe('assembly impedance of the demo model', () => {
  const model = lx9Model();
  const lap = prepareLaplaceAssembly(model);
  const z = assemblyImpedance(model, { laplace: lap, count: 40 });

  it('settles to the steady matrix and passes its own checks', () => {
    // β-projection at half truncation: within the steady truncation tolerance 3e-5 (physics.md §1)
    expect(z.checks.steadyError).toBeLessThan(3e-5);
    expect(z.checks.settleError).toBeLessThan(1e-3);
    // exact in exact arithmetic; Stehfest's weights (~1e8) amplify round-off
    expect(z.checks.reciprocityError).toBeLessThan(1e-7);
    // causality: at 1 µs a part has barely warmed
    expect(z.checks.firstTimeFraction).toBeLessThan(1e-3);
    expect(z.checks.selfDecrease).toBeLessThan(1e-4);
    expect(z.times[0]).toBe(1e-6);
    expect(z.times[z.times.length - 1]).toBeGreaterThanOrEqual(z.settleTime);
  });

  it('keeps the steady matrix of the assembly engine at s = 0 with the full kernels', () => {
    const full = assemblyImpedance(model, { laplace: prepareLaplaceAssembly(model, lap.steady, { kernelModes: 'full' }), times: [1e-3] });
    expect(full.checks.steadyError).toBeLessThan(1e-6);
    const n = lap.nodeCount;
    full.sourceNodes.forEach((node, i) => node >= 0 && expectClose(full.steady[node][i], lap.steady.R[node * n + node], 1e-6, 0, `R self ${i}`));
  });

  it('reports progress and can be cancelled', () => {
    const seen: number[] = [];
    const call = () => assemblyImpedance(model, { laplace: lap, onProgress: (f) => seen.push(f), shouldCancel: () => seen.length > 3 });
    expect(call).toThrow(TransientCancelledError);
    expect(seen.every((f) => f >= 0 && f <= 1)).toBe(true);
  });

  it('is fitted by a Foster network with the steady limit exact', () => {
    const fit = fitFosterNetwork(z);
    expect(fit.worst.relError).toBeLessThan(2e-3);
    const last = networkStep(fit.network, Infinity);
    z.steady.forEach((row, j) => row.forEach((r, i) => expectClose(last[j][i], r, 1e-9, 1e-12, `Z_${j}${i}(∞)`)));
  });
});
