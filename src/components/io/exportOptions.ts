/** The Export menu's entries: server files, diagrams found on the page, and the printable report. */
import type { DropdownOption } from 'naive-ui';
import type { ExportKind } from '@/api/io';

/** Server exports in menu order, with labels that state units. */
export const FILE_EXPORTS: { key: ExportKind; label: string }[] = [
  { key: 'model', label: 'Model (JSON, SI units)' },
  { key: 'matrix', label: 'Coupling matrix R (CSV, K/W)' },
  { key: 'nodes', label: 'Node matrix with DRAM tiers (CSV, K/W)' },
  { key: 'contribution', label: 'Contributions in this scenario (CSV, K)' },
  { key: 'temperatures', label: 'Temperatures, all scenarios (CSV, °C)' },
  { key: 'netlist', label: 'SPICE netlist (Foster network when available)' },
  { key: 'netlist-steady', label: 'SPICE netlist, steady matrix only' },
];

/** Menu options for the given diagram names (each as SVG and PNG). */
export function exportOptions(diagrams: string[]): DropdownOption[] {
  const files = FILE_EXPORTS.map((f) => ({ key: `file:${f.key}`, label: f.label }));
  const pictures = diagrams.flatMap((name, i) => [
    { key: `svg:${i}`, label: `${name} diagram (SVG)` },
    { key: `png:${i}`, label: `${name} diagram (PNG)` },
  ]);
  return [
    { type: 'group', label: 'Data', key: 'data', children: files },
    { type: 'group', label: 'Diagrams', key: 'diagrams', children: pictures.length ? pictures : [{ key: 'none', label: 'No diagram on screen', disabled: true }] },
    { type: 'divider', key: 'd2' },
    { key: 'report', label: 'Printable report…' },
  ];
}
