/** Units of exported and imported files, stated in file headers (physics.md: SI inside, °C for temperatures). */

/** Units of every quantity in a model JSON file. */
export const MODEL_UNITS = {
  length: 'm',
  power: 'W',
  temperature: '°C',
  conductivity: 'W/(m·K)',
  density: 'kg/m³',
  specificHeat: 'J/(kg·K)',
  heatTransferCoefficient: 'W/(m²·K)',
  thermalResistance: 'K/W',
  contactResistance: 'm²·K/W',
  time: 's',
  current: 'A',
  electricalResistance: 'Ω',
  leakageCoefficient: '1/K',
} as const;

/** The caution shown wherever results appear (product brief, "Cautions the product shows"). */
export const RESULT_CAUTION =
  'Results come from an idealised model (homogenised layers, uniform cooling). They do not replace detailed ' +
  'simulation, measurement to JEDEC JESD51 methods, or the part makers\' limits. Overheated parts can fail or cause burns: ' +
  'defer to data-sheet limits, local codes and licensed practice.';

/** The caution every export carries: the same words, headed as an early-stage estimate. */
export const EXPORT_CAUTION = `Early-stage estimate. ${RESULT_CAUTION}`;

/** Where an export came from, written into its header. */
export interface ExportSource {
  project?: string;
  assembly?: string;
  variant?: string;
  version?: number;
  status?: string;
}

/** One line naming the source, e.g. `LX-9 / Module / A — memory flanking compute (version 3)`. */
export function sourceLine(s: ExportSource): string {
  const names = [s.project, s.assembly, s.variant].filter((x): x is string => !!x).join(' / ');
  return `${names || 'unnamed model'}${s.version ? ` (version ${s.version})` : ''}`;
}
