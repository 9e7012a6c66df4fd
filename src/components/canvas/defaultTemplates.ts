/**
 * Built-in part templates used when the workspace library has none, taken from the invented LX-9
 * demo (product.md): compute 13 × 15 mm, I/O die 8 × 10 mm, memory stack 11 × 10 mm with 8 tiers.
 * Silicon k ≈ 148 W/m·K, ρ 2330, c_p 712 (Incropera 7th ed., Table A.1, 300 K); bump, bond and
 * TIM layers are effective values from common practice. Limits: logic 105 °C, DRAM 85 °C with
 * 95 °C extended (common practice / JEDEC DDR extended temperature range).
 */
import type { PartKind } from '@shared/schemas/model';
import type { PartTemplate } from '@shared/schemas/library';

type Body = PartTemplate['part'];
const silicon = { material: 'Silicon', kxy: 148, kz: 148, rho: 2330, cp: 712 };
const bumps = { name: 'microbumps + underfill', thickness: 40e-6, kxy: 1.5, kz: 5, rho: 3000, cp: 800 };
const tim1 = { name: 'TIM1', thickness: 50e-6, kxy: 3, kz: 3, rho: 2500, cp: 800 };
const die = (t: number) => ({ name: 'die', thickness: t, ...silicon });

/** One built-in template per part kind. */
export const defaultTemplates: Record<PartKind, Body> = {
  compute: { name: 'Compute chiplet', kind: 'compute', width: 0.013, height: 0.015, rotation: 0, die: die(775e-6), tim1, bumps, limits: { junction: 105 } },
  io: { name: 'I/O die', kind: 'io', width: 0.008, height: 0.01, rotation: 0, die: die(775e-6), tim1, bumps, limits: { junction: 105 } },
  memory: {
    name: 'Memory stack', kind: 'memory', width: 0.011, height: 0.01, rotation: 0, die: { ...die(100e-6), name: 'base die' }, tim1, bumps,
    memory: { tiers: 8, tier: { name: 'DRAM tier', thickness: 50e-6, ...silicon }, bond: { name: 'tier bond', thickness: 20e-6, kxy: 1.5, kz: 2, rho: 2500, cp: 800 } },
    limits: { junction: 85, extended: 95 },
  },
  bridge: { name: 'Bridge die', kind: 'bridge', width: 0.004, height: 0.008, rotation: 0, die: die(100e-6), tim1: null, bumps, limits: { junction: 105 } },
  passive: { name: 'Passive', kind: 'passive', width: 0.002, height: 0.001, rotation: 0, die: { name: 'body', thickness: 300e-6, kxy: 30, kz: 30, rho: 4000, cp: 800 }, tim1: null, bumps, limits: { junction: 125 } },
};

/** Display names of the part kinds. */
export const kindLabel: Record<PartKind, string> = {
  compute: 'Compute chiplet',
  io: 'I/O die',
  memory: 'Memory stack',
  bridge: 'Bridge',
  passive: 'Passive',
};
