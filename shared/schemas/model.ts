/**
 * The assembly model document: what a variant stores, what the app exports as JSON and what
 * `npm run cli -- solve` reads. All values are SI: lengths in m, power in W, conductivity in
 * W/m·K, density kg/m³, heat capacity J/kg·K, conductance W/m²·K, resistance K/W, time s.
 * Temperatures (fluids, limits, leakage reference) are in °C.
 */
import { z } from 'zod';

const finite = z.number().finite();
/** Strictly positive finite number. */
export const positive = finite.gt(0);
/** Non-negative finite number. */
export const nonNegative = finite.gte(0);
/** Temperature in °C, within what a package can see. */
export const celsius = finite.gte(-60).lte(400);

/** One homogenised layer: thickness and (possibly orthotropic) conductivity, optional heat capacity. */
export const layerSchema = z.object({
  name: z.string().max(80).optional(),
  material: z.string().max(80).optional(),
  thickness: positive.lte(0.05),
  kxy: positive.lte(5000),
  kz: positive.lte(5000),
  rho: positive.lte(30000).optional(),
  cp: positive.lte(10000).optional(),
  /** Interface resistance on the layer's +z face (toward the lid), m²K/W. */
  contactResistance: nonNegative.lte(0.01).optional(),
});
export type Layer = z.infer<typeof layerSchema>;

/** A cooled face: effective conductance h to a fluid, or a heat-sink resistance converted to h. */
export const coolingSchema = z.object({
  h: nonNegative.lte(1e6),
  fluidTemperature: celsius,
  /** If set, the heat-sink resistance (K/W) the user entered; h = 1/(R·A) was derived from it. */
  sinkResistance: positive.lte(1000).optional(),
  /** Base area of the sink (m²) used for that conversion; the lid's top area when absent. */
  sinkArea: positive.lte(1).optional(),
});
export type Cooling = z.infer<typeof coolingSchema>;

export const partKinds = ['compute', 'io', 'memory', 'bridge', 'passive'] as const;
export const partKindSchema = z.enum(partKinds);
export type PartKind = z.infer<typeof partKindSchema>;

/** Memory stack column above the base die: N DRAM tiers, each joined by a bond layer. */
export const memoryStackSchema = z.object({
  tiers: z.number().int().min(1).max(16),
  tier: layerSchema,
  bond: layerSchema,
});

/** Electro-thermal data of a part: leakage law and power-delivery copper path. */
export const electricalSchema = z.object({
  /** Leakage power (W) at the reference temperature. */
  leakageAtRef: nonNegative.lte(2000).default(0),
  referenceTemperature: celsius.default(85),
  /** Exponential coefficient κ (1/K): P_leak = P_ref·exp(κ (T − T_ref)). */
  kappa: nonNegative.lte(1).default(0),
  /** Copper path resistance at 20 °C (Ω) that the supply current flows through. */
  pathResistance20: nonNegative.lte(10).default(0),
  /** Temperature coefficient of that resistance at 20 °C (1/K); annealed copper 0.00393. */
  alpha: nonNegative.lte(0.1).default(0.00393),
});
export type Electrical = z.infer<typeof electricalSchema>;

/** A part placed on the interposer. (x, y) is its centre from the interposer's lower-left corner. */
export const partSchema = z.object({
  id: z.string().min(1).max(40).regex(/^[A-Za-z0-9_.-]+$/, 'use letters, digits, _ . -'),
  name: z.string().min(1).max(80),
  kind: partKindSchema,
  x: finite,
  y: finite,
  width: positive.lte(0.2),
  height: positive.lte(0.2),
  rotation: z.union([z.literal(0), z.literal(90), z.literal(180), z.literal(270)]).default(0),
  /** Die bulk (for a memory stack: its base die). Junction = the die's bump-side face. */
  die: layerSchema,
  /** TIM1 between the part's top and the lid; null when the part does not touch the lid. */
  tim1: layerSchema.nullable(),
  /** Microbump / underfill layer between the part and the interposer. */
  bumps: layerSchema,
  memory: memoryStackSchema.optional(),
  limits: z.object({ junction: celsius, extended: celsius.optional() }),
  electrical: electricalSchema.optional(),
});
export type Part = z.infer<typeof partSchema>;

/** Grid of non-negative weights over a part's footprint (row 0 = lowest y), normalised by the engine. */
export const powerMapSchema = z.object({
  nx: z.number().int().min(1).max(64),
  ny: z.number().int().min(1).max(64),
  weights: z.array(nonNegative).max(4096),
});
export type PowerMap = z.infer<typeof powerMapSchema>;

/** One piece of a part's power profile in time. */
export const segmentSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('steady'), power: nonNegative.lte(5000), duration: positive.lte(1e5) }),
  z.object({
    kind: z.literal('pulses'),
    onPower: nonNegative.lte(5000),
    offPower: nonNegative.lte(5000),
    onTime: positive.lte(1e5),
    offTime: positive.lte(1e5),
    repeats: z.number().int().min(1).max(100000),
  }),
]);
export type Segment = z.infer<typeof segmentSchema>;

/** Power of one part in one scenario. For a memory stack `power` is the base die's. */
export const partLoadSchema = z.object({
  power: nonNegative.lte(5000),
  tiers: z.array(nonNegative.lte(500)).max(16).optional(),
  map: powerMapSchema.optional(),
  /** Supply current (A) through the part's copper path, for Joule heating. */
  current: nonNegative.lte(5000).optional(),
});
export type PartLoad = z.infer<typeof partLoadSchema>;

/** A use case: power per part, optional time profile. */
export const scenarioSchema = z.object({
  id: z.string().min(1).max(40).regex(/^[A-Za-z0-9_.-]+$/, 'use letters, digits, _ . -'),
  name: z.string().min(1).max(80),
  loads: z.record(z.string(), partLoadSchema),
  profile: z
    .object({
      /** Start from ambient, or from the steady state of another scenario (its id). */
      startFrom: z.string().max(40).default('ambient'),
      parts: z.record(z.string(), z.array(segmentSchema).max(1000)),
    })
    .optional(),
});
export type Scenario = z.infer<typeof scenarioSchema>;

/** Stack-up shared by all parts: lid over them, interposer and substrate under them. */
export const stackSchema = z.object({
  interposer: z.object({ width: positive.lte(0.2), height: positive.lte(0.2), layers: z.array(layerSchema).min(1).max(10) }),
  /** C4 bumps + underfill between interposer and substrate. */
  c4: layerSchema,
  substrate: z.object({ width: positive.lte(0.3), height: positive.lte(0.3), layers: z.array(layerSchema).min(1).max(20) }),
  /** Lid (e.g. copper) and its offset: lid centre minus interposer centre (m). */
  lid: z.object({
    width: positive.lte(0.3),
    height: positive.lte(0.3),
    offsetX: finite.default(0),
    offsetY: finite.default(0),
    layers: z.array(layerSchema).min(1).max(5),
  }),
  cooling: z.object({ top: coolingSchema, bottom: coolingSchema }),
});
export type Stack = z.infer<typeof stackSchema>;

/** Layout settings used by the rule checks. */
export const layoutSettingsSchema = z.object({
  minGap: nonNegative.lte(0.01).default(0.0002),
  snap: positive.lte(0.01).default(0.0001),
});

/** The whole model document of one variant. */
export const modelSchema = z.object({
  format: z.literal('heatloom-model').default('heatloom-model'),
  formatVersion: z.literal(1).default(1),
  units: z.literal('SI').default('SI'),
  stack: stackSchema,
  parts: z.array(partSchema).max(128),
  scenarios: z.array(scenarioSchema).min(1).max(20),
  settings: layoutSettingsSchema.default({ minGap: 0.0002, snap: 0.0001 }),
});
export type Model = z.infer<typeof modelSchema>;
export type ModelInput = z.input<typeof modelSchema>;
