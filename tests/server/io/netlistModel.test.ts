/** Netlist of a real assembly with its fitted Foster network: the DC solution still equals the steady result. */
import { describe, expect, it } from 'vitest';
import { lx9Model } from '@shared/demo/lx9';
import { solveAssembly } from '@shared/engine/assembly/solve';
import { networkStep } from '@shared/engine/transient';
import { spiceStems, writeNetlist } from '@shared/export';
import type { Model } from '@shared/schemas/model';
import { netlistModel } from '../../../server/api/io/netlistModel';
import { expectClose } from '../../helpers/float';
import { readNetlist } from '../../shared/export/spiceReader';
import { solveMna } from '../../shared/export/mnaSolve';

/** The demo without memory stacks (three parts), so the dense test solver stays small. */
function smallDemo(): Model {
  const m = lx9Model('A');
  const keep = new Set(['cpu-w', 'io', 'bridge']);
  m.parts = m.parts.filter((p) => keep.has(p.id));
  m.scenarios = m.scenarios.map((s) => ({ ...s, loads: Object.fromEntries(Object.entries(s.loads).filter(([id]) => keep.has(id))), profile: undefined }));
  return m;
}

describe('netlist model', () => {
  it('holds the Foster network when the model has heat capacities; DC equals the engine steady result (physics.md §2, §3: Z(∞) = R)', () => {
    const model = smallDemo();
    const result = solveAssembly(model, 'boost', { mapSize: 16 });
    const cm = netlistModel(model, result, 'auto');
    expect(cm.foster).toBeDefined();
    const text = writeNetlist(cm, { source: {} });
    expect(text).toMatch(/Foster network on \d+ time constants/);
    expect(text).toMatch(/NOTE: Foster fit/);
    expect(text).toMatch(/^CS_cpu_w_\d+ /m);
    const sol = solveMna(readNetlist(text));
    const stems = spiceStems(cm.nodes.map((n) => n.label));
    result.parts.forEach((p) => {
      const i = cm.nodes.findIndex((n) => n.partId === p.id && n.tier === 0);
      // Σ_k R_k equals the symmetrised steady entry, so agreement is to rounding (1e-9 relative).
      expectClose(sol.v.get(`t_${stems[i]}`)!, p.junction, 1e-9, 1e-9, p.id);
    });
  });

  it('after a power step, the netlist follows its Foster network (backward Euler, h = 0.1 ms, to 1 % of the rise at 20 ms)', () => {
    const model = smallDemo();
    const result = solveAssembly(model, 'boost', { mapSize: 16 });
    const cm = netlistModel(model, result, 'auto');
    const elements = readNetlist(writeNetlist(cm, { source: {} }));
    let state = solveMna(elements.map((e) => (e.kind === 'I' ? { ...e, value: 0 } : e)));
    const h = 1e-4;
    const steps = 200;
    for (let k = 0; k < steps; k++) state = solveMna(elements, { h, previous: state });
    const Z = networkStep(cm.foster!, h * steps);
    const stems = spiceStems(cm.nodes.map((n) => n.label));
    cm.nodes.forEach((n, i) => {
      const rise = Z[i].reduce((s, z, j) => s + z * cm.powers[j], 0);
      expectClose(state.v.get(`t_${stems[i]}`)! - cm.offsets[i], rise, 1e-2, 1e-3, `${n.label} rise at 20 ms`);
    });
  });

  it('writes the steady matrix when asked, and falls back to it when layers lack heat capacity', () => {
    const model = smallDemo();
    const result = solveAssembly(model, 'boost', { mapSize: 16 });
    expect(netlistModel(model, result, 'steady').foster).toBeUndefined();
    const bare = structuredClone(model);
    bare.stack.lid.layers = bare.stack.lid.layers.map(({ rho: _r, cp: _c, ...rest }) => rest);
    const fallback = netlistModel(bare, solveAssembly(bare, 'boost', { mapSize: 16 }), 'auto');
    expect(fallback.foster).toBeUndefined();
    expect(fallback.notes?.[0]).toMatch(/No transient network/);
  });
});
