/** SPICE netlist of the compact model: its DC solution (own MNA reader/solver) equals the engine's steady result. */
import { beforeAll, describe, expect, it } from 'vitest';
import { lx9Model } from '@shared/demo/lx9';
import { solveAssembly } from '@shared/engine/assembly/solve';
import type { AssemblyResult } from '@shared/engine/assembly/result';
import { networkStep, type FosterNetwork } from '@shared/engine/transient';
import { compactModel, writeNetlist, spiceStems, type CompactModel } from '@shared/export';
import { expectClose } from '../../helpers/float';
import { readNetlist } from './spiceReader';
import { solveMna } from './mnaSolve';

const source = { project: 'LX-9 accelerator module', assembly: 'Module', variant: 'A — memory flanking compute', version: 3 };

function twoNode(foster?: FosterNetwork): CompactModel {
  const nodes = ['hot', 'cool'].map((label) => ({ label, partId: label, partName: label, tier: 0, limit: 105 }));
  // Hand example: T = T_fluid + R·P (physics.md §2) with R = [[2, 0.5], [0.5, 1]] K/W, P = (10, 4) W, fluid 40 °C → 62 °C, 49 °C (arithmetic).
  return { scenario: { id: 's', name: 'hand' }, nodes, R: [[2, 0.5], [0.5, 1]], offsets: [40, 40], powers: [10, 4], temperatures: [62, 49], foster };
}

describe('SPICE netlist', () => {
  let result: AssemblyResult;
  beforeAll(() => {
    result = solveAssembly(lx9Model('A'), 'boost', { mapSize: 16 });
  });

  it('DC solution reproduces every junction and DRAM tier temperature of the demo (engine steady result, physics.md §2)', () => {
    const cm = compactModel(result);
    const text = writeNetlist(cm, { source });
    const sol = solveMna(readNetlist(text));
    const stems = spiceStems(cm.nodes.map((n) => n.label));
    expect(cm.nodes.length).toBe(result.tierInfluence.nodes.length);
    for (const p of result.parts) {
      const i = cm.nodes.findIndex((n) => n.partId === p.id && n.tier === 0);
      expectClose(sol.v.get(`t_${stems[i]}`)!, p.junction, 1e-9, 1e-9, `${p.id} junction`);
      for (const t of p.tiers) {
        const k = cm.nodes.findIndex((n) => n.partId === p.id && n.tier === t.tier);
        expectClose(sol.v.get(`t_${stems[k]}`)!, t.temperature, 1e-9, 1e-9, `${p.id} tier ${t.tier}`);
      }
    }
    cm.powers.forEach((w, i) => expectClose(sol.i.get(`vp_${stems[i]}`)!, w, 1e-9, 1e-12, `power of ${cm.nodes[i].label}`));
  });

  it('a two-node hand example gives T = T_fluid + R·P (arithmetic, physics.md §2)', () => {
    const sol = solveMna(readNetlist(writeNetlist(twoNode(), { source })));
    expectClose(sol.v.get('t_hot')!, 62, 1e-12, 1e-12, 'hot');
    expectClose(sol.v.get('t_cool')!, 49, 1e-12, 1e-12, 'cool');
  });

  it('states units, source, scenario and the caution in its comment header, ASCII only', () => {
    const text = writeNetlist(compactModel(result), { source, exportedAt: new Date('2026-01-02T03:04:05Z') });
    const head = text.split('\n').filter((l) => l.startsWith('*')).join('\n');
    expect(head).toContain('1 V = 1 degC');
    expect(head).toContain('1 A = 1 W');
    expect(head).toContain('LX-9 accelerator module / Module / A - memory flanking compute (version 3)');
    expect(head).toContain('2026-01-02T03:04:05.000Z');
    expect(head).toContain('CAUTION');
    expect(head).toContain('steady influence matrix');
    expect(/^[\x20-\x7e\n]*$/.test(text)).toBe(true);
    expect(text.trimEnd().endsWith('.end')).toBe(true);
  });

  it('gives distinct node names to ids that differ only in case or punctuation', () => {
    expect(spiceStems(['A-1', 'a_1', 'mem-1/tier 3'])).toEqual(['a_1', 'a_1_2', 'mem_1_t3']);
  });

  describe('with a Foster network', () => {
    // Invented two-node network; Σ_k R_k = steady R (physics.md §3: Z(t → ∞) = R).
    const foster: FosterNetwork = {
      tau: [0.01, 0.1, 1],
      R: [
        [[0.5, 1, 0.5], [-0.1, 0.2, 0.4]],
        [[-0.1, 0.2, 0.4], [0.2, 0.3, 0.5]],
      ],
      labels: ['hot', 'cool'],
    };

    it('DC solution equals the steady result (capacitors open)', () => {
      const text = writeNetlist(twoNode(foster), { source });
      expect(text).toContain('Foster network on 3 time constants');
      const sol = solveMna(readNetlist(text));
      expectClose(sol.v.get('t_hot')!, 62, 1e-12, 1e-12, 'hot');
      expectClose(sol.v.get('t_cool')!, 49, 1e-12, 1e-12, 'cool');
    });

    it('a power step follows the Foster step response (backward Euler, h = 20 µs, to 0.5 %)', () => {
      const elements = readNetlist(writeNetlist(twoNode(foster), { source }));
      const off = elements.map((e) => (e.kind === 'I' ? { ...e, value: 0 } : e));
      let state = solveMna(off);
      const h = 2e-5;
      const steps = 2500;
      for (let s = 0; s < steps; s++) state = solveMna(elements, { h, previous: state });
      const Z = networkStep(foster, h * steps);
      const expected = [40 + Z[0][0] * 10 + Z[0][1] * 4, 40 + Z[1][0] * 10 + Z[1][1] * 4];
      expectClose(state.v.get('t_hot')!, expected[0], 5e-3, 0, 'hot at 50 ms');
      expectClose(state.v.get('t_cool')!, expected[1], 5e-3, 0, 'cool at 50 ms');
    });
  });
});
