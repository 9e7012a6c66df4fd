/** A small invented model for component tests: one compute chiplet, one 4-tier memory stack, two scenarios. */
import { modelSchema, type Model } from '@shared/schemas/model';
import type { Variant } from '@/api/types';

const si = { kxy: 148, kz: 148, rho: 2330, cp: 712 };
const layer = (t: number) => ({ thickness: t, ...si });

/** Build the test model (validated, defaults applied). */
export function testModel(): Model {
  return modelSchema.parse({
    stack: {
      interposer: { width: 0.046, height: 0.034, layers: [{ name: 'interposer', ...layer(100e-6) }] },
      c4: { name: 'C4', thickness: 80e-6, kxy: 1.2, kz: 4 },
      substrate: { width: 0.06, height: 0.052, layers: [{ name: 'substrate', thickness: 1.2e-3, kxy: 30, kz: 0.8 }] },
      lid: { width: 0.052, height: 0.04, layers: [{ name: 'lid', thickness: 2e-3, kxy: 390, kz: 390 }] },
      cooling: { top: { h: 5000, fluidTemperature: 40 }, bottom: { h: 50, fluidTemperature: 40 } },
    },
    parts: [
      { id: 'cpu0', name: 'Compute 0', kind: 'compute', x: 0.012, y: 0.017, width: 0.013, height: 0.015, die: layer(775e-6), tim1: layer(50e-6), bumps: layer(40e-6), limits: { junction: 105 } },
      {
        id: 'mem0', name: 'Memory 0', kind: 'memory', x: 0.032, y: 0.017, width: 0.011, height: 0.01, die: layer(100e-6), tim1: layer(50e-6), bumps: layer(40e-6),
        memory: { tiers: 4, tier: layer(50e-6), bond: layer(20e-6) }, limits: { junction: 85, extended: 95 },
      },
    ],
    scenarios: [
      { id: 'idle', name: 'idle', loads: { cpu0: { power: 35 }, mem0: { power: 1, tiers: [0.2, 0.2, 0.2, 0.2] } } },
      { id: 'boost', name: 'boost', loads: { cpu0: { power: 160 }, mem0: { power: 3, tiers: [0.6, 0.6, 0.6, 0.6] } } },
    ],
  });
}

/** The test model wrapped as a loaded variant. */
export function testVariant(model: Model = testModel()): Variant {
  return {
    id: 1, assemblyId: 1, projectId: 1, workspaceId: 1, name: 'Test variant', note: '', status: 'draft', version: 1,
    createdAt: '2026-01-01T00:00:00Z', updatedAt: '2026-01-01T00:00:00Z', updatedBy: null, model,
  };
}
