import { describe, expect, it } from 'vitest';
import { cycleMaxima, packNetwork, timingAnswers, type FosterNetwork } from '@shared/engine/transient';
import { expectClose } from '../../../helpers/float';

// One lumped node, R = 0.4 K/W, τ = 20 ms: every answer has a closed form from
// T(t) = T_∞ + (T_0 − T_∞)e^{−t/τ} (lumped capacitance, Incropera & DeWitt ch. 5).
const [R, tau, Tb] = [0.4, 0.02, 35];
const net: FosterNetwork = { tau: [tau], R: [[[R]]], labels: ['compute-0'] };

describe('timing answers (single lumped node)', () => {
  it('time to limit, rest time and the duty cycle match their closed forms', () => {
    const [Pidle, Pboost, limit, reenable, period] = [20, 160, 90, 60, 0.05];
    const a = timingAnswers(net, [Tb], { node: 0, limit, reenable, boostPower: [Pboost], restPower: [Pidle], start: { steadyPower: [Pidle] }, startLabel: 'from idle', period });
    const T0 = Tb + R * Pidle;
    const Tinf = Tb + R * Pboost;
    expectClose(a.boost.time!, tau * Math.log((Tinf - T0) / (Tinf - limit)), 1e-9, 0, 'time to limit');
    expect(a.boost.sentence).toBe(`compute-0 reaches 90 °C after ${Number((tau * Math.log((Tinf - T0) / (Tinf - limit)) * 1e3).toPrecision(3))} ms at 160 W from idle.`);
    const Trest = Tb + R * Pidle;
    expectClose(a.rest!.time!, tau * Math.log((limit - Trest) / (reenable - Trest)), 1e-9, 0, 'rest time');
    // periodic peak = T_b + R·x_peak, x_peak = [P_on(1−A) + A(1−B)P_off]/(1−AB) (geometric series)
    const A = Math.exp(-a.duty!.onTime / tau);
    const B = Math.exp(-(period - a.duty!.onTime) / tau);
    expectClose(Tb + (R * (Pboost * (1 - A) + A * (1 - B) * Pidle)) / (1 - A * B), limit, 1e-7, 0, 'periodic peak at the largest on-time');
    expect(a.duty!.sentence).toMatch(/^At a 50 ms period compute-0 may run at 160 W for at most .* ms per cycle \(duty cycle \d+ %, 20 W off\); compute-0 sets the limit\.$/);
  });

  it('says when the limit is never reached and when a part may run continuously', () => {
    const a = timingAnswers(net, [Tb], { node: 0, limit: 105, boostPower: [150], restPower: [0], period: 0.1 });
    expect(a.boost.time).toBeNull();
    expect(a.boost.sentence).toBe('compute-0 stays below 105 °C at 150 W from ambient: it settles at 95 °C in steady state.');
    expect(a.duty!.continuous).toBe(true);
  });

  it('off power alone above the limit: no on-time works', () => {
    const a = timingAnswers(net, [Tb], { node: 0, limit: 50, boostPower: [100], restPower: [60], period: 0.1 });
    expect(a.duty!.impossible).toBe(true);
    expect(a.duty!.sentence).toMatch(/no on-time works/);
  });

  it('periodic maxima of a constant "cycle" equal the steady temperature', () => {
    const m = cycleMaxima(packNetwork(net), [Tb], 0.1, 0.03, [50], [50]);
    expectClose(m[0], Tb + R * 50, 1e-12, 0, 'steady');
  });
});
