/**
 * Temperature-dependent power of one node (physics.md §4):
 * P(T) = s·P_dyn + P_leak,ref·exp(κ (T − T_ref)) + (s·I)²·R20·(1 + α (T − 20 °C)),
 * s being the power scale factor (scales dynamic power and currents; leakage follows T).
 */

/** Reference temperature of copper's resistance coefficient α20 (°C; annealed copper standard). */
export const COPPER_REFERENCE_TEMPERATURE = 20;

/** The power law of one node. Powers in W, temperatures in °C, κ and α in 1/K, R in Ω, I in A. */
export interface NodePowerLaw {
  /** Dynamic (temperature-independent) power, W. */
  dynamic: number;
  /** Leakage power at the reference temperature, W (0 = none). */
  leakageAtRef?: number;
  /** Reference temperature of the leakage, °C (default 85). */
  referenceTemperature?: number;
  /** Exponential leakage coefficient κ, 1/K (default 0). */
  kappa?: number;
  /** Supply current through the node's copper path, A (default 0). */
  current?: number;
  /** Copper path resistance at 20 °C, Ω (default 0). */
  pathResistance20?: number;
  /** Temperature coefficient of that resistance at 20 °C, 1/K (default 0.00393, annealed copper). */
  alpha?: number;
}

/** Defaults of the optional fields of a NodePowerLaw (electricalSchema in shared/schemas/model.ts). */
export const POWER_LAW_DEFAULTS = {
  leakageAtRef: 0,
  referenceTemperature: 85,
  kappa: 0,
  current: 0,
  pathResistance20: 0,
  alpha: 0.00393,
} as const;

/** Power of one node at one temperature, split by origin, with its slope dP/dT (W/K). */
export interface PowerSplit {
  dynamic: number;
  leakage: number;
  joule: number;
  total: number;
  /** dP/dT at this temperature, W/K. */
  slope: number;
}

/** Evaluate a node's power law at temperature T (°C) and power scale factor `scale`. */
export function evaluatePower(law: NodePowerLaw, T: number, scale = 1): PowerSplit {
  const d = POWER_LAW_DEFAULTS;
  const pRef = law.leakageAtRef ?? d.leakageAtRef;
  const kappa = law.kappa ?? d.kappa;
  const tRef = law.referenceTemperature ?? d.referenceTemperature;
  const current = (law.current ?? d.current) * scale;
  const r20 = law.pathResistance20 ?? d.pathResistance20;
  const alpha = law.alpha ?? d.alpha;
  const dynamic = law.dynamic * scale;
  const leakage = pRef > 0 ? pRef * Math.exp(kappa * (T - tRef)) : 0;
  const i2r = current * current * r20;
  const joule = i2r * (1 + alpha * (T - COPPER_REFERENCE_TEMPERATURE));
  const slope = kappa * leakage + i2r * alpha;
  return { dynamic, leakage, joule, total: dynamic + leakage + joule, slope };
}

/** Power a fixed-power calculation would use: leakage at its reference, copper at 20 °C. */
export function nominalPower(law: NodePowerLaw, scale = 1): number {
  const d = POWER_LAW_DEFAULTS;
  const current = (law.current ?? d.current) * scale;
  return law.dynamic * scale + (law.leakageAtRef ?? d.leakageAtRef) + current * current * (law.pathResistance20 ?? d.pathResistance20);
}
