/** Table columns of the library page: materials and part templates (values shown in the units engineers read). */
import { h } from 'vue';
import { NButton, NPopconfirm, NSpace, NTag, type DataTableColumns } from 'naive-ui';
import type { Material, PartTemplate } from '@/api/types';
import { kindLabel } from '@/components/canvas/defaultTemplates';

/** Labels and tag colours of a material's kind. */
export const materialKindLabel: Record<Material['kind'], { text: string; type: 'success' | 'info' | 'default' }> = {
  handbook: { text: 'handbook', type: 'success' },
  'common-practice': { text: 'common practice', type: 'info' },
  user: { text: 'user', type: 'default' },
};

/** Row actions: edit and delete (absent for read-only viewers). */
export interface RowActions<T> {
  edit: (row: T) => void;
  remove: (row: T) => void;
}

/** A header with its unit on a second line. */
const head = (name: string, unit: string) => () => h('span', [name, h('br'), h('span', { class: 'hl-unit' }, unit)]);
const num = (v: number, digits = 3) => Number(v.toPrecision(digits)).toLocaleString('en-US');
const right = { align: 'right' as const, className: 'hl-num' };

function actionsColumn<T extends { id: number; name: string }>(a: RowActions<T>, what: string) {
  return {
    title: '',
    key: 'actions',
    width: 150,
    render: (row: T) =>
      h(NSpace, { size: 6, wrap: false }, () => [
        h(NButton, { size: 'tiny', secondary: true, 'data-test': `edit-${what}-${row.id}`, onClick: () => a.edit(row) }, () => 'Edit'),
        h(NPopconfirm, { onPositiveClick: () => a.remove(row) }, {
          trigger: () => h(NButton, { size: 'tiny', quaternary: true, type: 'error', 'data-test': `delete-${what}-${row.id}` }, () => 'Delete'),
          default: () => `Delete "${row.name}" from the library? Variants keep the values they already use.`,
        }),
      ]),
  };
}

/** Columns of the material table. */
export function materialColumns(actions?: RowActions<Material>): DataTableColumns<Material> {
  const cols: DataTableColumns<Material> = [
    { title: 'Material', key: 'name', sorter: 'default', minWidth: 170 },
    { title: 'Kind', key: 'kind', width: 130, render: (m) => h(NTag, { size: 'small', bordered: false, type: materialKindLabel[m.kind].type }, () => materialKindLabel[m.kind].text) },
    { title: head('k in-plane', 'W/m·K'), key: 'kxy', ...right, width: 110, sorter: (a, b) => a.kxy - b.kxy, render: (m) => num(m.kxy) },
    { title: head('k through-plane', 'W/m·K'), key: 'kz', ...right, width: 130, sorter: (a, b) => a.kz - b.kz, render: (m) => num(m.kz) },
    { title: head('Density ρ', 'kg/m³'), key: 'rho', ...right, width: 90, render: (m) => num(m.rho, 4) },
    { title: head('Heat capacity cₚ', 'J/kg·K'), key: 'cp', ...right, width: 120, render: (m) => num(m.cp) },
    { title: 'Source', key: 'source', minWidth: 260, render: (m) => h('span', { class: 'hl-source' }, m.source || '—') },
  ];
  return actions ? [...cols, actionsColumn(actions, 'material')] : cols;
}

const mm = (m: number) => num(m * 1000, 4);

/** Columns of the part template table. */
export function templateColumns(actions?: RowActions<PartTemplate>): DataTableColumns<PartTemplate> {
  const cols: DataTableColumns<PartTemplate> = [
    { title: 'Template', key: 'name', sorter: 'default', minWidth: 160 },
    { title: 'Kind', key: 'kind', width: 130, render: (t) => kindLabel[t.part.kind] },
    { title: head('Size', 'mm'), key: 'size', width: 110, className: 'hl-num', render: (t) => `${mm(t.part.width)} × ${mm(t.part.height)}` },
    { title: head('Die', 'µm'), key: 'die', ...right, width: 80, render: (t) => num(t.part.die.thickness * 1e6) },
    { title: 'DRAM tiers', key: 'tiers', ...right, width: 90, render: (t) => (t.part.memory ? String(t.part.memory.tiers) : '—') },
    { title: head('Junction limit', '°C'), key: 'limit', ...right, width: 110, render: (t) => String(t.part.limits.junction) },
    { title: head('Extended limit', '°C'), key: 'ext', ...right, width: 105, render: (t) => (t.part.limits.extended === undefined ? '—' : String(t.part.limits.extended)) },
    { title: 'Note', key: 'note', minWidth: 200 },
  ];
  return actions ? [...cols, actionsColumn(actions, 'template')] : cols;
}
