/**
 * A small valid model used when the shared demo (shared/demo) is not available: the LX-9 stack-up
 * of product.md with one compute chiplet. Values: silicon k ≈ 150 W/m·K, copper k ≈ 390 W/m·K
 * (handbook values, e.g. Incropera, Fundamentals of Heat and Mass Transfer, Table A.1);
 * organic substrate and bump layers are effective values from common practice.
 */
import { modelSchema, type Model } from '@shared/schemas/model';

const silicon = { material: 'silicon', kxy: 150, kz: 150, rho: 2330, cp: 705 };
const copper = { material: 'copper', kxy: 390, kz: 390, rho: 8930, cp: 385 };
const bumpLayer = { name: 'microbumps + underfill', thickness: 40e-6, kxy: 1.5, kz: 5, rho: 3000, cp: 800 };
const tim1 = { name: 'TIM1', thickness: 50e-6, kxy: 3, kz: 3, rho: 2500, cp: 800 };

/** Build the fallback model (validated, defaults applied). */
export function fallbackModel(): Model {
  return modelSchema.parse({
    stack: {
      interposer: { width: 0.046, height: 0.034, layers: [{ name: 'interposer', thickness: 100e-6, ...silicon }] },
      c4: { name: 'C4 + underfill', thickness: 80e-6, kxy: 1.2, kz: 4, rho: 3000, cp: 800 },
      substrate: {
        width: 0.06,
        height: 0.052,
        layers: [{ name: 'organic substrate', thickness: 1.2e-3, kxy: 30, kz: 0.8, rho: 2000, cp: 1000 }],
      },
      lid: { width: 0.052, height: 0.04, layers: [{ name: 'lid', thickness: 2e-3, ...copper }] },
      cooling: { top: { h: 5000, fluidTemperature: 40 }, bottom: { h: 50, fluidTemperature: 40 } },
    },
    parts: [
      {
        id: 'cpu0', name: 'Compute 0', kind: 'compute', x: 0.023, y: 0.017, width: 0.013, height: 0.015,
        die: { name: 'die', thickness: 775e-6, ...silicon }, tim1, bumps: bumpLayer, limits: { junction: 105 },
      },
    ],
    scenarios: [
      { id: 'idle', name: 'idle', loads: { cpu0: { power: 35 } } },
      { id: 'boost', name: 'boost', loads: { cpu0: { power: 160 } } },
    ],
  });
}
