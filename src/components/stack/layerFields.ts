/** The editable columns of a layer (display units: µm, W/m·K, kg/m³, J/kg·K, K·mm²/W) and zod messages in those units. */
import type { z } from 'zod';
import type { Layer } from '@shared/schemas/model';

/** One numeric layer field, with its display unit and the factor from SI to that unit. */
export interface LayerField {
  key: 'thickness' | 'kxy' | 'kz' | 'rho' | 'cp' | 'contactResistance';
  label: string;
  unit: string;
  factor: number;
  optional: boolean;
  title: string;
}

/** Columns of the layer table, in order. */
export const layerFields: LayerField[] = [
  { key: 'thickness', label: 'Thickness', unit: 'µm', factor: 1e6, optional: false, title: 'Layer thickness' },
  { key: 'kxy', label: 'k in-plane', unit: 'W/m·K', factor: 1, optional: false, title: 'Thermal conductivity along the layer' },
  { key: 'kz', label: 'k through', unit: 'W/m·K', factor: 1, optional: false, title: 'Thermal conductivity through the layer' },
  { key: 'rho', label: 'ρ', unit: 'kg/m³', factor: 1, optional: true, title: 'Density (needed for transients)' },
  { key: 'cp', label: 'c_p', unit: 'J/kg·K', factor: 1, optional: true, title: 'Specific heat capacity (needed for transients)' },
  { key: 'contactResistance', label: 'Interface R', unit: 'K·mm²/W', factor: 1e6, optional: true, title: 'Interface resistance on the layer’s lid-side face' },
];

const fmt = (v: number) => Number(v.toPrecision(6)).toString();

/** A zod issue on a layer field, phrased in the field's display unit. */
export function fieldMessage(issue: z.core.$ZodIssue, f: LayerField): string {
  if (issue.code === 'too_big') return `at most ${fmt(Number(issue.maximum) * f.factor)} ${f.unit}`;
  if (issue.code === 'too_small') return Number(issue.minimum) === 0 && !issue.inclusive ? 'must be more than 0' : `at least ${fmt(Number(issue.minimum) * f.factor)} ${f.unit}`;
  if (issue.code === 'invalid_type') return 'enter a number';
  return issue.message;
}

/** Display value of a layer field (null when unset). */
export const displayValue = (l: Layer, f: LayerField): number | null => {
  const v = l[f.key];
  return v === undefined ? null : Number((v * f.factor).toPrecision(8));
};
