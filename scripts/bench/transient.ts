/**
 * Transient engine (physics.md §3, §4) on the LX-9 demo: the full thermal impedance matrix (every
 * node for a step in every source) at 60 log-spaced times, cold and with the network prepared; its
 * Foster fit; a 10 000-step profile simulation; the timing answers; an electro-thermal solve.
 * Targets (issue 4): impedance matrix < 300 ms, 10 000-step profile < 50 ms.
 */
import { lx9Model } from '../../shared/demo/lx9';
import { assemblyNetwork } from '../../shared/engine/assembly/network';
import { ImpedanceCache } from '../../shared/engine/cache';
import { analyseCoupling } from '../../shared/engine/electrothermal';
import {
  assemblyImpedance,
  fitFosterNetwork,
  prepareLaplaceAssembly,
  scheduleFromSegments,
  simulateProfile,
  timingAnswers,
} from '../../shared/engine/transient';
import type { BenchCase } from './types';

const SECTION = 'transient and electro-thermal (LX-9 demo)';
const model = lx9Model();
const steady = assemblyNetwork(model);
const lap = prepareLaplaceAssembly(model, steady);
const impedance = assemblyImpedance(model, { laplace: lap });
const fit = fitFosterNetwork(impedance);
const S = impedance.sourceLabels.length;
const base = Array.from(steady.offsets);
const compute = impedance.sourceLabels.flatMap((l, i) => (l === 'cpu-w' || l === 'cpu-e' ? [i] : []));
const basePower = impedance.sourceLabels.map((l) => (l.endsWith('/tiers') ? 2 : 10));
const pulses = { kind: 'pulses' as const, onPower: 160, offPower: 35, onTime: 0.005, offTime: 0.005, repeats: 5000 };
const schedule = scheduleFromSegments(impedance.sourceLabels.map((_, i) => (compute.includes(i) ? [pulses] : undefined)), basePower);
const n = steady.nodes.length;
const coupled = {
  R: Array.from({ length: n }, (_, j) => Array.from(steady.R.subarray(j * n, (j + 1) * n))),
  baseTemperatures: base,
  laws: steady.nodes.map((node, j) => (node.tier === 0 && compute.some((i) => impedance.sourceNodes[i] === j) ? { dynamic: 160, leakageAtRef: 8, kappa: 0.03, current: 200, pathResistance20: 5e-5 } : { dynamic: 1 })),
};

/** The transient bench cases. */
export const benchCases: BenchCase[] = [
  {
    section: SECTION,
    name: 'impedance matrix 40 nodes × 12 sources, 60 times, cold (steady network + kernels + inversion)',
    repeat: 3,
    warmup: 1,
    run: () => {
      const net = assemblyNetwork(model, { cache: new ImpedanceCache() });
      assemblyImpedance(model, { laplace: prepareLaplaceAssembly(model, net) });
    },
  },
  { section: SECTION, name: 'impedance matrix, 60 times, network and kernels prepared', run: () => void assemblyImpedance(model, { laplace: lap }) },
  { section: SECTION, name: `Foster fit of the matrix (${fit.network.tau.length} shared τ)`, repeat: 3, warmup: 1, run: () => void fitFosterNetwork(impedance) },
  {
    section: SECTION,
    name: `profile, ${schedule.power.length} steps, ${n} nodes × ${S} sources`,
    run: () => void simulateProfile(fit.network, schedule, { baseTemperatures: base }),
  },
  {
    section: SECTION,
    name: `profile, ${schedule.power.length} steps, ${steady.junctionNode.length} junction rows × ${S} sources`,
    run: () => void simulateProfile(fit.network, schedule, { baseTemperatures: base, rows: steady.junctionNode }),
  },
  {
    section: SECTION,
    name: 'timing answers (limit, rest, duty cycle at 100 ms)',
    run: () =>
      void timingAnswers(fit.network, base, {
        node: impedance.sourceNodes[compute[0]],
        limit: 105,
        reenable: 95,
        boostPower: basePower.map((p, i) => (compute.includes(i) ? 160 : p)),
        restPower: basePower.map((p, i) => (compute.includes(i) ? 35 : p)),
        start: { steadyPower: basePower },
        period: 0.1,
        limits: steady.nodes.map((nd) => (nd.tier === 0 ? 105 : 95)),
      }),
  },
  { section: SECTION, name: `electro-thermal solve with margins (${n} nodes)`, run: () => void analyseCoupling(coupled) },
];
