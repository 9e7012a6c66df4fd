/** Table columns of the project, assembly and variant lists. */
import { h } from 'vue';
import { RouterLink } from 'vue-router';
import { NTag, type DataTableColumns } from 'naive-ui';
import type { Assembly, Project, ReviewStatus, VariantSummary } from '@/api/types';

const when = (iso?: string) => (iso ? new Date(iso).toLocaleString() : '');
const link = (to: string, text: string, test: string) => h(RouterLink, { to, 'data-test': test }, () => text);

/** Review status labels and tag colours. */
export const statusLabel: Record<ReviewStatus, { text: string; type: 'default' | 'info' | 'success' | 'warning' }> = {
  draft: { text: 'Draft', type: 'default' },
  in_review: { text: 'In review', type: 'info' },
  approved: { text: 'Approved', type: 'success' },
  changes_requested: { text: 'Changes requested', type: 'warning' },
};

/** Columns of the project list. */
export const projectColumns: DataTableColumns<Project> = [
  { title: 'Project', key: 'name', sorter: 'default', render: (p) => link(`/projects/${p.id}`, p.name, 'project-link') },
  { title: 'Description', key: 'description' },
  { title: 'Updated', key: 'updatedAt', render: (p) => when(p.updatedAt) },
];

/** Columns of the assembly list. */
export const assemblyColumns: DataTableColumns<Assembly> = [
  { title: 'Assembly', key: 'name', sorter: 'default', render: (a) => link(`/assemblies/${a.id}`, a.name, 'assembly-link') },
  { title: 'Description', key: 'description' },
  { title: 'Updated', key: 'updatedAt', render: (a) => when(a.updatedAt) },
];

/** Columns of the variant list. */
export const variantColumns: DataTableColumns<VariantSummary> = [
  { type: 'selection' },
  { title: 'Variant', key: 'name', sorter: 'default', render: (v) => link(`/variants/${v.id}`, v.name, 'variant-link') },
  { title: 'Note', key: 'note' },
  {
    title: 'Review',
    key: 'status',
    render: (v) => h(NTag, { size: 'small', type: statusLabel[v.status].type, bordered: false }, () => statusLabel[v.status].text),
  },
  { title: 'Version', key: 'version', className: 'hl-num' },
  { title: 'Updated', key: 'updatedAt', render: (v) => when(v.updatedAt) },
];
