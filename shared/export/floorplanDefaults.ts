/**
 * Layers and limits per part kind: given to a part that a floorplan CSV adds when the base variant has
 * no part of that kind to copy from, and the body of the built-in part templates on the layout. Silicon k 148 W/m·K, ρ 2330 kg/m³, c_p 712 J/kg·K (Incropera & DeWitt,
 * Table A.1, 300 K); bump, bond and TIM layers are effective values from common practice; limits:
 * logic 105 °C, DRAM 85 °C with 95 °C extended (common practice / JEDEC DDR temperature ranges).
 */
import type { Layer, Part, PartKind } from '../schemas/model';

type Body = Omit<Part, 'id' | 'name' | 'kind' | 'x' | 'y' | 'width' | 'height' | 'rotation'>;

const silicon = (name: string, thickness: number): Layer => ({ name, material: 'Silicon', thickness, kxy: 148, kz: 148, rho: 2330, cp: 712 });
const bumps: Layer = { name: 'Microbumps + underfill', thickness: 40e-6, kxy: 1.5, kz: 5, rho: 3000, cp: 800 };
const tim1: Layer = { name: 'TIM1', thickness: 50e-6, kxy: 3, kz: 3, rho: 2500, cp: 800 };

/** Default body (layers, limits) per part kind. */
export const FLOORPLAN_DEFAULTS: Record<PartKind, Body> = {
  compute: { die: silicon('Compute die', 775e-6), tim1, bumps, limits: { junction: 105 } },
  io: { die: silicon('I/O die', 775e-6), tim1, bumps, limits: { junction: 105 } },
  memory: {
    die: silicon('Base die', 100e-6), tim1, bumps,
    memory: { tiers: 8, tier: silicon('DRAM tier', 50e-6), bond: { name: 'Tier bond', thickness: 20e-6, kxy: 1.5, kz: 2, rho: 2500, cp: 800 } },
    limits: { junction: 85, extended: 95 },
  },
  bridge: { die: silicon('Bridge die', 100e-6), tim1: null, bumps, limits: { junction: 105 } },
  passive: { die: { name: 'Body', thickness: 300e-6, kxy: 30, kz: 30, rho: 4000, cp: 800 }, tim1: null, bumps, limits: { junction: 125 } },
};
