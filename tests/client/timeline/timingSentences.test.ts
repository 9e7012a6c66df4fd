// @vitest-environment happy-dom
/** Timing answers as sentences: numbers from a lumped one-node network, set in bold; input checks of the request builder. */
import { describe, expect, test } from 'vitest';
import { mount } from '@vue/test-utils';
import { modelTimingAnswers, prepareModelTransient, timingAnswers, type FosterNetwork } from '@shared/engine/transient';
import { lx9Model } from '@shared/demo/lx9';
import TimingSentences from '@/components/timeline/TimingSentences.vue';
import { defaultTimingInputs, timingRequest } from '@/components/timeline/timingRequest';
import { timelineNodes } from '@/components/timeline/nodes';
import { expectClose } from '../../helpers/float';

/** One lumped node: R = 0.5 K/W, τ = RC = 0.1 s, fluid 40 °C (invented numbers). */
const lumped: FosterNetwork = { tau: [0.1], R: [[[0.5]]], labels: ['compute-0'] };

describe('TimingSentences', () => {
  const answers = timingAnswers(lumped, [40], { node: 0, limit: 105, reenable: 95, boostPower: [160], restPower: [0], startLabel: 'from idle', period: 0.1 });

  test('the numbers follow the lumped-capacitance law', () => {
    // Lumped capacitance ΔT = P·R·(1 − e^{−t/RC}) (Incropera & DeWitt, ch. 5): 65 K of 80 K → t = −τ·ln(1 − 65/80) = 0.1674 s.
    expectClose(answers.boost.time!, -0.1 * Math.log(1 - 65 / 80), 1e-6, 0, 'time to 105 °C');
    // Cooling from 105 °C at 0 W: 40 + 65·e^{−t/τ} = 95 → t = τ·ln(65/55) = 16.7 ms (same law).
    expectClose(answers.rest!.time!, 0.1 * Math.log(65 / 55), 1e-6, 0, 'rest time to 95 °C');
  });

  test('renders one sentence per answer with the numbers in bold', () => {
    const w = mount(TimingSentences, { props: { answers } });
    expect(w.find('[data-test="timing-boost"]').text()).toBe('compute-0 reaches 105 °C after 167 ms at 160 W from idle.');
    expect(w.find('[data-test="timing-rest"]').text()).toBe('compute-0 cools from 105 °C to 95 °C in 16.7 ms at 0 W.');
    expect(w.find('[data-test="timing-boost"]').findAll('b').map((b) => b.text())).toEqual(['105 °C', '167 ms', '160 W']);
    expect(w.find('[data-test="timing-duty"]').text()).toMatch(/^At a 100 ms period compute-0 may run at 160 W for at most [\d.]+ ms per cycle \(duty cycle \d+ %, 0 W off\)/);
  });

  test('a part that never reaches its limit says where it settles', () => {
    const cool = timingAnswers(lumped, [40], { node: 0, limit: 105, boostPower: [100], restPower: [0] });
    const w = mount(TimingSentences, { props: { answers: cool } });
    // Steady state 40 + 100·0.5 = 90 °C (R·P, hand count).
    expect(w.find('[data-test="timing-boost"]').text()).toBe('compute-0 stays below 105 °C at 100 W from ambient: it settles at 90 °C in steady state.');
    expect(w.find('[data-test="timing-rest"]').exists()).toBe(false);
  });

  test('nothing is shown without answers', () => {
    expect(mount(TimingSentences, { props: { answers: null } }).findAll('dd')).toHaveLength(0);
  });
});

describe('timingRequest', () => {
  const model = lx9Model('A');
  const inputs = defaultTimingInputs(model, 'boost', 0, 'idle');

  test('boost at the chosen power over the scenario, rest over the start scenario (demo data)', () => {
    const built = timingRequest(model, 'boost', { ...inputs, boostPower: 160, withLeakage: false });
    if (!built.ok) throw new Error(built.message);
    expect(built.request.boostPower.slice(0, 3)).toEqual([160, 145, 20]);
    expect(built.request.restPower.slice(0, 3)).toEqual([35, 35, 8]);
    expect(built.request.startLabel).toBe('from idle');
    expectClose(built.request.period!, 0.1, 1e-12, 0, '100 ms in s');
  });

  test('leakage and Joule heat at the limit are added to the compute dies (demo electrical data)', () => {
    const built = timingRequest(model, 'boost', { ...inputs, boostPower: 160, withLeakage: true });
    if (!built.ok) throw new Error(built.message);
    // P_leak = 10·e^{0.03·(105 − 85)} W; Joule = (200 A)²·5e-5 Ω·(1 + 0.00393·(105 − 20)) (physics.md §4 power law, demo values).
    const extra = 10 * Math.exp(0.03 * 20) + 200 ** 2 * 5e-5 * (1 + 0.00393 * 85);
    expectClose(built.request.boostPower[0], 160 + extra, 1e-12, 0, 'boost with leakage');
    const idleJoule = 45 ** 2 * 5e-5 * (1 + 0.00393 * 85);
    expectClose(built.request.restPower[0], 35 + 10 * Math.exp(0.03 * 20) + idleJoule, 1e-12, 0, 'rest with leakage (idle current 45 A)');
    expect(built.request.boostPower[2]).toBe(20);
  });

  test('inputs that cannot work are named', () => {
    expect(timingRequest(model, 'boost', { ...inputs, reenable: 110 })).toEqual({ ok: false, message: 'The re-enable temperature must be below the limit (105 °C).' });
    expect(timingRequest(model, 'boost', { ...inputs, boostPower: -1 })).toEqual({ ok: false, message: 'Enter a boost power of 0 W or more.' });
    expect(timingRequest(model, 'boost', { ...inputs, periodMs: 0 })).toEqual({ ok: false, message: 'The period must be longer than 0 ms.' });
  });
});

describe('timing answers: Timeline screen and stored route agree', () => {
  test('same request meaning: boost over the scenario, rest over the start scenario, start at the resting steady state (own invariant)', () => {
    const model = lx9Model('A');
    const mt = prepareModelTransient(model, { count: 40 });
    const partId = model.parts[0].id;
    const node = timelineNodes(model).findIndex((n) => n.partId === partId);
    for (const startFrom of ['idle', 'ambient']) {
      const inputs = { ...defaultTimingInputs(model, 'boost', node, startFrom), boostPower: 170, restPower: 20, limit: 100, reenable: 90, periodMs: 100, withLeakage: false };
      const built = timingRequest(model, 'boost', inputs);
      if (!built.ok) throw new Error(built.message);
      const screen = timingAnswers(mt.fit.network, mt.baseTemperatures, built.request);
      const route = modelTimingAnswers(mt, model, { partId, scenarioId: 'boost', boostPower: 170, restPower: 20, limit: 100, reenable: 90, startFrom, period: 0.1 });
      expectClose(screen.boost.time!, route.boost.time!, 1e-9, 0, `time to limit from ${startFrom}`);
      expectClose(screen.rest!.time!, route.rest!.time!, 1e-9, 0, `rest time from ${startFrom}`);
      expect(screen.boost.sentence).toBe(route.boost.sentence);
    }
  });
});
