/** Channel request with `times`: the impedance matrices join the steady response (issue 4 interface). */
import { describe, expect, test } from 'vitest';
import { solveChannelBody, EngineInputError } from '@shared/engine';
import { expectClose } from '../../helpers/float';

// Si block, Incropera & DeWitt Table A.1 at 300 K: k 148, ρ 2330, c_p 712.
const si = { thickness: 0.0005, k: 148, rho: 2330, cp: 712 };
const body = {
  footprint: { x: 0.01, y: 0.01 },
  above: { layers: [si], h: 20000 },
  below: { layers: [], h: 0 },
  sources: [
    { x: 0.003, y: 0.005, width: 0.002, height: 0.002, power: 1 },
    { x: 0.007, y: 0.005, width: 0.002, height: 0.002, power: 1 },
  ],
  times: [1e-5, 1e-3, 0.1, 10],
};

describe('solveChannelBody', () => {
  test('without times it is the steady response only', () => {
    const { times: _t, ...steadyBody } = body;
    const r = solveChannelBody(steadyBody) as { impedance?: unknown; matrix: number[][] };
    expect(r.impedance).toBeUndefined();
    expect(r.matrix).toHaveLength(2);
  });
  test('with times: one matrix per time, reciprocal, rising, and the steady matrix at long times', () => {
    const r = solveChannelBody(body) as { impedance: number[][][]; matrix: number[][] };
    expect(r.impedance).toHaveLength(4);
    for (const z of r.impedance) expectClose(z[0][1], z[1][0], 1e-6, 1e-12, 'reciprocity Z01 = Z10');
    const self = r.impedance.map((z) => z[0][0]);
    for (let k = 1; k < self.length; k++) expect(self[k]).toBeGreaterThan(self[k - 1]);
    expectClose(r.impedance[3][0][0], r.matrix[0][0], 1e-3, 0, 'Z(10 s) → steady R (time constant ≈ ρc_p·t/h ≈ 0.04 s)');
  });
  test('a transient without ρ·c_p is refused with the layer path', () => {
    const bad = { ...body, above: { layers: [{ thickness: 0.0005, k: 148 }], h: 20000 } };
    expect(() => solveChannelBody(bad)).toThrow(EngineInputError);
  });
});
