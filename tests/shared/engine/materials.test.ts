/** The demo material list carries the handbook values it claims. */
import { describe, expect, it } from 'vitest';
import { DEMO_MATERIALS, material } from '@shared/demo/materials';
import { expectClose } from '../../helpers/float';

describe('demo materials', () => {
  it.each([
    // Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, Table A.1 (300 K): [id, k, rho, cp]
    ['si', 148, 2330, 712],
    ['cu', 401, 8933, 385],
    ['al', 237, 2702, 903],
  ])('%s matches Incropera & DeWitt Table A.1', (id, k, rho, cp) => {
    const m = material(id);
    expectClose(m.kxy, k, 0, 0, `${id} k`);
    expectClose(m.kz, k, 0, 0, `${id} k`);
    expectClose(m.rho, rho, 0, 0, `${id} rho`);
    expectClose(m.cp, cp, 0, 0, `${id} cp`);
    expect(m.source).toMatch(/Incropera/);
  });

  it('package materials sit in the common-practice ranges and say so (physics.md §5, common practice)', () => {
    expect(material('tim-polymer').kz).toBeGreaterThanOrEqual(1);
    expect(material('tim-polymer').kz).toBeLessThanOrEqual(6);
    expect(material('microbump-underfill').kz).toBeGreaterThanOrEqual(2);
    expect(material('microbump-underfill').kz).toBeLessThanOrEqual(20);
    expect(material('mold').kz).toBeGreaterThanOrEqual(0.6);
    expect(material('mold').kz).toBeLessThanOrEqual(1);
    for (const m of DEMO_MATERIALS) if (!/Incropera/.test(m.source)) expect(m.source).toMatch(/common practice/);
  });
});
