/**
 * The invented demo "LX-9 accelerator module" (docs product brief): a 46 × 34 mm silicon interposer on a
 * 60 × 52 mm organic substrate under a 52 × 40 mm copper lid with a cold plate; two compute chiplets,
 * one I/O die, four memory stacks and an unpowered bridge. Three placement variants. SI units.
 */
import { modelSchema, type Layer, type Model, type ModelInput, type Part, type Scenario } from '../schemas/model';
import { material } from './materials';
import { LX9_PLACEMENTS, type Placement } from './lx9Placements';

const MM = 1e-3;
const UM = 1e-6;

/** A layer of a demo material (thickness in m). */
export function demoLayer(name: string, materialId: string, thickness: number): Layer {
  const m = material(materialId);
  return { name, material: m.name, thickness, kxy: m.kxy, kz: m.kz, rho: m.rho, cp: m.cp };
}

const TIM1 = demoLayer('TIM1', 'tim-polymer', 50 * UM);
const BUMPS = demoLayer('Microbumps + underfill', 'microbump-underfill', 25 * UM);
const LOGIC_LIMITS = { junction: 105 };
const DRAM_LIMITS = { junction: 85, extended: 95 };
/**
 * Leakage and supply path of a compute die: κ ≈ 0.03 /K (common practice), annealed copper α20. Scenario
 * powers are the dynamic part: boost 145 W plus ≈ 15 W of leakage when hot ≈ 160 W.
 */
const COMPUTE_ELECTRICAL = { leakageAtRef: 10, referenceTemperature: 85, kappa: 0.03, pathResistance20: 5e-5, alpha: 0.00393 };

function part(p: Placement): Part {
  const common = { id: p.id, name: p.name, kind: p.kind, x: p.x * MM, y: p.y * MM, rotation: p.rotation, tim1: TIM1, bumps: BUMPS };
  switch (p.kind) {
    case 'compute':
      return { ...common, width: 13 * MM, height: 15 * MM, die: demoLayer('Compute die', 'si', 720 * UM), limits: LOGIC_LIMITS, electrical: COMPUTE_ELECTRICAL };
    case 'io':
      return { ...common, width: 8 * MM, height: 10 * MM, die: demoLayer('I/O die', 'si', 720 * UM), limits: LOGIC_LIMITS };
    case 'bridge':
      return { ...common, width: 6 * MM, height: 3 * MM, die: demoLayer('Bridge die', 'si', 720 * UM), limits: LOGIC_LIMITS };
    default:
      return {
        ...common,
        width: 11 * MM,
        height: 10 * MM,
        die: demoLayer('Base die', 'si', 100 * UM),
        memory: { tiers: 8, tier: demoLayer('DRAM tier', 'si', 50 * UM), bond: demoLayer('Tier bond', 'dram-bond', 20 * UM) },
        limits: DRAM_LIMITS,
      };
  }
}

function loads(compute: number, current: number, io: number, base: number, tier: number): Scenario['loads'] {
  return {
    'cpu-w': { power: compute, current },
    'cpu-e': { power: compute, current },
    io: { power: io },
    ...Object.fromEntries(['mem-1', 'mem-2', 'mem-3', 'mem-4'].map((id) => [id, { power: base, tiers: Array(8).fill(tier) }])),
  };
}

const PULSES = { kind: 'pulses' as const, onPower: 145, offPower: 35, onTime: 0.05, offTime: 0.05, repeats: 40 };

/** The three use cases: idle, boost (with a 145 W / 35 W, 50 ms / 50 ms pulse train on the compute dies), memory-bound. */
export const LX9_SCENARIOS: Scenario[] = [
  { id: 'idle', name: 'Idle', loads: loads(35, 45, 8, 1, 0.15) },
  {
    id: 'boost',
    name: 'Boost',
    loads: loads(145, 200, 20, 3, 0.6),
    profile: { startFrom: 'idle', parts: { 'cpu-w': [PULSES], 'cpu-e': [PULSES] } },
  },
  { id: 'memory-bound', name: 'Memory-bound', loads: loads(90, 115, 20, 4, 0.8) },
];

/** The shared stack-up: Si interposer 100 µm, C4, organic substrate, 2 mm Cu lid, cold plate and board. */
export function lx9Stack(): ModelInput['stack'] {
  return {
    interposer: { width: 46 * MM, height: 34 * MM, layers: [demoLayer('Interposer (Si + TSV)', 'si', 100 * UM)] },
    c4: demoLayer('C4 + underfill', 'c4-underfill', 80 * UM),
    substrate: { width: 60 * MM, height: 52 * MM, layers: [demoLayer('Organic substrate', 'organic-substrate', 1.2 * MM)] },
    lid: { width: 52 * MM, height: 40 * MM, offsetX: 0, offsetY: 0, layers: [demoLayer('Lid', 'cu', 2 * MM)] },
    cooling: { top: { h: 5000, fluidTemperature: 40 }, bottom: { h: 50, fluidTemperature: 40 } },
  };
}

/** The demo model of one variant ('A', 'B' or 'C'), validated by the model schema. */
export function lx9Model(variant: 'A' | 'B' | 'C' = 'A'): Model {
  const input: ModelInput = { stack: lx9Stack(), parts: LX9_PLACEMENTS[variant].parts.map(part), scenarios: LX9_SCENARIOS };
  return modelSchema.parse(input);
}

/** All three variants with their names. */
export function lx9Variants(): { id: 'A' | 'B' | 'C'; name: string; model: Model }[] {
  return (['A', 'B', 'C'] as const).map((id) => ({ id, name: LX9_PLACEMENTS[id].name, model: lx9Model(id) }));
}
