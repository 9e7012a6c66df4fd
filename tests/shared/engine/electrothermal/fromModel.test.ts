import { describe, expect, it } from 'vitest';
import { lx9Model } from '@shared/demo/lx9';
import { assemblyNetwork } from '@shared/engine/assembly';
import { analyseModelCoupling, coupledProblemFromModel } from '@shared/engine/electrothermal';
import { expectClose } from '../../../helpers/float';

describe('electro-thermal problem of a model scenario', () => {
  const model = lx9Model();
  const net = assemblyNetwork(model);

  it('puts each part law at its junction node and keeps the assembly matrix', () => {
    const p = coupledProblemFromModel(model, 'idle', net);
    const n = net.nodes.length;
    expect(p.laws).toHaveLength(n);
    const cpu = model.parts.findIndex((q) => q.electrical && q.electrical.leakageAtRef > 0);
    const law = p.laws[net.junctionNode[cpu]];
    expectClose(law.leakageAtRef!, model.parts[cpu].electrical!.leakageAtRef, 0, 0, 'leakage at ref');
    expectClose(p.R[3][5], net.R[3 * n + 5], 0, 0, 'R entry');
  });

  it('with no leakage or current it reproduces the fixed-power temperatures exactly', () => {
    const plain = { ...model, parts: model.parts.map((q) => ({ ...q, electrical: undefined })) };
    const idle = model.scenarios.find((s) => s.id === 'idle')!;
    const noCurrent = { ...plain, scenarios: [{ ...idle, loads: Object.fromEntries(Object.entries(idle.loads).map(([k, v]) => [k, { ...v, current: undefined }])) }] };
    const r = analyseModelCoupling(noCurrent, 'idle', { margins: false });
    expect(r.status).toBe('stable');
    r.feedbackRise.forEach((d) => expectClose(d, 0, 0, 1e-9, 'no feedback'));
    expect(r.loopGain).toBe(0);
  });

  it('solves the demo scenarios to a stable point with a plain summary', () => {
    const r = analyseModelCoupling(model, 'idle', {}, net);
    expect(r.status).toBe('stable');
    expect(r.summary).toMatch(/^Stable operating point: .* A stable point exists up to .*× power, and up to .* °C ambient\.$/);
    expect(r.margins!.powerScale.value!).toBeGreaterThan(1);
  });
});
