import { describe, expect, it } from 'vitest';
import { EngineInputError } from '@shared/engine/errors';
import { analyseCoupling } from '@shared/engine/electrothermal';
import { networkStep, scheduleFromSegments, scheduleFromTable, simulateProfile, type FosterNetwork } from '@shared/engine/transient';
import { expectClose } from '../../../helpers/float';

// Invented two-node network with a signed (delayed) transfer response.
const net2: FosterNetwork = {
  tau: [1e-4, 1e-2, 1],
  R: [
    [[0.05, 0.1, 0.2], [-0.02, 0.03, 0.09]],
    [[-0.02, 0.03, 0.09], [0.04, 0.2, 0.3]],
  ],
  labels: ['compute-0', 'memory-0'],
};

describe('profile simulation', () => {
  it('a square pulse train equals the superposition of shifted step responses (linearity)', () => {
    const [P, on, off, repeats] = [120, 0.003, 0.007, 6];
    const schedule = scheduleFromSegments([[{ kind: 'pulses', onPower: P, offPower: 0, onTime: on, offTime: off, repeats }], undefined], [0, 0]);
    const sim = simulateProfile(net2, schedule, { baseTemperatures: [40, 41], samplesPerInterval: 5 });
    const Z = (t: number, j: number) => (t > 0 ? networkStep(net2, t)[j][0] : 0);
    sim.times.forEach((t, s) => {
      for (let j = 0; j < 2; j++) {
        let rise = 0;
        for (let m = 0; m < repeats; m++) rise += P * (Z(t - m * (on + off), j) - Z(t - m * (on + off) - on, j));
        expectClose(sim.temperatures[j][s], [40, 41][j] + rise, 1e-9, 1e-9, `T${j}(${t})`);
      }
    });
  });

  it('a single lumped term follows P·R·(1 − e^{−t/RC}) (Incropera & DeWitt ch. 5)', () => {
    const [R, C, P] = [0.5, 0.02, 80];
    const net: FosterNetwork = { tau: [R * C], R: [[[R]]], labels: ['compute-0'] };
    const sim = simulateProfile(net, scheduleFromSegments([[{ kind: 'steady', power: P, duration: 0.05 }]], [0]), { baseTemperatures: [25], samplesPerInterval: 20 });
    sim.times.forEach((t, s) => expectClose(sim.temperatures[0][s], 25 + P * R * (1 - Math.exp(-t / (R * C))), 1e-12, 1e-12, `T(${t})`));
  });

  it('holds steady when started from the steady state of the same power', () => {
    const sim = simulateProfile(net2, scheduleFromTable({ times: [0, 0.5], power: [[50, 10], [0, 0]] }, 2), { baseTemperatures: [30, 30], start: { steadyPower: [50, 10] } });
    const steady = networkStep(net2, Infinity);
    expectClose(sim.temperatures[0][1], 30 + steady[0][0] * 50 + steady[0][1] * 10, 1e-12, 0, 'T0');
    expectClose(sim.temperatures[0][0], sim.temperatures[0][1], 1e-12, 0, 'no drift');
  });

  it('merges segments of different parts onto shared intervals, holding each last level', () => {
    const s = scheduleFromSegments([[{ kind: 'steady', power: 10, duration: 1 }, { kind: 'steady', power: 20, duration: 1 }], [{ kind: 'steady', power: 5, duration: 1.5 }]], [0, 0]);
    expect(s.bounds).toEqual([0, 1, 1.5, 2]);
    expect(s.power).toEqual([[10, 5], [20, 5], [20, 5]]);
  });

  it('with leakage feedback it settles at the coupled steady state', () => {
    const net: FosterNetwork = { tau: [1e-3, 0.05], R: [[[0.1, 0.4]]], labels: ['compute-0'] };
    const law = { dynamic: 0, leakageAtRef: 10, kappa: 0.03, referenceTemperature: 85 };
    const sim = simulateProfile(net, scheduleFromSegments([[{ kind: 'steady', power: 60, duration: 2 }]], [0]), { baseTemperatures: [40], samplesPerInterval: 400, feedback: [law] });
    const ref = analyseCoupling({ R: [[0.5]], baseTemperatures: [40], laws: [{ ...law, dynamic: 60 }] }, { margins: false });
    expectClose(sim.temperatures[0][sim.times.length - 1], ref.temperatures[0], 1e-9, 0, 'settled temperature');
    expect(sim.status).toBe('complete');
  });

  it('with feedback a steady start is the coupled steady state (it does not drift)', () => {
    const net: FosterNetwork = { tau: [1e-3, 0.05], R: [[[0.1, 0.4]]], labels: ['compute-0'] };
    const law = { dynamic: 0, leakageAtRef: 10, kappa: 0.03, referenceTemperature: 85 };
    const sim = simulateProfile(net, scheduleFromSegments([[{ kind: 'steady', power: 60, duration: 0.1 }]], [0]), { baseTemperatures: [40], start: { steadyPower: [60] }, feedback: [law], samplesPerInterval: 5 });
    const ref = analyseCoupling({ R: [[0.5]], baseTemperatures: [40], laws: [{ ...law, dynamic: 60 }] }, { margins: false });
    sim.temperatures[0].forEach((t) => expectClose(t, ref.temperatures[0], 1e-8, 0, 'coupled start'));
  });

  it('stops and says so on a runaway with feedback', () => {
    const net: FosterNetwork = { tau: [0.05], R: [[[1]]], labels: ['compute-0'] };
    const law = { dynamic: 0, leakageAtRef: 40, kappa: 0.03, referenceTemperature: 85 };
    const sim = simulateProfile(net, scheduleFromSegments([[{ kind: 'steady', power: 60, duration: 100 }]], [0]), { baseTemperatures: [40], samplesPerInterval: 2000, feedback: [law] });
    expect(sim.status).toBe('runaway');
    expect(sim.message).toMatch(/runaway/);
  });

  it('rejects non-increasing times, negative power and over-long profiles with typed errors', () => {
    expect(() => scheduleFromTable({ times: [0, 2, 2], power: [[1], [1], [1]] }, 1)).toThrow(EngineInputError);
    expect(() => scheduleFromTable({ times: [0, 1], power: [[-1], [1]] }, 1)).toThrow(/≥ 0 W/);
    expect(() => scheduleFromSegments([[{ kind: 'pulses', onPower: 1, offPower: 0, onTime: 1, offTime: 1, repeats: 60000 }]], [0])).toThrow(/cap of 100000/);
    const long = scheduleFromSegments([[{ kind: 'pulses', onPower: 1, offPower: 0, onTime: 1, offTime: 1, repeats: 40000 }]], [0]);
    expect(() => simulateProfile(net2, { bounds: long.bounds, power: long.power.map((p) => [p[0], 0]) }, { baseTemperatures: [0, 0], samplesPerInterval: 2 })).toThrow(EngineInputError);
  });

  it('computes only the chosen rows, identical to the full run', () => {
    const schedule = scheduleFromSegments([[{ kind: 'pulses', onPower: 90, offPower: 5, onTime: 0.002, offTime: 0.003, repeats: 4 }], undefined], [0, 3]);
    const full = simulateProfile(net2, schedule, { baseTemperatures: [40, 41], samplesPerInterval: 3 });
    const one = simulateProfile(net2, schedule, { baseTemperatures: [40, 41], samplesPerInterval: 3, rows: [1] });
    expect(one.temperatures).toHaveLength(1);
    one.temperatures[0].forEach((t, s) => expectClose(t, full.temperatures[1][s], 1e-12, 0, `T1[${s}]`));
  });

  it('can be cancelled from a long loop', () => {
    const long = scheduleFromSegments([[{ kind: 'pulses', onPower: 1, offPower: 0, onTime: 1, offTime: 1, repeats: 2000 }], undefined], [0, 0]);
    let polls = 0;
    expect(() => simulateProfile(net2, long, { baseTemperatures: [0, 0], shouldCancel: () => ++polls > 2 })).toThrow(/cancelled/);
  });
});
