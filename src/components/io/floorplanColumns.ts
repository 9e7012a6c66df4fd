/** Columns of the floorplan preview table (lengths shown in mm, as in the file). */
import type { DataTableColumns } from 'naive-ui';
import type { FloorplanPart } from '@shared/export/floorplanCsv';

const mm = (v: number) => (v * 1000).toFixed(2);

/** Preview columns: line, name, type, x, y, width, height (mm), power (W). */
export const floorplanColumns: DataTableColumns<FloorplanPart> = [
  { title: 'Line', key: 'line', width: 56 },
  { title: 'Name', key: 'name' },
  { title: 'Type', key: 'kind' },
  { title: 'x (mm)', key: 'x', render: (r) => mm(r.x) },
  { title: 'y (mm)', key: 'y', render: (r) => mm(r.y) },
  { title: 'Width (mm)', key: 'width', render: (r) => mm(r.width) },
  { title: 'Height (mm)', key: 'height', render: (r) => mm(r.height) },
  { title: 'Power (W)', key: 'power' },
];

/** A small example file with the expected header (units in parentheses). */
export const FLOORPLAN_TEMPLATE = [
  'name,type,x (mm),y (mm),width (mm),height (mm),power (W)',
  '# x, y = centre of the part from the interposer\'s lower-left corner; types: compute, io, memory, bridge, passive',
  'Compute chiplet 1,compute,20,17,13,15,120',
  'Memory stack 1,memory,36,17,11,10,7.8',
  '',
].join('\r\n');
