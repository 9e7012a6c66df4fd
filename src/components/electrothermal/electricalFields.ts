/**
 * The leakage and supply fields of the electro-thermal panel: units on screen, checks against the model
 * schema (electricalSchema, partLoadSchema), κ ↔ doubling interval ΔT = ln 2 / κ, and the edit itself.
 */
import type { Model } from '@shared/schemas/model';
import { KAPPA_WARNING_ABOVE } from '@shared/engine/electrothermal/validateCoupling';

/** An editable field; `scale` turns the stored SI value into the shown one. */
export interface ElectricalField {
  key: 'leakageAtRef' | 'referenceTemperature' | 'kappa' | 'doubling' | 'pathResistance20' | 'alpha' | 'current';
  label: string;
  unit: string;
  scale: number;
  min: number;
  max: number;
}

/** The fields in table order (path resistance shown in mΩ). */
export const ELECTRICAL_FIELDS: ElectricalField[] = [
  { key: 'leakageAtRef', label: 'Leakage at T_ref', unit: 'W', scale: 1, min: 0, max: 2000 },
  { key: 'referenceTemperature', label: 'T_ref', unit: '°C', scale: 1, min: -60, max: 400 },
  { key: 'kappa', label: 'κ', unit: '/K', scale: 1, min: 0, max: 1 },
  { key: 'doubling', label: 'Doubles every', unit: 'K', scale: 1, min: Math.LN2, max: 1e6 },
  { key: 'current', label: 'Supply current', unit: 'A', scale: 1, min: 0, max: 5000 },
  { key: 'pathResistance20', label: 'Path R at 20 °C', unit: 'mΩ', scale: 1e3, min: 0, max: 10 },
  { key: 'alpha', label: 'α', unit: '/K', scale: 1, min: 0, max: 0.1 },
];

/** Annealed copper α20 (international annealed copper standard), the default. */
export const COPPER_ALPHA = 0.00393;

/** Shown value of a field for a part in a scenario (null when unset and without default). */
export function fieldValue(model: Model, scenarioId: string, partId: string, f: ElectricalField): number | null {
  const part = model.parts.find((p) => p.id === partId);
  const e = part?.electrical;
  if (f.key === 'current') return model.scenarios.find((s) => s.id === scenarioId)?.loads[partId]?.current ?? 0;
  if (f.key === 'doubling') return e && e.kappa > 0 ? Number((Math.LN2 / e.kappa).toPrecision(4)) : null;
  const defaults = { leakageAtRef: 0, referenceTemperature: 85, kappa: 0, pathResistance20: 0, alpha: COPPER_ALPHA };
  return (e?.[f.key] ?? defaults[f.key]) * f.scale;
}

/** Why a typed value cannot be stored (null = fine). Limits are in shown units except path R. */
export function fieldProblem(f: ElectricalField, shown: number | null): string | null {
  if (shown === null || !Number.isFinite(shown)) return `Enter ${f.label} in ${f.unit}.`;
  const v = shown / f.scale;
  if (v < 0 && f.min >= 0) return `${f.label} cannot be negative.`;
  if (v < f.min || v > f.max) return `${f.label} must be between ${f.min * f.scale} and ${f.max * f.scale} ${f.unit}.`;
  return null;
}

/** A physically doubtful κ (common practice 0.02–0.05 /K). */
export function kappaWarning(kappa: number | null): string | null {
  if (kappa === null || kappa <= KAPPA_WARNING_ABOVE) return null;
  return `κ = ${kappa} /K is above ${KAPPA_WARNING_ABOVE} /K: leakage would double every ${(Math.LN2 / kappa).toPrecision(2)} K (common practice 0.02–0.05 /K).`;
}

/** Store a checked value into a draft model (current goes to the scenario's load). */
export function applyField(draft: Model, scenarioId: string, partId: string, f: ElectricalField, shown: number): void {
  if (f.key === 'current') {
    const load = draft.scenarios.find((s) => s.id === scenarioId)?.loads[partId];
    if (load) load.current = shown;
    return;
  }
  const part = draft.parts.find((p) => p.id === partId);
  if (!part) return;
  const e = (part.electrical ??= { leakageAtRef: 0, referenceTemperature: 85, kappa: 0, pathResistance20: 0, alpha: COPPER_ALPHA });
  if (f.key === 'doubling') e.kappa = Number((Math.LN2 / shown).toPrecision(6));
  else e[f.key] = shown / f.scale;
}
