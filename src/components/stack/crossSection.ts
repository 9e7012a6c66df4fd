/**
 * Geometry of the to-scale cross-section: a cut along x through the selected part (or through
 * the most parts). Lateral sizes are to scale; thicknesses are to scale vertically (a separate scale, stated
 * in the drawing) except that very thin layers get a minimum visible height, labelled with their
 * true thickness. Lists are drawn in model order, index 0 on top (lid side), as in the table.
 */
import type { Layer, Model, Part } from '@shared/schemas/model';
import { partRect } from '@shared/layout/rules';
import type { LayerRow } from './layerRows';

/** One drawn rectangle, px. */
export interface SectionRect { key: string; x: number; y: number; w: number; h: number; role: LayerRow['role']; layer: Layer; thin: boolean; stripes?: number }
/** One label at the right with a leader to its layer, px. */
export interface SectionLabel { key: string; text: string; y: number; anchorX: number; anchorY: number }

/** Drawing options: size and the minimum visible layer height (px). */
export const SECTION = { width: 900, drawWidth: 470, height: 250, margin: 14, minPx: 4, labelGap: 13 };

const um = (t: number) => `${Math.round(t * 1e6).toLocaleString('en-US')} µm`;
const describe = (name: string, l: Layer) => `${l.name ?? name}${l.material ? ` · ${l.material}` : ''} · ${um(l.thickness)}`;

type Slice = { role: LayerRow['role']; layer: Layer; name: string; stripes?: number };

/** A part's layers from the interposer up; a memory stack's tiers and bonds are one block with its true total thickness. */
function column(p: Part): Slice[] {
  const out: Slice[] = [{ role: 'bumps', layer: p.bumps, name: 'bumps' }, { role: 'die', layer: p.die, name: 'die' }];
  if (p.memory) {
    const { tiers, tier, bond } = p.memory;
    const layer = { ...tier, name: `${tiers} DRAM tiers (${um(tier.thickness)} + ${um(bond.thickness)} bond each)`, material: undefined, thickness: tiers * (tier.thickness + bond.thickness) };
    out.push({ role: 'tier', layer, name: 'tiers', stripes: tiers });
  }
  if (p.tim1) out.push({ role: 'tim', layer: p.tim1, name: 'TIM1' });
  return out;
}

/** Rectangles, labels and the cut position for the model and selection. */
export function crossSection(model: Model, selection: string[]) {
  const { interposer: ip, substrate: sub, lid, c4 } = model.stack;
  const focus = model.parts.find((p) => selection.includes(p.id)) ?? null;
  const crossing = (y: number) => model.parts.filter((p) => { const r = partRect(p); return r.y0 <= y && y <= r.y1; });
  const busiest = [...model.parts].sort((a, b) => crossing(b.y).length - crossing(a.y).length)[0];
  const yCut = focus?.y ?? busiest?.y ?? ip.height / 2;
  const cut = crossing(yCut);
  const rep = focus ?? cut[0] ?? null;
  const span = Math.max(sub.width, lid.width, ip.width);
  const sx = SECTION.drawWidth / span;
  const X = (x: number) => SECTION.margin + (x - (ip.width / 2 - span / 2)) * sx;
  const sum = (ls: Layer[]) => ls.reduce((a, l) => a + l.thickness, 0);
  const tallest = Math.max(0, ...model.parts.map((p) => sum(column(p).map((c) => c.layer))));
  const sv = (SECTION.height - 2 * SECTION.margin) / (sum(sub.layers) + c4.thickness + sum(ip.layers) + tallest + sum(lid.layers));
  const d = (l: Layer) => Math.max(l.thickness * sv, SECTION.minPx);
  const rects: SectionRect[] = [];
  const labels: SectionLabel[] = [];
  let z = SECTION.height - SECTION.margin;
  const push = (key: string, x0: number, x1: number, base: number, role: LayerRow['role'], layer: Layer, name: string, label: boolean, stripes?: number) => {
    const h = d(layer);
    rects.push({ key, x: X(x0), y: base - h, w: (x1 - x0) * sx, h, role, layer, thin: layer.thickness * sv < SECTION.minPx, stripes });
    if (label) labels.push({ key, text: describe(name, layer), y: base - h / 2, anchorX: X(x1), anchorY: base - h / 2 });
    return base - h;
  };
  const shared = (key: string, ls: Layer[], w: number, role: LayerRow['role'], name: string, dx = 0) => {
    [...ls].reverse().forEach((l, i) => { z = push(`${key}${ls.length - 1 - i}`, ip.width / 2 + dx - w / 2, ip.width / 2 + dx + w / 2, z, role, l, name, true); });
  };
  shared('substrate', sub.layers, sub.width, 'substrate', 'substrate');
  shared('c4', [c4], ip.width, 'c4', 'C4');
  shared('interposer', ip.layers, ip.width, 'interposer', 'interposer');
  let lidBase = z;
  for (const p of cut) {
    const r = partRect(p);
    let top = z;
    column(p).forEach((c, i) => { top = push(`${p.id}.${i}`, r.x0, r.x1, top, c.role, c.layer, `${p.name} ${c.name}`, p === rep, c.stripes); });
    lidBase = Math.min(lidBase, top);
  }
  z = lidBase;
  shared('lid', lid.layers, lid.width, 'lid', 'lid', lid.offsetX);
  return { rects, labels: spread(labels), yCut, rep, cut, exaggeration: sv / sx };
}

/** Push labels apart (at least SECTION.labelGap px) keeping their order from the bottom up. */
function spread(labels: SectionLabel[]): SectionLabel[] {
  const out = [...labels].sort((a, b) => b.y - a.y);
  for (let i = 1; i < out.length; i++) out[i].y = Math.min(out[i].y, out[i - 1].y - SECTION.labelGap);
  const over = SECTION.labelGap / 2 - Math.min(...out.map((l) => l.y));
  if (over > 0) for (const l of out) l.y += over;
  return out;
}
