import { describe, expect, it } from 'vitest';
import { lx9Model } from '@shared/demo/lx9';
import { EngineInputError } from '@shared/engine/errors';
import { modelTimingAnswers, networkStep, prepareModelTransient, scenarioSchedule, scenarioTimeline } from '@shared/engine/transient';
import { expectClose } from '../../../helpers/float';

describe('transient answers of the demo model', () => {
  const model = lx9Model();
  const mt = prepareModelTransient(model, { count: 40 });

  it('builds the boost profile: pulses on the compute dies, scenario power elsewhere', () => {
    const s = scenarioSchedule(mt, model, 'boost');
    const boost = model.scenarios.find((x) => x.id === 'boost')!;
    const seg = Object.values(boost.profile!.parts)[0][0];
    expect(seg.kind).toBe('pulses');
    if (seg.kind !== 'pulses') return;
    expect(s.power.length).toBe(2 * seg.repeats);
    const cpu = mt.impedance.sourceLabels.indexOf(Object.keys(boost.profile!.parts)[0]);
    expect(s.power[0][cpu]).toBe(seg.onPower);
    expect(s.power[1][cpu]).toBe(seg.offPower);
  });

  it('starts the timeline at the steady state of its startFrom scenario and stays below the boost steady state', () => {
    const tl = scenarioTimeline(mt, model, 'boost');
    expect(tl.status).toBe('complete');
    expect(tl.startFrom).toBe('idle');
    const idle = model.scenarios.find((x) => x.id === 'idle')!;
    const node = mt.impedance.sourceNodes[0];
    const Z = networkStep(mt.fit.network, Infinity);
    const powers = mt.impedance.sourceList.map((s) => (s.kind === 'tiers' ? (idle.loads[model.parts[s.part].id]?.tiers ?? []).reduce((a, b) => a + b, 0) : (idle.loads[model.parts[s.part].id]?.power ?? 0)));
    // linearity: the idle steady temperature is the base plus Σ R·P (physics.md §2)
    expectClose(tl.temperatures[node][0], mt.baseTemperatures[node] + Z[node].reduce((a, r, i) => a + r * powers[i], 0), 1e-9, 0, 'start temperature');
    expect(tl.limits[node]).toBe(model.parts[0].limits.junction);
  });

  it('feedback raises the peaks (leakage grows with temperature)', () => {
    const plain = scenarioTimeline(mt, model, 'boost');
    const fed = scenarioTimeline(mt, model, 'boost', { feedback: true });
    const j = mt.impedance.sourceNodes[0];
    expect(fed.peaks[j].temperature).toBeGreaterThan(plain.peaks[j].temperature);
  });

  it('answers timing questions in plain sentences', () => {
    const a = modelTimingAnswers(mt, model, { partId: 'cpu-w', scenarioId: 'idle', boostPower: 160, limit: 80, reenable: 70, period: 0.1 });
    expect(a.boost.time).toBeGreaterThan(0);
    expect(a.boost.sentence).toMatch(/^cpu-w reaches 80 °C after [\d.]+ (ms|s) at 160 W from idle\.$/);
    expect(a.rest!.sentence).toMatch(/^cpu-w cools from 80 °C to 70 °C in /);
    expect(a.duty!.sentence).toMatch(/^At a 100 ms period /);
    expect(() => modelTimingAnswers(mt, model, { partId: 'nope', boostPower: 1 })).toThrow(EngineInputError);
  });
});
