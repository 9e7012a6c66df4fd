/** Small hand-made models for the assembly tests (SI units). */
import { modelSchema, type Layer, type Model, type ModelInput, type Part, type PartLoad } from '@shared/schemas/model';

/** An isotropic layer with heat capacity. */
export const layer = (thickness: number, k: number, rho = 2000, cp = 800): Layer => ({ thickness, kxy: k, kz: k, rho, cp });

/** A plain logic part centred at (x, y). */
export function logicPart(id: string, x: number, y: number, width: number, height: number, extra: Partial<Part> = {}): Part {
  return {
    id,
    name: id,
    kind: 'compute',
    x,
    y,
    width,
    height,
    rotation: 0,
    die: layer(0.5e-3, 148),
    tim1: layer(50e-6, 3),
    bumps: layer(25e-6, 5),
    limits: { junction: 105 },
    ...extra,
  };
}

/** A stack W × H (m) with equal lid and substrate footprints unless told otherwise. */
export function stack(width: number, height: number, hTop = 5000, hBottom = 50, tTop = 40, tBottom = 40): ModelInput['stack'] {
  return {
    interposer: { width, height, layers: [layer(100e-6, 148)] },
    c4: layer(80e-6, 2),
    substrate: { width, height, layers: [layer(1e-3, 20)] },
    lid: { width, height, offsetX: 0, offsetY: 0, layers: [layer(2e-3, 401)] },
    cooling: { top: { h: hTop, fluidTemperature: tTop }, bottom: { h: hBottom, fluidTemperature: tBottom } },
  };
}

/** A validated model from a stack, parts and one scenario's loads. */
export function model(s: ModelInput['stack'], parts: Part[], loads: Record<string, PartLoad>): Model {
  return modelSchema.parse({ stack: s, parts, scenarios: [{ id: 'run', name: 'Run', loads }] });
}
